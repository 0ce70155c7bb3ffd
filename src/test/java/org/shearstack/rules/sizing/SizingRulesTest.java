package org.shearstack.rules.sizing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.profile.Profiles;
import org.shearstack.rules.DesignResolver;
import org.shearstack.rules.Engine;
import org.shearstack.rules.Key;
import org.shearstack.rules.PrinterRules;
import org.shearstack.rules.Rule;
import org.shearstack.rules.SpecKeys;
import org.shearstack.rules.geometry.GeometryRules;
import org.shearstack.spec.Spec;
import org.shearstack.spec.SpecReader;

class SizingRulesTest {

    static Engine engine() {
        List<Rule> rules = new ArrayList<>(PrinterRules.rules());
        rules.addAll(GeometryRules.rules());
        rules.addAll(SizingRules.rules());
        return Engine.of(rules);
    }

    static ResolvedDesign resolve(String yaml) {
        Spec spec = SpecReader.read("test.yaml", yaml).orThrow();
        return DesignResolver.resolve(spec, Profiles.shipped(), engine());
    }

    @Test
    void classroomDemoSizesFromTheBlowdown() {
        Spec spec = SpecReader.read(Path.of("examples/classroom-demo.yaml")).orThrow();
        ResolvedDesign d = DesignResolver.resolve(spec, Profiles.shipped(), engine());
        for (Key k : d.keys()) {
            if (k.name().startsWith("rotor.") || k.name().startsWith("nozzle.") || k.name().startsWith("performance.")
                    || k.name().startsWith("supply.")) {
                System.out.println(k.name() + " = " + d.display(k));
            }
        }
        System.out.println(d.explain(SpecKeys.ROTOR_GAP));
        System.out.println(d.explain(SizingKeys.RUNAWAY_UPPER_BOUND));
        assertTrue(d.get(SpecKeys.ROTOR_DIAMETER) >= 30);
        assertTrue(d.get(SizingKeys.RUNAWAY_UPPER_BOUND) >= d.get(SizingKeys.RUNAWAY_SPEED));
    }
}
