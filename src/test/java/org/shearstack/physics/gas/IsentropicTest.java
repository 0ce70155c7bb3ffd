package org.shearstack.physics.gas;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class IsentropicTest {

    private static final double G = 1.4;
    private static final Gas AIR = Gas.AIR;
    private static final double T0 = 293.15;

    private static void assertRelative(double expected, double actual, double tolerance) {
        assertEquals(expected, actual, Math.abs(expected) * tolerance, () -> "expected " + expected + " got " + actual);
    }

    // ---- Outside checks: published compressible-flow tables for gamma = 1.4 ----

    @Test
    void criticalStateMatchesTables() {
        // Aeronautical Engineer Data Book, Table A4.2, M = 1 row: p/p0 = 0.5283, rho/rho0 = 0.6339, T/T0 = 0.8333
        // (same functions as NACA Report 1135, Ames Research Staff 1953; physics.md §1.1).
        assertEquals(0.5283, Isentropic.criticalPressureRatio(G), 5e-5);
        assertEquals(0.6339, Isentropic.criticalDensityRatio(G), 5e-5);
        assertEquals(0.8333, Isentropic.criticalTemperatureRatio(G), 5e-5);
        assertEquals(0.5283, Isentropic.pressureRatio(G, 1.0), 5e-5);
    }

    @Test
    void machHalfRowMatchesTables() {
        // Textbook Table A.1 and MathWorks flowisentropic, M = 0.5: p/p0 = 0.8430, A/A* = 1.3398 (physics.md §1.1).
        assertEquals(0.8430, Isentropic.pressureRatio(G, 0.5), 5e-5);
        assertEquals(1.3398, Isentropic.areaRatio(G, 0.5), 5e-5);
    }

    @Test
    void areaRatioAtMachTwoMatchesTables() {
        // NACA Report 1135 (1953), isentropic table, M = 2.00: A/A* = 1.6875.
        assertEquals(1.6875, Isentropic.areaRatio(G, 2.0), 5e-5);
    }

    // ---- Derived values (physics.md §1, calc/checks.py) ----

    @Test
    void nz01To05CriticalAndTableFunctions() {
        // derived (physics.md §1.2 and §10 NZ-01..NZ-05, calc/checks.py)
        assertRelative(0.528282, Isentropic.criticalPressureRatio(G), 1e-6);
        assertRelative(0.833333, Isentropic.criticalTemperatureRatio(G), 1e-6);
        assertRelative(0.633938, Isentropic.criticalDensityRatio(G), 1e-6);
        assertRelative(1.6875, Isentropic.areaRatio(G, 2.0), 1e-6);
        assertRelative(1.33984, Isentropic.areaRatio(G, 0.5), 1e-5);
        assertRelative(0.843019, Isentropic.pressureRatio(G, 0.5), 1e-5);
        assertRelative(0.127805, Isentropic.pressureRatio(G, 2.0), 1e-5);
        assertRelative(0.555556, Isentropic.temperatureRatio(G, 2.0), 1e-5);
    }

    @Test
    void nz06ChokedFluxConstant() {
        // derived (physics.md §1.3, NZ-06, calc/checks.py): K = 0.0404149 kg K^0.5/(N s)
        assertRelative(0.0404149, Isentropic.chokedFluxConstant(AIR), 1e-5);
    }

    @Test
    void nz12SubsonicFluxMeetsChokedFluxAtCriticalRatio() {
        // derived (physics.md §1.3, NZ-12): both give 1652.32 kg/(m2 s) at 7 bar, 293.15 K
        double sub = Isentropic.subsonicMassFlux(AIR, 7e5, T0, Isentropic.criticalPressureRatio(G));
        double choked = Isentropic.chokedMassFlux(AIR, 7e5, T0);
        assertRelative(1652.32, choked, 1e-5);
        assertRelative(choked, sub, 1e-9);
    }

    @Test
    void nz08To10Velocities() {
        // derived (physics.md §1.4, NZ-08..NZ-10, calc/checks.py)
        assertRelative(313.33, Isentropic.criticalVelocity(AIR, T0), 1e-4);
        assertRelative(238.89, Isentropic.expansionVelocity(AIR, T0, 0.7), 1e-4);
        double me = Isentropic.machFromPressureRatio(G, 1.0 / 7.0);
        assertRelative(1.92826, me, 1e-4);
        assertRelative(1.59096, Isentropic.areaRatio(G, me), 1e-4);
        assertRelative(501.22, Isentropic.expansionVelocity(AIR, T0, 1.0 / 7.0), 1e-4);
        assertRelative(767.5, Isentropic.maximumVelocity(AIR, T0), 1e-4);
    }

    @Test
    void ap01SutherlandViscosity() {
        // derived (physics.md §0, AP-01): 1.8133e-5 Pa s at 293.15 K; constants from memory (White, Viscous Fluid Flow)
        assertRelative(1.8133e-5, AIR.viscosityPaS(T0), 1e-4);
    }

    @Test
    void areaMachInverseRoundTripsOnBothBranches() {
        for (double m : new double[] {0.05, 0.3, 0.5, 0.9, 1.2, 2.0, 3.5}) {
            double ratio = Isentropic.areaRatio(G, m);
            assertRelative(m, Isentropic.machFromAreaRatio(G, ratio, m > 1.0), 1e-10);
        }
        assertThrows(IllegalArgumentException.class, () -> Isentropic.machFromAreaRatio(G, 0.9, true));
    }
}
