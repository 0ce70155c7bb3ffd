package org.shearstack.check.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.shearstack.check.Finding;
import org.shearstack.check.Severity;
import org.shearstack.physics.fit.PrintProcess;

/** Fit and stack-up checks on a 608 build (sizes per standards.md B1) with a good and a poor printer. */
class FitAndStackChecksTest {

    static Map<String, Finding> byCode(List<Finding> f) {
        return f.stream().collect(Collectors.toMap(Finding::code, Function.identity()));
    }

    static FitCheck.Inputs build(PrintProcess p, String shaft, String anchor) {
        return new FitCheck.Inputs("608", 8, 22, "H7", 0.05, shaft, 0.0, p, "M3", anchor, 12, 0.1);
    }

    @Test
    void calibratedPrinterGivesGoodSeats() {
        PrintProcess good = new PrintProcess(0.15, 0.05, 0.03);
        Map<String, Finding> f = byCode(FitCheck.run(build(good, "k5", "nut")));
        assertEquals(Severity.OK, f.get("FIT-BEARING-SEAT").severity(), f.get("FIT-BEARING-SEAT").message());
        assertTrue(f.get("FIT-BEARING-SEAT").message().contains("22 H7"));
        // 608 on 8 k5: interference 1 … 15 µm (standards.md T13)
        assertEquals(0.015, f.get("FIT-BEARING-JOURNAL").measured(), 1e-9);
        assertEquals(Severity.OK, f.get("FIT-SCREW-HOLE").severity());
        assertEquals(Severity.OK, f.get("FIT-NUT-POCKET").severity());
        assertEquals(Severity.OK, f.get("FIT-DISC-BORE").severity());
    }

    @Test
    void uncalibratedScatterMakesSeatsAndHolesDoubtful() {
        // ±0.25 mm scatter: seats doubtful; ±0.45 mm: an M3 hole (3.4 mm) may print below 3 mm
        PrintProcess poor = new PrintProcess(0.0, 0.0, 0.25);
        PrintProcess wild = new PrintProcess(0.0, 0.0, 0.45);
        Map<String, Finding> f = byCode(FitCheck.run(build(poor, null, "heat-set")));
        assertEquals(Severity.CAUTION, f.get("FIT-BEARING-SEAT").severity());
        assertTrue(f.get("FIT-BEARING-SEAT").remedy().contains("scatter"));
        Map<String, Finding> g = byCode(FitCheck.run(build(wild, null, "heat-set")));
        assertEquals(Severity.FAIL, g.get("FIT-SCREW-HOLE").severity());
        assertTrue(g.containsKey("FIT-INSERT-PILOT"));
    }

    @Test
    void axialStack() {
        // 10 discs 1.2 ± 0.05 and 9 spacers 0.8 ± 0.05 in a 19.8 ± 0.1 mm chamber → nominal 0.6 mm,
        // worst case ± (0.1 + 19 × 0.05) = ± 1.05 mm, RSS ± √(0.01 + 19 × 0.0025) = ± 0.2398 mm
        StackUpCheck.Axial a = new StackUpCheck.Axial(19.8, 0.1, 10, 1.2, 0.05, 9, 0.8, 0.05, 0, 0, 0.2);
        Finding f = StackUpCheck.axial(a);
        assertEquals(0.6 - 1.05, f.measured(), 1e-9);
        assertEquals(Severity.CAUTION, f.severity());
        Finding tight = StackUpCheck.axial(new StackUpCheck.Axial(19.3, 0.1, 10, 1.2, 0.05, 9, 0.8, 0.05, 0, 0, 0.2));
        assertEquals(Severity.FAIL, tight.severity());
        Finding roomy = StackUpCheck.axial(new StackUpCheck.Axial(21.0, 0.1, 10, 1.2, 0.05, 9, 0.8, 0.05, 0, 0, 0.2));
        assertEquals(Severity.OK, roomy.severity());
    }

    @Test
    void radialStack() {
        // bore 102 ± 0.2, discs 100 ± 0.2, runout 0.2, side play 0.1 → worst min 1 − 0.1 − 0.1 − 0.2 − 0.1 = 0.5
        Finding f = StackUpCheck.radial(new StackUpCheck.Radial(102, 0.2, 100, 0.2, 0.2, 0.1));
        assertEquals(0.5, f.measured(), 1e-9);
        assertEquals(Severity.OK, f.severity());
        Finding rub = StackUpCheck.radial(new StackUpCheck.Radial(100.4, 0.2, 100, 0.2, 0.3, 0.2));
        assertEquals(Severity.FAIL, rub.severity());
    }
}
