package org.shearstack.rules.sizing;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.rules.Rule;

/**
 * The flow sizing rule set (ids SIZE-...): supply path, nozzle, disc pack, performance. Registered in
 * {@link org.shearstack.rules.RuleCatalog}.
 */
public final class SizingRules {

    private SizingRules() {
    }

    public static List<Rule> rules() {
        List<Rule> all = new ArrayList<>();
        all.addAll(SupplySizing.rules());
        all.addAll(NozzleSizing.rules());
        all.addAll(RotorSizing.rules());
        all.add(new PerformanceRule());
        return List.copyOf(all);
    }
}
