package org.shearstack.rules.geometry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.shearstack.check.Finding;
import org.shearstack.check.Severity;
import org.shearstack.check.safety.ContainmentCheck;
import org.shearstack.check.safety.ContainmentInputs;
import org.shearstack.rules.ProfileKeys;
import org.shearstack.rules.SpecKeys;

/**
 * GEO-COVER and GEO-HOUSING-LAYOUT size the cover and its screws so that the containment checks pass by
 * construction at the full supply pressure; and the inversion reproduces the plate check values of physics.md §5.
 */
class ContainmentSizingTest {

    static final double AMBIENT_PA = 101_325;

    /** The geometry demo inputs plus supply pressure, filament (physics.md §4.3 data) and safety factor. */
    static RuleHarness loaded(double barG, double xyMpa, double zMpa, double modulusGpa, double poisson,
            double factor) {
        return GeometryRulesTest.demo().put(SpecKeys.SUPPLY_PRESSURE, AMBIENT_PA + barG * 1e5)
                .put(SpecKeys.SUPPLY_AMBIENT, AMBIENT_PA).put(SpecKeys.TARGETS_SAFETY_FACTOR, factor)
                .put(ProfileKeys.TENSILE_STRENGTH_XY, xyMpa * 1e6).put(ProfileKeys.TENSILE_STRENGTH_Z, zMpa * 1e6)
                .put(ProfileKeys.ELASTIC_MODULUS, modulusGpa * 1e9).put(ProfileKeys.POISSON_RATIO, poisson);
    }

    /** Check values [D] of physics.md §5 (derived there from Timoshenko & Woinowsky-Krieger / Roark). */
    @Test
    void inversionReproducesThePlateCheckValues() {
        // q = 0.2 MPa, a = 50 mm, t = 5 mm, E = 3.5 GPa, ν = 0.36: simply supported σ = 25.20 MPa, w = 1.8377 mm.
        // Strength chosen so the allowed stress is exactly 25.20 MPa: 0.7 × 36 MPa / 1.
        RuleHarness h = loaded(2, 36, 36, 3.5, 0.36, 1).put(SpecKeys.SUPPLY_AMBIENT, AMBIENT_PA);
        RuleInputsView in = new RuleInputsView(h.numbers);
        assertEquals(5.0, ContainmentSizing.coverThicknessMm(in, 100, Double.NaN), 0.002);
        // deflection 1.8377 mm at 5 mm; an end play of an eighth of it needs twice the thickness (w ∝ 1/t³)
        assertEquals(10.0, ContainmentSizing.coverThicknessMm(in, 100, 1.8377 / 8), 0.005);
        // G = 110 mm at 0.2 MPa: separating force 1900.7 N [D]; at 500 N per screw that is 4 screws
        assertEquals(1900.7, ContainmentSizing.separatingForceN(in, 110), 0.05);
        assertEquals(4, ContainmentSizing.screwsForLoad(in, 110, 500));
        assertEquals(3, ContainmentSizing.screwsForLoad(in, 110, 1900.7 / 3 + 0.01));
    }

    @Test
    void containmentChecksPassOnTheSizedDesigns() {
        // PETG (44/25 MPa, 2.0 GPa, ν 0.38) and PLA (50/35 MPa, 3.0 GPa, ν 0.35), physics.md §4.3 / profiles
        for (double bar : new double[] {1, 4, 8}) {
            for (String seal : List.of("o-ring", "gasket", "none")) {
                RuleHarness petg = loaded(bar, 44, 25, 2.0, 0.38, 3).text(SEAL, seal);
                assertNoContainmentFailure(petg.run(GeometryRulesTest.rules()), bar + " bar PETG " + seal);
                RuleHarness pla = loaded(bar, 50, 35, 3.0, 0.35, 2).text(SEAL, seal).text(FASTENER_ANCHOR, "nut");
                assertNoContainmentFailure(pla.run(GeometryRulesTest.rules()), bar + " bar PLA nut " + seal);
            }
        }
    }

    @Test
    void higherPressureAsksForThickerCoversAndMoreScrews() {
        RuleHarness low = loaded(1, 44, 25, 2.0, 0.38, 3).run(GeometryRulesTest.rules());
        RuleHarness high = loaded(8, 44, 25, 2.0, 0.38, 3).run(GeometryRulesTest.rules());
        assertTrue(high.get(COVER_THICKNESS) > low.get(COVER_THICKNESS));
        assertTrue(high.get(BOLT_COUNT) > low.get(BOLT_COUNT));
        assertEquals(0, high.get(COVER_THICKNESS) / 0.25 % 1, 1e-9, "whole 0.25 mm layers");
        assertTrue(high.formulas.get(BOLT_COUNT).contains("separating force"), high.formulas.get(BOLT_COUNT));
        assertTrue(high.formulas.get(COVER_THICKNESS).contains("Timoshenko"), high.formulas.get(COVER_THICKNESS));
        // without a supply pressure the rules fall back to the layout rules alone
        RuleHarness none = GeometryRulesTest.demo().run(GeometryRulesTest.rules());
        assertNotEquals(high.get(BOLT_COUNT), none.get(BOLT_COUNT));
        assertTrue(!none.formulas.get(BOLT_COUNT).contains("separating force"));
    }

    /** Runs the mechanics check on what the rules chose, read the way check.design.Containment reads a design. */
    private static void assertNoContainmentFailure(RuleHarness h, String what) {
        double grooveInner = h.get(GROOVE_INNER_DIAMETER);
        double seal = grooveInner > 0 ? grooveInner + 2 * h.get(GROOVE_WIDTH) : h.get(BOLT_CIRCLE);
        var f = PROFILES_M.get(h.texts.get(FASTENER_SIZE));
        ContainmentInputs in = new ContainmentInputs(h.get(SpecKeys.SUPPLY_PRESSURE), h.get(SpecKeys.SUPPLY_AMBIENT),
                h.get(CHAMBER_DIAMETER), h.get(WALL), h.get(COVER_THICKNESS), h.get(BOLT_CIRCLE), seal,
                (int) Math.round(h.get(BOLT_COUNT)), f[0], f[1], h.get(BOLT_ANCHOR_HOLE), h.get(BOLT_ANCHOR_DEPTH), 0,
                h.get(ProfileKeys.ELASTIC_MODULUS), h.get(ProfileKeys.POISSON_RATIO),
                h.get(ProfileKeys.TENSILE_STRENGTH_XY), h.get(ProfileKeys.TENSILE_STRENGTH_Z), h.get(END_PLAY),
                h.get(SpecKeys.TARGETS_SAFETY_FACTOR));
        for (Finding x : ContainmentCheck.run(in)) {
            if (List.of("COVER-PLATE", "COVER-DEFLECTION", "BOLT-LOAD").contains(x.code())) {
                assertNotEquals(Severity.FAIL, x.severity(), what + ": " + x);
                if (!x.code().equals("BOLT-LOAD")) {
                    assertEquals(Severity.OK, x.severity(), what + ": " + x);
                }
            }
        }
    }

    /** M3 nominal 3 mm, coarse pitch 0.5 mm (ISO 261/262, standards.md §3.5). */
    private static final Map<String, double[]> PROFILES_M = Map.of("M3", new double[] {3, 0.5});

    /** Reads the harness numbers without the declared-reads guard (for the formula checks only). */
    private record RuleInputsView(Map<org.shearstack.rules.Key, Double> numbers) implements org.shearstack.rules.RuleInputs {
        @Override
        public double get(org.shearstack.rules.Key key) {
            return numbers.get(key);
        }

        @Override
        public String text(org.shearstack.rules.Key key) {
            throw new IllegalStateException();
        }

        @Override
        public boolean has(org.shearstack.rules.Key key) {
            return numbers.containsKey(key);
        }

        @Override
        public java.util.Optional<Double> find(org.shearstack.rules.Key key) {
            return java.util.Optional.ofNullable(numbers.get(key));
        }
    }
}
