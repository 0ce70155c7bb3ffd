package org.shearstack.rules;

import java.util.List;
import java.util.Objects;

/**
 * Why a value has the value it has.
 *
 * @param key     the value's key
 * @param origin  where it came from
 * @param ruleId  the rule that wrote it; for pins and inputs the spec key path
 * @param inputs  the keys read and their values at the time
 * @param formula the formula in words
 * @param source  the source (standard, book and equation, profile file, or "common practice")
 */
public record Derivation(Key key, Origin origin, String ruleId, List<Input> inputs, String formula, String source) {

    public Derivation {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(origin, "origin");
        inputs = List.copyOf(inputs);
    }

    /** One recorded input: the key and the value it had, already formatted for people. */
    public record Input(Key key, String value) {
    }

    public enum Origin {
        /** Written by the user in the spec for a quantity a rule would otherwise derive. */
        PINNED,
        /** A plain input from the spec (supply pressure, generator data). */
        SPEC,
        /** Read from a profile file. */
        PROFILE,
        /** A stated default used because the spec left the key out. */
        DEFAULT,
        /** Computed by a rule. */
        RULE,
        /** Fitted from the user's bench data (a calibration file). */
        CALIBRATED
    }
}
