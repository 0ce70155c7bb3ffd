package org.shearstack.rules;

import java.util.List;
import java.util.Objects;

/**
 * A value the engine starts from: a spec input, a profile value or a stated default.
 *
 * @param key    the key
 * @param number canonical value (NaN for text seeds)
 * @param text   text value (null for numeric seeds)
 * @param origin SPEC, PROFILE or DEFAULT (SPEC becomes PINNED when a rule writes the key)
 * @param label  spec key path, profile name or "default", recorded as the derivation's rule id
 * @param formula what the value is, in words ("as written: 6 bar(g)")
 * @param source where it is written ("examples/demo.yaml:9:13", "profile printers/generic-0.4.yaml")
 */
public record Seed(Key key, double number, String text, Derivation.Origin origin, String label, String formula,
                   String source) {

    public Seed {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(origin, "origin");
        if (origin == Derivation.Origin.RULE || origin == Derivation.Origin.PINNED) {
            throw new IllegalArgumentException("seeds are SPEC, PROFILE, DEFAULT or CALIBRATED, found " + origin);
        }
        if ((text == null) == Double.isNaN(number)) {
            throw new IllegalArgumentException(key + ": a seed holds either a number or a text");
        }
    }

    public static Seed number(Key key, double value, Derivation.Origin origin, String label, String formula,
                              String source) {
        return new Seed(key, value, null, origin, label, formula, source);
    }

    public static Seed text(Key key, String value, Derivation.Origin origin, String label, String formula,
                            String source) {
        return new Seed(key, Double.NaN, value, origin, label, formula, source);
    }

    public boolean isText() {
        return text != null;
    }

    Derivation derivation(Derivation.Origin as) {
        return new Derivation(key, as, label, List.of(), formula, source);
    }
}
