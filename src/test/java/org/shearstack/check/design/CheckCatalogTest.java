package org.shearstack.check.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.shearstack.check.CheckCatalog;
import org.shearstack.check.Finding;
import org.shearstack.check.Severity;
import org.shearstack.check.safety.RunawayModel;
import org.shearstack.check.safety.SafetySummary;
import org.shearstack.design.ResolvedDesign;

/** The catalogue on hand-written designs: every check runs, codes are present, bad designs fail. */
class CheckCatalogTest {

    @Test
    void shopAirOnLargePrintedDiscsFailsAndReportsTheSafePressure() {
        ResolvedDesign d = TestDesigns.petg(6, 100).build();
        List<Finding> f = CheckCatalog.run(d, RunawaySource.lockedFlowBound());
        Set<String> codes = f.stream().map(Finding::code).collect(Collectors.toSet());
        for (String c : List.of("BURST-RUNAWAY", "HOUSING-HOOP", "COVER-PLATE", "COVER-DEFLECTION", "BOLT-LOAD",
                "CRITICAL-SPEED", "UNBALANCE", "BEARING-DN", "SEAT-TEMP", "FIT-BEARING-SEAT", "FIT-BEARING-JOURNAL",
                "FIT-SCREW-HOLE", "FIT-INSERT-PILOT", "FIT-DISC-BORE", "STACK-AXIAL", "STACK-RADIAL")) {
            assertTrue(codes.contains(c), "missing " + c + " in " + codes);
        }
        assertFalse(CheckCatalog.passes(f));
        Finding burst = f.stream().filter(x -> x.code().equals("BURST-RUNAWAY") && x.part().equals("rotor-disc"))
                .findFirst().orElseThrow();
        assertEquals(Severity.FAIL, burst.severity());
        SafetySummary s = CheckCatalog.safetySummary(d, RunawaySource.lockedFlowBound()).orElseThrow();
        assertTrue(s.maxSafeSupplyPressureBarG() > 0 && s.maxSafeSupplyPressureBarG() < 6, s.toString());
        assertTrue(s.runawaySpeedRpm() > s.allowableSpeedRpm());
        assertTrue(f.get(0).severity() == Severity.FAIL, "worst first");
    }

    @Test
    void lossyRotorOnLowPressurePassesTheBurstCheck() {
        // invented lossy model for the test: 600 rad/s per √bar(g)
        RunawaySource lossy = v -> variant -> 600 * Math.sqrt(Math.max(0,
                (variant.supplyPressurePa() - 101_325) / 1e5));
        ResolvedDesign d = TestDesigns.petg(1, 80).build();
        List<Finding> f = CheckCatalog.run(d, lossy);
        f.stream().filter(x -> x.code().startsWith("BURST"))
                .forEach(x -> assertEquals(Severity.OK, x.severity(), x.message()));
        SafetySummary s = CheckCatalog.safetySummary(d, lossy).orElseThrow();
        assertEquals(Math.pow(s.allowableSpeedRadPerS() / 600, 2), s.maxSafeSupplyPressureBarG(), 1e-3);
    }

    @Test
    void missingValuesAreReportedNotThrown() {
        ResolvedDesign d = TestDesigns.petg(6, 100).without("rotor.diameter").without("housing.wall").build();
        List<Finding> f = CheckCatalog.run(d, RunawaySource.lockedFlowBound());
        Finding burst = f.stream().filter(x -> x.code().equals("BURST-RUNAWAY")).findFirst().orElseThrow();
        assertTrue(burst.message().contains("rotor.diameter"), burst.message());
        Finding hoop = f.stream().filter(x -> x.code().equals("HOUSING-HOOP")).findFirst().orElseThrow();
        assertTrue(hoop.message().contains("housing.wall"), hoop.message());
    }

    @Test
    void hoopSectionIsTheRingLessPlenumAndAnchorHole() {
        // ring 103 → 143 mm: 20 mm of material, less a 5.5 mm plenum and a 4.2 mm anchor hole = 10.3 mm
        ResolvedDesign d = TestDesigns.petg(6, 100)
                .n("housing.outside-diameter", org.shearstack.spec.Dimension.LENGTH, 143)
                .n("housing.plenum-diameter", org.shearstack.spec.Dimension.LENGTH, 5.5).build();
        Finding hoop = new Containment().run(d).stream().filter(x -> x.code().equals("HOUSING-HOOP")).findFirst()
                .orElseThrow();
        double a = 0.0515;
        double b = a + 0.0103;
        assertEquals(6e5 * (b * b + a * a) / (b * b - a * a) / 1e6, hoop.measured(), 1e-6);
    }

    @Test
    void slowModelsAreAskedOncePerQuestion() {
        int[] calls = {0};
        RunawaySource counting = v -> variant -> {
            calls[0]++;
            return 100;
        };
        CheckCatalog.run(TestDesigns.petg(3, 80).build(), counting);
        // burst (design + ceiling), dynamics and bearings share the design-pressure answer
        assertEquals(2, calls[0]);
        RunawayModel.Variant.atPressure(1); // the variant type is a value: equal variants share answers
    }
}
