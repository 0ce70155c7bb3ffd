package org.shearstack.physics.containment;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * HS-01…HS-04 of physics.md §10, derived (physics.md §5, calc/mech.py) from the thin-cylinder and
 * Timoshenko &amp; Woinowsky-Krieger / Roark uniform-load plate formulas.
 */
class ContainmentTest {

    static void assertRel(double expected, double actual, double rel) {
        assertEquals(expected, actual, Math.abs(expected) * rel);
    }

    @Test
    void thinCylinder_HS01() {
        // HS-01: p 0.2 MPa, r 50 mm, t 3 mm → 3.3333 MPa hoop, 1.667 MPa axial; derived (physics.md §5)
        assertRel(3.33333e6, ThinCylinder.hoopStressPa(0.2e6, 0.05, 0.003), 1e-5); // sheet quotes 5 figures
        assertRel(1.66667e6, ThinCylinder.axialStressPa(0.2e6, 0.05, 0.003), 1e-5);
    }

    @Test
    void lameApproachesThinWallForThinWalls() {
        // Lamé thick-cylinder bore stress tends to p r_mean / t as t/r → 0 (any elasticity text)
        double thin = ThinCylinder.hoopStressPa(1e5, 0.1005, 0.001);
        double thick = ThinCylinder.lameBoreHoopStressPa(1e5, 0.100, 0.101);
        assertRel(thin, thick, 1e-4);
    }

    @Test
    void plates_HS02_HS03() {
        double q = 0.2e6;
        double a = 0.05;
        double t = 0.005;
        double e = 3.5e9;
        double nu = 0.36;
        // D = 41.887 N m; derived (physics.md §5)
        assertRel(41.887, CircularPlate.flexuralRigidityNm(e, t, nu), 1e-4);
        // HS-02 clamped: 15.000 MPa, 0.46629 mm
        assertRel(15.000e6, CircularPlate.clampedMaxStressPa(q, a, t), 1e-4);
        assertRel(0.46629e-3, CircularPlate.clampedCentreDeflectionM(q, a, t, e, nu), 1e-4);
        // HS-03 simply supported: 25.200 MPa, 1.83771 mm
        assertRel(25.200e6, CircularPlate.simplySupportedMaxStressPa(q, a, t, nu), 1e-4);
        assertRel(1.83771e-3, CircularPlate.simplySupportedCentreDeflectionM(q, a, t, e, nu), 1e-4);
    }

    @Test
    void simplySupportedOverClampedDeflectionIsTheTextbookRatio() {
        // Timoshenko & Woinowsky-Krieger §15–16: w_ss / w_clamped = (5 + ν)/(1 + ν) (≈ 4 for ν = 0.3)
        double ratio = CircularPlate.simplySupportedCentreDeflectionM(1, 1, 0.01, 1e9, 0.3)
                / CircularPlate.clampedCentreDeflectionM(1, 1, 0.01, 1e9, 0.3);
        assertEquals(5.3 / 1.3, ratio, 1e-12);
    }

    @Test
    void lidForce_HS04() {
        // HS-04: p 0.2 MPa, G 110 mm → 1900.66 N; derived (physics.md §5)
        assertRel(1900.66, BoltedJoint.separatingForceN(0.2e6, 0.110), 1e-5);
        assertEquals(1900.66 / 6 + 10, BoltedJoint.loadPerScrewN(1900.66, 6, 10), 1e-9);
    }

    @Test
    void stressAreaOfM3() {
        // ISO 898-1 tensile stress area of M3 × 0.5: 5.03 mm² (table value, from memory)
        assertEquals(5.03, BoltedJoint.tensileStressAreaMm2(3, 0.5), 0.005);
        // M5 × 0.8: 14.2 mm² (same table, from memory)
        assertEquals(14.2, BoltedJoint.tensileStressAreaMm2(5, 0.8), 0.05);
    }

    @Test
    void bossPullOutGrowsWithEngagement() {
        double shortBoss = BoltedJoint.printedBossPullOutN(4.4, 4, 25e6);
        double longBoss = BoltedJoint.printedBossPullOutN(4.4, 8, 25e6);
        assertEquals(2 * shortBoss, longBoss, 1e-9);
        assertTrue(shortBoss > 500 && shortBoss < 1000, "π·4.4·4 mm² × 12.5 MPa ≈ 691 N, found " + shortBoss);
    }
}
