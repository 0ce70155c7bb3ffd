package org.shearstack.physics.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.shearstack.physics.bearing.RingTolerance;

/**
 * Fit table for a 608 bearing (8 × 22 × 7 mm, ISO 15 sizes per standards.md B1) on metal and in printed seats.
 * Metal fits: T13/T14 and §2.4 of standards.md (computed from the ISO 286 and ring-tolerance tables).
 */
class BearingSeatFitTest {

    static final ToleranceZone OD_608 = RingTolerance.outsideZone(22);
    static final ToleranceZone BORE_608 = RingTolerance.boreZone(8);

    @Test
    void metalFits_T13_T14_J7() {
        // T13: 608 on 8 k5 → interference 1 … 15 µm
        Fit shaft = Fit.between(BORE_608, Iso286.zone(8, "k5"));
        assertEquals(Fit.Kind.INTERFERENCE, shaft.kind());
        assertEquals(-0.015, shaft.minClearanceMm(), 1e-9);
        assertEquals(-0.001, shaft.maxClearanceMm(), 1e-9);
        // T14: 608 in 22 H7 → clearance 0 … 30 µm
        Fit h7 = Fit.between(Iso286.zone(22, "H7"), OD_608);
        assertEquals(Fit.Kind.CLEARANCE, h7.kind());
        assertEquals(0.000, h7.minClearanceMm(), 1e-9);
        assertEquals(0.030, h7.maxClearanceMm(), 1e-9);
        // §2.4: 608 in 22 J7 → 9 µm interference to 21 µm clearance
        Fit j7 = Fit.between(Iso286.zone(22, "J7"), OD_608);
        assertEquals(Fit.Kind.TRANSITION, j7.kind());
        assertEquals(-0.009, j7.minClearanceMm(), 1e-9);
        assertEquals(0.021, j7.maxClearanceMm(), 1e-9);
        // §2.4: 6001 (12 × 28) on 12 k5 → 1 … 17 µm interference; in 28 H7 → 0 … 30 µm clearance
        Fit k5 = Fit.between(RingTolerance.boreZone(12), Iso286.zone(12, "k5"));
        assertEquals(-0.017, k5.minClearanceMm(), 1e-9);
        assertEquals(-0.001, k5.maxClearanceMm(), 1e-9);
        Fit h7b = Fit.between(Iso286.zone(28, "H7"), RingTolerance.outsideZone(28));
        assertEquals(0.030, h7b.maxClearanceMm(), 1e-9);
    }

    @Test
    void printedSeatFor608() {
        // Printer: holes print 0.15 mm small, outer 0.05 mm large (spec sketch example), scatter ± 0.10 mm
        // (typical desktop FFF ± 0.1–0.2 mm, standards.md §7, common practice). Intent: 0.05 mm mean
        // interference (press 0–0.1 mm, standards.md §7).
        PrintProcess printer = new PrintProcess(0.15, 0.05, 0.10);
        PrintedSeat seat = PrintedSeat.hole(OD_608, 0.05, printer);
        double odMean = 22 - 0.0045;
        assertEquals(odMean - 0.05 + 0.15, seat.cadMm(), 1e-9);
        assertEquals(odMean - 0.05 - 0.10, seat.printed().minMm(), 1e-9);
        assertEquals(odMean - 0.05 + 0.10, seat.printed().maxMm(), 1e-9);
        // the fit spans from (0.05 + 0.10 + 0.0045) interference to (0.10 − 0.05 + 0.0045) clearance
        assertEquals(-(0.05 + 0.10 + 0.0045), seat.fit().minClearanceMm(), 1e-9);
        assertEquals(0.10 - 0.05 + 0.0045, seat.fit().maxClearanceMm(), 1e-9);
        assertEquals(Fit.Kind.TRANSITION, seat.fit().kind());
        // With a scatter below the intended interference the printed seat is a true press fit
        PrintedSeat tight = PrintedSeat.hole(OD_608, 0.08, new PrintProcess(0.15, 0.05, 0.03));
        assertEquals(Fit.Kind.INTERFERENCE, tight.fit().kind());
        // Printed journal inside the 608 bore, 0.02 mm clearance intent
        PrintedSeat journal = PrintedSeat.shaft(BORE_608, -0.02, printer);
        assertEquals(8 - 0.004 - 0.02 - 0.05, journal.cadMm(), 1e-9);
        assertTrue(journal.fit().maxClearanceMm() > 0.1);
    }

    @Test
    void fastenerHoles_F1_F2_F5_F6_F9() {
        // F1: ISO 273 M3 3.2 / 3.4 / 3.6; F2: M8 8.4 / 9.0 / 10.0 (EH273, CQW)
        assertEquals(3.2, Fasteners.clearanceHoleMm("M3", Fasteners.Series.FINE), 0);
        assertEquals(3.4, Fasteners.clearanceHoleMm("M3", Fasteners.Series.MEDIUM), 0);
        assertEquals(3.6, Fasteners.clearanceHoleMm("M3", Fasteners.Series.COARSE), 0);
        assertEquals(8.4, Fasteners.clearanceHoleMm("M8", Fasteners.Series.FINE), 0);
        assertEquals(9.0, Fasteners.clearanceHoleMm("M8", Fasteners.Series.MEDIUM), 0);
        assertEquals(10.0, Fasteners.clearanceHoleMm("M8", Fasteners.Series.COARSE), 0);
        // F5: ISO 4032 M3 s max 5.5, m max 2.4, e min 6.01; F6: M8 13.0 / 6.8 (OMDL, CQW)
        assertEquals(5.5, Fasteners.nutAcrossFlatsMaxMm("M3"), 0);
        assertEquals(2.4, Fasteners.nutHeightMaxMm("M3"), 0);
        assertEquals(6.01, Fasteners.nutAcrossCornersMinMm("M3"), 0);
        assertEquals(13.0, Fasteners.nutAcrossFlatsMaxMm("M8"), 0);
        assertEquals(6.8, Fasteners.nutHeightMaxMm("M8"), 0);
        // F9: heat-set pilot M3 4.0 (HSI, common practice)
        assertEquals(4.0, Fasteners.insertPilotMm("M3"), 0);
        assertEquals(5.5 + 0.2 + 0.15, Fasteners.nutPocketAcrossFlatsCadMm("M3", 0.2, new PrintProcess(0.15, 0, 0.1)),
                1e-12);
    }
}
