package org.shearstack.physics.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** RD-01…RD-05 and BL-01/02 of physics.md §10; U1–U4 of standards.md §8. */
class DynamicsTest {

    static void assertRel(double expected, double actual, double rel) {
        assertEquals(expected, actual, Math.abs(expected) * rel);
    }

    @Test
    void uniformShaft_RD01() {
        // RD-01: steel d 25 mm, L 600 mm, E 207 GPa, γ 76.5 kN/m³ → 882.81 rad/s (8430 rpm). Problem as in
        // Shigley's Mechanical Engineering Design (uniform shaft example; answer 883 rad/s from memory);
        // value derived with g = 9.81 (physics.md §6.1, calc/mech.py).
        double rho = 76.5e3 / 9.81;
        double w = CriticalSpeed.uniformShaftSimplySupportedRadPerS(207e9, 0.025, 0.600, rho);
        assertRel(882.81, w, 1e-3);
        assertEquals(8430, w * 60 / (2 * Math.PI), 5);
    }

    @Test
    void staticDeflectionRule_RD02() {
        // RD-02: 1 mm static deflection ↔ 945.81 rpm with g = 9.81 (derived, physics.md §6.1);
        // huntsvilleengineers page: "roughly 946 rpm" (outside value).
        assertRel(945.81, CriticalSpeed.fromStaticDeflectionRadPerS(1e-3, 9.81) * 60 / (2 * Math.PI), 1e-4);
        assertEquals(946, CriticalSpeed.fromStaticDeflectionRadPerS(1e-3) * 60 / (2 * Math.PI), 0.5);
    }

    @Test
    void centralMass_RD03_andOverhung() {
        // RD-03: steel d 6 mm (E 200 GPa), span 60 mm, 0.1 kg at mid-span → k 2.8274e6 N/m, 5317.36 rad/s;
        // overhung 20 mm → 65 961 rpm. Derived (physics.md §6.1, calc/mech.py).
        double i = CriticalSpeed.roundShaftSecondMomentM4(0.006);
        double k = CriticalSpeed.simplySupportedCentralStiffnessNPerM(200e9, i, 0.060);
        assertRel(2.8274e6, k, 1e-4);
        assertRel(5317.36, CriticalSpeed.singleMassRadPerS(k, 0.1), 1e-4);
        double ko = CriticalSpeed.overhungStiffnessNPerM(200e9, i, 0.020);
        assertRel(65_961, CriticalSpeed.singleMassRadPerS(ko, 0.1) * 60 / (2 * Math.PI), 1e-4);
        // The general off-centre formula 3EIL/(a²b²) reduces to 48EI/L³ at mid-span (beam tables)
        assertRel(k, CriticalSpeed.simplySupportedStiffnessNPerM(200e9, i, 0.060, 0.030), 1e-12);
    }

    @Test
    void dunkerley_RD04() {
        // RD-04: ω_s 3000, ω_d 5317 rad/s → 2612.80 rad/s; derived (physics.md §6.1)
        double w = CriticalSpeed.dunkerleyRadPerS(3000, 5317);
        assertRel(2612.80, w, 1e-4);
        assertTrue(w < 3000);
    }

    @Test
    void rayleighOfSingleMassIsExact() {
        // Rayleigh with one mass reduces to √(g/δ) (Shigley Eq. 7-23)
        double w = CriticalSpeed.rayleighRadPerS(new double[] {0.1}, new double[] {2e-4});
        assertRel(CriticalSpeed.fromStaticDeflectionRadPerS(2e-4), w, 1e-12);
        // Two masses on a simply supported shaft: Rayleigh is an upper bound above Dunkerley
        double e = 200e9;
        double i = CriticalSpeed.roundShaftSecondMomentM4(0.01);
        double l = 0.3;
        double m1 = 2;
        double m2 = 3;
        // influence coefficients a_ij for loads at 0.1 and 0.2 m (beam tables)
        double a11 = 1 / CriticalSpeed.simplySupportedStiffnessNPerM(e, i, l, 0.1);
        double a22 = 1 / CriticalSpeed.simplySupportedStiffnessNPerM(e, i, l, 0.2);
        double a12 = 0.1 * 0.1 * (l * l - 0.1 * 0.1 - 0.1 * 0.1) / (6 * e * i * l); // b = 0.1 from the far end, x = 0.1
        double g = CriticalSpeed.G;
        double y1 = g * (m1 * a11 + m2 * a12);
        double y2 = g * (m1 * a12 + m2 * a22);
        double ray = CriticalSpeed.rayleighRadPerS(new double[] {m1, m2}, new double[] {y1, y2});
        double dun = CriticalSpeed.dunkerleyRadPerS(1 / Math.sqrt(m1 * a11), 1 / Math.sqrt(m2 * a22));
        // exact first eigenvalue of the 2-DOF system
        double p = m1 * a11 + m2 * a22;
        double q = m1 * m2 * (a11 * a22 - a12 * a12);
        double lambda = (p + Math.sqrt(p * p - 4 * q)) / 2;
        double exact = 1 / Math.sqrt(lambda);
        assertTrue(dun <= exact && exact <= ray, dun + " <= " + exact + " <= " + ray);
        assertRel(exact, ray, 0.01);
    }

    @Test
    void packInertia_RD05() {
        // RD-05: 8 PLA discs t 1 mm, r_o 50, r_i 10 mm → 9.7234e-5 kg m²; 9.349 g each. Derived (physics.md §6.1)
        assertRel(9.7234e-5, 8 * RotorMass.annulusInertiaKgM2(1240, 0.001, 0.05, 0.01), 1e-4);
        assertRel(9.349e-3, RotorMass.annulusMassKg(1240, 0.001, 0.05, 0.01), 1e-3);
    }

    @Test
    void balance_BL01_BL02_U1toU4() {
        // BL-01: G2.5, 3000 rpm, 1 kg → 7.9577 µm, 7.9577 g mm (ISO 21940-11 relation G = e_per·Ω; derived)
        double w3000 = Balance.radPerS(3000);
        assertRel(7.9577, Balance.permissibleEccentricityMicrometres(2.5, w3000), 1e-4);
        assertRel(7.9577, Balance.permissibleUnbalanceGramMm(2.5, w3000, 1.0), 1e-4);
        // BL-02: G6.3, 30 000 rpm, 0.05 kg → 2.0054 µm, 0.10027 g mm
        double w30k = Balance.radPerS(30_000);
        assertRel(2.0054, Balance.permissibleEccentricityMicrometres(6.3, w30k), 1e-4);
        assertRel(0.10027, Balance.permissibleUnbalanceGramMm(6.3, w30k, 0.05), 1e-4);
        // standards.md §8 U1–U4 (formula per vibromera/Erbessd pages): Ω 3141.59 rad/s; e_per 0.7958 µm;
        // U_per 0.0398 g mm; m 0.2 kg, G6.3, 10 000 rpm → 1.2032 g mm
        assertEquals(3141.59, w30k, 0.01);
        assertEquals(0.7958, Balance.permissibleEccentricityMicrometres(2.5, w30k), 0.0001);
        assertEquals(0.0398, Balance.permissibleUnbalanceGramMm(2.5, w30k, 0.05), 0.0001);
        assertEquals(1.2032, Balance.permissibleUnbalanceGramMm(6.3, Balance.radPerS(10_000), 0.2), 0.0005);
        // Erbessd shortcut U = 9549·G·m/n (g mm, kg, rpm) agrees
        assertRel(9549 * 6.3 * 0.2 / 10_000, Balance.permissibleUnbalanceGramMm(6.3, Balance.radPerS(10_000), 0.2),
                1e-4);
    }

    @Test
    void printedOffsetAsAGrade() {
        // physics.md §6.2 (derived): 50 µm mass-centre offset at 30 000 rpm ≈ G157
        assertEquals(157, Balance.equivalentGradeMmPerS(50, Balance.radPerS(30_000)), 0.5);
        assertEquals(100 + 25, Balance.printedEccentricityMicrometres(0.1, 0.05, 8, true), 1e-9);
        assertEquals(100 / Math.sqrt(4) + 25, Balance.printedEccentricityMicrometres(0.1, 0.05, 4, false), 1e-9);
        assertEquals(6.3, Balance.parseGradeMmPerS("G6.3"), 0);
    }
}
