package org.shearstack.rules;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.profile.Profiles;

/**
 * The one place where rule sets are registered. Each domain keeps its rules in its own class and returns
 * them as a list; this class concatenates them. Rules that look up hardware tables receive the loaded
 * {@link Profiles}.
 */
public final class RuleCatalog {

    private RuleCatalog() {
    }

    /** Every rule of the tool. */
    public static List<Rule> rules(Profiles profiles) {
        List<Rule> all = new ArrayList<>();
        all.addAll(PrinterRules.rules());
        // geometry (GEO-) and flow sizing (SIZE-) go in together: geometry reads the sized rotor and nozzle
        all.addAll(org.shearstack.rules.geometry.GeometryRules.rules(profiles));
        all.addAll(org.shearstack.rules.sizing.SizingRules.rules());
        return List.copyOf(all);
    }

    /** An engine over every rule (orders them; throws RuleGraphException if the set is inconsistent). */
    public static Engine engine(Profiles profiles) {
        return Engine.of(rules(profiles));
    }
}
