package org.shearstack.physics.stress;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Check values ST-01…ST-07 of physics.md §10. They are derived (physics.md §4.1–4.2, calc/mech.py) from the
 * Timoshenko &amp; Goodier §32 closed forms; the outside checks are the closed-form identities themselves
 * (boundary conditions, the "hole doubles the peak" limit).
 */
class RotatingDiscTest {

    static final double RHO_PLA = 1240;
    static final double NU_PLA = 0.36;
    static final double B = 0.050;
    static final double A = 0.005;
    static final double W_10K = 10_000 * 2 * Math.PI / 60;
    static final double REL = 1e-5;

    static void assertRel(double expected, double actual, double rel) {
        assertEquals(expected, actual, Math.abs(expected) * rel);
    }

    static double rpm(double radPerS) {
        return radPerS * 60 / (2 * Math.PI);
    }

    @Test
    void solidPeakStress_ST01() {
        // ST-01: 1.42780 MPa, derived (physics.md §4.1, calc/mech.py)
        assertRel(1.42780e6, RotatingDisc.solidPeakStressPa(RHO_PLA, NU_PLA, W_10K, B), REL);
    }

    @Test
    void holedDiscPeaks_ST02_ST03() {
        // ST-02: 2.86104 MPa hoop at the bore; ST-03: 1.15652 MPa radial max; derived (physics.md §4.1, calc/mech.py)
        assertRel(2.86104e6, RotatingDisc.holedPeakHoopStressPa(RHO_PLA, NU_PLA, W_10K, A, B), REL);
        assertRel(1.15652e6, RotatingDisc.holedPeakRadialStressPa(RHO_PLA, NU_PLA, W_10K, A, B), REL);
    }

    @Test
    void thinRing_ST04() {
        // ST-04: 3.39953 MPa, derived (physics.md §4.1); σ = ρv² is the textbook thin-ring result
        assertRel(3.39953e6, RotatingDisc.thinRingHoopStressPa(RHO_PLA, W_10K, B), REL);
    }

    @Test
    void lameFieldMeetsItsBoundaryConditionsAndPeaks() {
        // Timoshenko & Goodier §32: free edges (σ_r = 0 at a and b), hoop peak at the bore, radial peak at √(ab)
        assertEquals(0, RotatingDisc.holedRadialStressPa(RHO_PLA, NU_PLA, W_10K, A, B, A), 1e-6);
        assertEquals(0, RotatingDisc.holedRadialStressPa(RHO_PLA, NU_PLA, W_10K, A, B, B), 1e-6);
        assertRel(RotatingDisc.holedPeakHoopStressPa(RHO_PLA, NU_PLA, W_10K, A, B),
                RotatingDisc.holedHoopStressPa(RHO_PLA, NU_PLA, W_10K, A, B, A), 1e-12);
        assertRel(RotatingDisc.holedPeakRadialStressPa(RHO_PLA, NU_PLA, W_10K, A, B),
                RotatingDisc.holedRadialStressPa(RHO_PLA, NU_PLA, W_10K, A, B, Math.sqrt(A * B)), 1e-12);
        assertEquals(0, RotatingDisc.solidRadialStressPa(RHO_PLA, NU_PLA, W_10K, B, B), 1e-9);
    }

    @Test
    void tinyHoleDoublesPeak() {
        // Timoshenko & Goodier §32: a very small hole doubles the maximum stress of the solid disc
        double solid = RotatingDisc.solidPeakStressPa(RHO_PLA, NU_PLA, W_10K, B);
        double holed = RotatingDisc.holedPeakHoopStressPa(RHO_PLA, NU_PLA, W_10K, 1e-7, B);
        assertRel(2 * solid, holed, 1e-9);
    }

    @Test
    void burstSpeeds_ST05_ST06_and_section42Values() {
        // ST-05: 59 177 rpm; ST-06: 66 426 rpm (S = 50 MPa); §4.2 holed 41 804 rpm; S = 25 MPa: 41 844 / 29 560 /
        // 46 970 rpm. All derived (physics.md §4.2, calc/mech.py); quoted to 5 significant figures.
        assertRel(59_177, rpm(BurstSpeed.peakStressSolidRadPerS(50e6, RHO_PLA, NU_PLA, B)), 1e-4);
        assertRel(66_426, rpm(BurstSpeed.meanHoopRadPerS(50e6, RHO_PLA, 0, B)), 1e-4);
        assertRel(41_804, rpm(BurstSpeed.peakStressHoledRadPerS(50e6, RHO_PLA, NU_PLA, A, B)), 1e-4);
        assertRel(41_844, rpm(BurstSpeed.peakStressSolidRadPerS(25e6, RHO_PLA, NU_PLA, B)), 1e-4);
        assertRel(29_560, rpm(BurstSpeed.peakStressHoledRadPerS(25e6, RHO_PLA, NU_PLA, A, B)), 1e-4);
        assertRel(46_970, rpm(BurstSpeed.meanHoopRadPerS(25e6, RHO_PLA, 0, B)), 1e-4);
    }

    @Test
    void allowableTipSpeed_ST07() {
        // ST-07: 154.92 m/s solid; §4.2 109.5 m/s small hole (S_allow 12.5 MPa); derived (physics.md §4.2)
        assertRel(154.92, BurstSpeed.allowableTipSpeedMPerS(12.5e6, RHO_PLA, NU_PLA, false), 1e-4);
        assertEquals(109.5, BurstSpeed.allowableTipSpeedMPerS(12.5e6, RHO_PLA, NU_PLA, true), 0.05);
    }

    @Test
    void burstSpeedIsWhereThePeakReachesStrength() {
        double w = BurstSpeed.peakStressHoledRadPerS(30e6, RHO_PLA, NU_PLA, A, B);
        assertRel(30e6, RotatingDisc.holedPeakHoopStressPa(RHO_PLA, NU_PLA, w, A, B), 1e-12);
    }

    @Test
    void badGeometryIsRefusedWithTheValues() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> RotatingDisc.holedPeakHoopStressPa(RHO_PLA, NU_PLA, W_10K, 0.06, 0.05));
        assertTrue(e.getMessage().contains("0.06"), e.getMessage());
    }
}
