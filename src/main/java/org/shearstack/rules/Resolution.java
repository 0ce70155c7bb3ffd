package org.shearstack.rules;

import java.util.List;
import org.shearstack.design.ResolvedDesign;

/**
 * What the engine produced: the design, and the inputs that were missing (rules that needed them were
 * skipped, and so were the rules downstream of them). An empty list means every rule ran.
 */
public record Resolution(ResolvedDesign design, List<MissingInput> missing, List<InputRejectedException> rejected) {

    public Resolution {
        missing = List.copyOf(missing);
        rejected = List.copyOf(rejected);
    }

    public boolean complete() {
        return missing.isEmpty() && rejected.isEmpty();
    }
}
