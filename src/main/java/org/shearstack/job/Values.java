package org.shearstack.job;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.rules.Key;

/** Reads a design by key name and remembers which required keys were missing. */
final class Values {

    private final ResolvedDesign design;
    private final List<String> missing = new ArrayList<>();

    Values(ResolvedDesign design) {
        this.design = design;
    }

    /** A required number in its canonical unit; NaN and noted when absent. */
    double need(String name) {
        double v = optional(name);
        if (Double.isNaN(v)) {
            missing.add(name);
        }
        return v;
    }

    /** An optional number; NaN when absent. */
    double optional(String name) {
        Optional<Key> k = design.key(name);
        return k.isPresent() ? design.find(k.get()).orElse(Double.NaN) : Double.NaN;
    }

    /** An optional text; "" when absent. */
    String text(String name) {
        Optional<Key> k = design.key(name);
        return k.isPresent() ? design.findText(k.get()).orElse("") : "";
    }

    boolean complete() {
        return missing.isEmpty();
    }

    List<String> missing() {
        return List.copyOf(missing);
    }
}
