package org.shearstack.check.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.shearstack.check.CheckCatalog;
import org.shearstack.check.Finding;
import org.shearstack.check.print.PartPrintability;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.geom.GeometryContext;
import org.shearstack.rules.Derivation;
import org.shearstack.rules.Key;
import org.shearstack.rules.geometry.GeometryRules;
import org.shearstack.rules.geometry.RuleHarness;
import org.shearstack.rules.geometry.TestDesigns;
import org.shearstack.spec.Dimension;

/**
 * The checks on a design resolved by the real GEO- rules (the parts tests' 80 mm demo, a scenario of our own),
 * with PETG data (physics.md §4.3) and a 5 bar(g) supply: every check judges it, none is skipped, and the part
 * printability runs on the real part recipes.
 */
class GeometryDemoTest {

    static ResolvedDesign demo() {
        RuleHarness h = TestDesigns.demoInputs().run(GeometryRules.rules(org.shearstack.profile.Profiles.shipped()));
        Map<Key, Double> n = new HashMap<>(h.numbers);
        Map<Key, String> t = new HashMap<>(h.texts);
        n.put(Key.of("supply.pressure", Dimension.PRESSURE), 101_325 + 5e5);
        n.put(Key.of("supply.ambient", Dimension.PRESSURE), 101_325.0);
        n.put(Key.of("supply.temperature", Dimension.TEMPERATURE), 293.15);
        n.put(Key.of("filament.density", Dimension.DENSITY), 1270.0);
        n.put(Key.of("filament.poisson-ratio", Dimension.DIMENSIONLESS), 0.38);
        n.put(Key.of("filament.elastic-modulus", Dimension.STRESS), 2.0e9);
        n.put(Key.of("filament.tensile-strength-xy", Dimension.STRESS), 44e6);
        n.put(Key.of("filament.tensile-strength-z", Dimension.STRESS), 25e6);
        n.put(Key.of("filament.softening-temperature", Dimension.TEMPERATURE), 348.15);
        n.put(Key.of("printer.compensation-scatter", Dimension.LENGTH), 0.05);
        n.put(Key.of("printer.min-clearance", Dimension.LENGTH), 0.3);
        n.put(Key.of("printer.max-overhang", Dimension.ANGLE), 45.0);
        n.put(Key.of("printer.max-bridge", Dimension.LENGTH), 10.0);
        t.put(Key.of("rotor.balance-grade", Dimension.TEXT), "G6.3");
        Map<Key, Derivation> d = new HashMap<>();
        n.keySet().forEach(k -> d.put(k, new Derivation(k, Derivation.Origin.RULE, "test", List.of(), "", "")));
        t.keySet().forEach(k -> d.put(k, new Derivation(k, Derivation.Origin.RULE, "test", List.of(), "", "")));
        return ResolvedDesign.of("demo", "demo.yaml", n, t, d, Map.of());
    }

    @Test
    void everyDesignCheckJudgesTheRuleResolvedDemo() {
        List<Finding> f = CheckCatalog.run(demo(), RunawaySource.lockedFlowBound());
        List<Finding> skipped = f.stream().filter(x -> x.message().contains("not checked")).toList();
        assertEquals(List.of(), skipped);
        Set<String> codes = f.stream().map(Finding::code).collect(Collectors.toSet());
        assertTrue(codes.containsAll(List.of("BURST-RUNAWAY", "HOUSING-HOOP", "COVER-PLATE", "BOLT-LOAD",
                "CRITICAL-SPEED", "UNBALANCE", "BEARING-DN", "FIT-BEARING-SEAT", "STACK-AXIAL", "STACK-RADIAL")), codes.toString());
    }

    @Test
    void partsOfTheDemoAreJudgedForPrintability() {
        // three small parts keep the test fast; the command runs all of them
        Set<String> some = Set.of("rotor-disc", "hub-shaft", "coupling-hub-turbine");
        List<Finding> f = PartPrintability.run(demo(), GeometryContext.withChordTolerance(0.05), some::contains);
        assertTrue(f.stream().allMatch(x -> some.contains(x.part())), f.toString());
        assertTrue(f.stream().noneMatch(x -> x.code().equals("PRINTABILITY")), f.toString());
        // every finding names its part and, being geometric, its place
        assertTrue(f.stream().allMatch(x -> !x.part().isEmpty() && x.where().isKnown()), f.toString());
    }
}
