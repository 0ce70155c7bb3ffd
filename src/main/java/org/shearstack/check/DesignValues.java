package org.shearstack.check;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.rules.Key;
import java.util.Optional;

/**
 * Reads a design for a check and remembers what was missing, so the check can say so instead of failing.
 * Absent numbers read as NaN, absent texts as "".
 */
public final class DesignValues {

    private final ResolvedDesign design;
    private final java.util.Set<String> missing = new java.util.LinkedHashSet<>();

    public DesignValues(ResolvedDesign design) {
        this.design = design;
    }

    public ResolvedDesign design() {
        return design;
    }

    /** A required number in the key's canonical unit; NaN (and noted) when absent. */
    public double need(String name) {
        double v = optional(name);
        if (Double.isNaN(v)) {
            missing.add(name);
        }
        return v;
    }

    /** An optional number in the key's canonical unit; NaN when absent. */
    public double optional(String name) {
        Optional<Key> k = design.key(name);
        return k.isPresent() ? design.find(k.get()).orElse(Double.NaN) : Double.NaN;
    }

    /** An optional text; "" when absent. */
    public String text(String name) {
        Optional<Key> k = design.key(name);
        return k.isPresent() ? design.findText(k.get()).orElse("") : "";
    }

    /** A required text; "" (and noted) when absent. */
    public String needText(String name) {
        String t = text(name);
        if (t.isEmpty()) {
            missing.add(name);
        }
        return t;
    }

    public boolean complete() {
        return missing.isEmpty();
    }

    public List<String> missing() {
        return List.copyOf(missing);
    }

    /** The finding a check returns when the design lacks what it needs. */
    public Finding notChecked(String code, String what) {
        return Findings.of(code, Severity.CAUTION,
                String.format(Locale.ROOT, "%s not checked: the design has no value for %s.", what,
                        String.join(", ", missing)),
                Double.NaN, Double.NaN, "", Double.NaN, "", what, "complete the design (or pin the missing values)");
    }
}
