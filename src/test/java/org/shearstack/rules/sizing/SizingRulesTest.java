package org.shearstack.rules.sizing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.physics.gas.Nozzle;
import org.shearstack.physics.supply.FlowCharacteristic;
import org.shearstack.physics.supply.SupplyPath;
import org.shearstack.profile.Profiles;
import org.shearstack.rules.Derivation;
import org.shearstack.rules.DesignResolver;
import org.shearstack.rules.Engine;
import org.shearstack.rules.PrinterRules;
import org.shearstack.rules.ProfileKeys;
import org.shearstack.rules.Resolution;
import org.shearstack.rules.Rule;
import org.shearstack.rules.Seed;
import org.shearstack.rules.SpecKeys;
import org.shearstack.rules.geometry.GeometryRules;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.Problem;
import org.shearstack.spec.Spec;
import org.shearstack.spec.SpecReader;

class SizingRulesTest {

    private static final String TARGET_SPEC = String.join("\n",
            "name: pinned",
            "supply:",
            "  pressure: 3 bar(g)",
            "  conductance: 0.6 dm3/(s*bar)",
            "  critical-ratio: 0.35",
            "rotor:",
            "  diameter: 80 mm",
            "  gap: 0.8 mm",
            "targets:",
            "  speed: 15000 rpm",
            "");

    static Engine engine() {
        List<Rule> rules = new ArrayList<>(PrinterRules.rules());
        rules.addAll(GeometryRules.rules(org.shearstack.profile.Profiles.shipped()));
        rules.addAll(SizingRules.rules());
        return Engine.of(rules);
    }

    static ResolvedDesign resolve(String yaml) {
        Spec spec = SpecReader.read("test.yaml", yaml).orThrow();
        return DesignResolver.resolve(spec, Profiles.shipped(), engine());
    }

    @Test
    void classroomDemoSizesEverythingFromTheBlowdownAndExplainsIt() {
        Spec spec = SpecReader.read(Path.of("examples/classroom-demo.yaml")).orThrow();
        ResolvedDesign d = DesignResolver.resolve(spec, Profiles.shipped(), engine());
        for (var k : List.of(SpecKeys.ROTOR_DIAMETER, SpecKeys.ROTOR_GAP, SpecKeys.ROTOR_DISCS,
                SpecKeys.ROTOR_DISC_THICKNESS, SpecKeys.ROTOR_EXHAUST_DIAMETER, SpecKeys.NOZZLE_THROAT_AREA,
                SpecKeys.NOZZLE_KIND, SizingKeys.SUPPLY_PATH_CONDUCTANCE, SizingKeys.RUNAWAY_SPEED)) {
            Derivation why = d.derivation(k);
            assertEquals(Derivation.Origin.RULE, why.origin(), k.name());
            assertTrue(why.ruleId().startsWith("SIZE-"), k.name());
            assertTrue(!why.formula().isBlank() && !why.source().isBlank(), k.name());
        }
        // the blow-down's middle reading (24 L, 9.013 -> 6.013 bar(a), 14 s), derived with physics.md §2.3
        assertEquals(0.5897, d.get(SizingKeys.SUPPLY_PATH_CONDUCTANCE) / 1e-8, 5e-4);
        double d2 = d.get(SpecKeys.ROTOR_DIAMETER);
        assertTrue(d2 >= 30 && d2 <= 150, "diameter " + d2);
        assertTrue(d.get(SpecKeys.ROTOR_GAP) >= d.get(org.shearstack.rules.geometry.GeoKeys.GAP_MIN));
        assertTrue(d.get(SizingKeys.RUNAWAY_UPPER_BOUND) >= d.get(SizingKeys.RUNAWAY_SPEED));
        assertTrue(d.get(SizingKeys.RUNAWAY_SPEED) > d.get(SizingKeys.OPERATING_SPEED));
        assertTrue(d.get(SizingKeys.ELECTRICAL_POWER) > 0);
        assertTrue(d.get(SizingKeys.ELECTRICAL_POWER) < d.get(SizingKeys.OPERATING_POWER));
        // exhaust ratio chosen inside the searched range
        double ratio = d.get(SpecKeys.ROTOR_EXHAUST_DIAMETER) / d2;
        assertTrue(ratio > 0.29 && ratio < 0.61, "r1/r2 " + ratio);
        // the design never runs above the disc's allowable speed, and the derivation says so
        assertTrue(d.get(SizingKeys.OPERATING_SPEED) * d2 / 2000 <= d.get(SizingKeys.ROTOR_TIP_SPEED) + 1e-9
                || d.derivation(SizingKeys.OPERATING_SPEED).formula().contains("at or below the allowable"));
        assertTrue(d.derivation(SizingKeys.OPERATING_SPEED).formula().contains("at or below the allowable"),
                d.derivation(SizingKeys.OPERATING_SPEED).formula());
        // gap no wider than the larger of the preferred gap and 4 Ekman thicknesses (physics.md §3.8b, from memory)
        double omega = d.get(SizingKeys.ROTOR_TIP_SPEED) * 2000 / d2;
        double bound = Math.max(d.get(org.shearstack.rules.geometry.GeoKeys.GAP_PREFERRED),
                4 * SizingModel.ekmanMm(omega)) + d.get(ProfileKeys.LAYER_HEIGHT);
        assertTrue(d.get(SpecKeys.ROTOR_GAP) <= bound, d.get(SpecKeys.ROTOR_GAP) + " > " + bound);
        boolean atBound = d.get(SizingKeys.GAP_AT_SEARCH_BOUND) == 1.0;
        assertEquals(atBound, d.derivation(SpecKeys.ROTOR_GAP).formula().contains("AT THE SEARCH BOUND"));
    }

    @Test
    void pinsAreKeptAndTheRestIsSizedAroundThem() {
        ResolvedDesign d = resolve(TARGET_SPEC);
        assertEquals(80.0, d.get(SpecKeys.ROTOR_DIAMETER));
        assertEquals(Derivation.Origin.PINNED, d.derivation(SpecKeys.ROTOR_DIAMETER).origin());
        assertTrue(d.overridden(SpecKeys.ROTOR_DIAMETER).isPresent());
        assertEquals(0.8, d.get(SpecKeys.ROTOR_GAP));
        assertEquals(0.6e-8, d.get(SizingKeys.SUPPLY_PATH_CONDUCTANCE), 1e-15);
        assertEquals(0.35, d.get(SizingKeys.SUPPLY_CRITICAL_PRESSURE_RATIO));
        // with a target speed the operating point is at that speed
        assertEquals(15000 * Math.PI / 30, d.get(SizingKeys.OPERATING_SPEED), 1e-9);
        // the disc count was optimised for the pinned diameter and gap: within the pack-height limit
        int discs = (int) Math.round(d.get(SpecKeys.ROTOR_DISCS));
        assertTrue(discs >= 3 && discs <= RotorSizing.maxDiscs(80, 0.8, d.get(SpecKeys.ROTOR_DISC_THICKNESS)));
    }

    @Test
    void withoutPinsTheDiameterFollowsTheDesignRimSpeedAtTheTargetSpeed() {
        ResolvedDesign d = resolve(TARGET_SPEC.replace("  diameter: 80 mm\n", ""));
        double expected = 2000 * d.get(SizingKeys.ROTOR_TIP_SPEED) / (15000 * Math.PI / 30);
        assertEquals(Math.round(expected * 2) / 2.0, d.get(SpecKeys.ROTOR_DIAMETER), 1e-9);
    }

    @Test
    void aSpecWithoutAnyAirSupplyMeasureIsLocatedBadInput() {
        BadInputException e = assertThrows(BadInputException.class,
                () -> resolve("name: x\nsupply:\n  pressure: 3 bar(g)\n"));
        List<String> p = e.problems().stream().map(Problem::format).toList();
        assertTrue(p.stream().anyMatch(s -> s.contains("supply.conductance: expected one of supply.conductance,"
                + " supply.free-air-flow or supply.blowdown")), String.join("\n", p));
    }

    @Test
    void impossibleSupplyAndPackValuesAreLocatedBadInput() {
        BadInputException up = assertThrows(BadInputException.class, () -> resolve(String.join("\n",
                "name: x", "supply:", "  pressure: 3 bar(g)", "  blowdown:", "    tank: 24 L", "    from: 5 bar(g)",
                "    to: 8 bar(g)", "    time: 10 s", "")));
        assertTrue(up.problems().stream().map(Problem::format).anyMatch(
                s -> s.contains("supply.blowdown.to: expected")),
                up.problems().toString());
        BadInputException ex = assertThrows(BadInputException.class,
                () -> resolve(TARGET_SPEC.replace("  diameter: 80 mm\n", "  exhaust-diameter: 300 mm\n")));
        // the diameter is sized (about 60 mm at 15 000 rpm), so only the SIZE- rule can see the contradiction
        assertTrue(ex.problems().stream().map(Problem::format).anyMatch(
                s -> s.contains("rotor.exhaust-diameter: expected an exhaust diameter below the disc diameter")),
                ex.problems().toString());
    }

    @Test
    void freeAirFlowGivesTheConductance() {
        // C = Q/p1 when the path is choked into ambient (ISO 6358 definition): 120 L/min at 6 bar(g) over 1.01325
        ResolvedDesign d = resolve(TARGET_SPEC.replace("  conductance: 0.6 dm3/(s*bar)\n",
                "  free-air-flow: 120 L/min at 6 bar(g)\n"));
        assertEquals(0.002 / 701_325.0, d.get(SizingKeys.SUPPLY_PATH_CONDUCTANCE), 1e-15);
    }

    @Test
    void tipSpeedLimitIsTheBurstChecksAllowableSpeed() {
        // Holed-disc peak hoop stress (3+ν)/4·ρω²[b² + (1−ν)/(3+ν)·a²] (Timoshenko & Goodier §32; physics.md §4.1)
        // with a/b = 0.6, the port allowance 1.5 and S = 0.7 × 50 MPa / 3 (physics.md §4.3, §12.7):
        // v = √(S/1.5 / ((3.36/4)·1240·(1 + 0.64/3.36·0.36))) = 83.594 m/s, derived (physics.md §4.1–§4.2).
        Rule rule = SizingRules.rules().stream().filter(r -> r.id().equals("SIZE-TIP-SPEED-LIMIT")).findFirst()
                .orElseThrow();
        Resolution r = Engine.of(List.of(rule)).resolve("t", "t.yaml", List.of(
                Seed.number(ProfileKeys.DENSITY, 1240, Derivation.Origin.PROFILE, "pla", "", ""),
                Seed.number(ProfileKeys.POISSON_RATIO, 0.36, Derivation.Origin.PROFILE, "pla", "", ""),
                Seed.number(ProfileKeys.TENSILE_STRENGTH_XY, 50e6, Derivation.Origin.PROFILE, "pla", "", ""),
                Seed.number(SpecKeys.TARGETS_SAFETY_FACTOR, 3, Derivation.Origin.SPEC, "t", "", "")));
        double limit = r.design().get(SizingKeys.ROTOR_TIP_SPEED_LIMIT);
        assertEquals(83.594, limit, 0.001);
        // and the same number the BURST-RUNAWAY check's assessment gives a 60 mm disc ported out to 36 mm
        org.shearstack.physics.stress.BurstAssessment a = org.shearstack.physics.stress.BurstAssessment.of(
                org.shearstack.physics.stress.SpinningAnnulus.withExhaustPorts(0.030, 0.018), 1240, 0.36,
                org.shearstack.physics.stress.PrintedStrength.inPlanePa(50e6),
                new org.shearstack.physics.stress.SafetyFactor(3), 1000);
        assertEquals(a.allowableSpeedRadPerS() * 0.030, limit, 1e-9 * limit);
    }

    @Test
    void throatMaximisesJetPowerOfTheSupply() {
        SupplyPath supply = new SupplyPath(3e5 + 101_325, 293.15, 101_325,
                FlowCharacteristic.ofDm3PerSBar(0.6, 0.35));
        ResolvedDesign d = resolve(TARGET_SPEC);
        double a = d.get(SpecKeys.NOZZLE_THROAT_AREA) * 1e-6;
        double best = NozzleSizing.jetPowerW(supply, Nozzle.converging(a, 0.85, FlowParts.VELOCITY_COEFFICIENT));
        for (double f : new double[] {0.8, 1.25}) {
            double other = NozzleSizing.jetPowerW(supply,
                    Nozzle.converging(f * a, 0.85, FlowParts.VELOCITY_COEFFICIENT));
            assertTrue(best > other, f + ": " + best + " <= " + other);
        }
    }
}
