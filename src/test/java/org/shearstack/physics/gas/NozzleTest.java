package org.shearstack.physics.gas;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class NozzleTest {

    private static final Gas AIR = Gas.AIR;
    private static final double T0 = 293.15;
    private static final double AREA_2MM = Math.PI * 1e-6;

    @Test
    void nz07ChokedMassFlowOfTwoMillimetreThroat() {
        // derived (physics.md §1.3, NZ-07, calc/checks.py): d = 2 mm, 7 bar abs, 293.15 K, Cd = 1 -> 5.1909 g/s
        JetState jet = Nozzle.converging(AREA_2MM, 1.0, 1.0).flow(AIR, 7e5, T0, 1e5);
        assertTrue(jet.choked());
        assertEquals(5.1909e-3, jet.massFlowKgPerS(), 5.1909e-3 * 1e-4);
        assertEquals(Expansion.UNDER_EXPANDED, jet.expansion());
        // the exit plane is sonic at a*
        assertEquals(313.33, jet.exitVelocityMPerS(), 313.33 * 1e-4);
    }

    @Test
    void nz11ThroatDiameterForTargetFlow() {
        // derived (physics.md §1.5, NZ-11): 5 g/s at 4 bar abs, Cd 0.9 -> 2.7371 mm
        double area = Nozzle.chokedThroatAreaM2(AIR, 5e-3, 4e5, T0, 0.9);
        assertEquals(2.7371e-3, Math.sqrt(4 * area / Math.PI), 2.7371e-3 * 1e-4);
    }

    @Test
    void subsonicNozzleExitsAtBackPressure() {
        // derived (physics.md §1.4, NZ-09): p/p0 = 0.7 -> 238.89 m/s
        JetState jet = Nozzle.converging(AREA_2MM, 1.0, 1.0).flow(AIR, 1e5 / 0.7, T0, 1e5);
        assertFalse(jet.choked());
        assertEquals(Expansion.SUBSONIC, jet.expansion());
        assertEquals(238.89, jet.jetVelocityMPerS(), 238.89 * 1e-4);
        assertEquals(T0 - 238.89 * 238.89 / (2 * AIR.cpJPerKgK()), jet.jetStaticTemperatureK(), 0.01);
    }

    @Test
    void nz10IdeallyExpandedConvergingDivergingNozzle() {
        // derived (physics.md §1.4, NZ-10): 7 -> 1 bar abs, Me 1.92826, Ae/A* 1.59096, Ve 501.22 m/s
        Nozzle cd = Nozzle.convergingDiverging(AIR, AREA_2MM, 1.0 / 7.0, 1.0, 1.0);
        assertEquals(1.59096, cd.areaRatio(), 1.59096 * 1e-4);
        JetState jet = cd.flow(AIR, 7e5, T0, 1e5);
        assertEquals(Expansion.IDEAL, jet.expansion());
        assertEquals(1.92826, jet.exitMach(), 1.92826 * 1e-4);
        assertEquals(501.22, jet.jetVelocityMPerS(), 501.22 * 1e-4);
        // static jet temperature far below freezing: icing caution
        assertTrue(jet.jetStaticTemperatureK() < 273.15);
    }

    @Test
    void convergingDivergingFlagsOffDesignBackPressures() {
        Nozzle cd = Nozzle.convergingDiverging(AIR, AREA_2MM, 1.0 / 7.0, 1.0, 1.0);
        assertEquals(Expansion.UNDER_EXPANDED, cd.flow(AIR, 7e5, T0, 0.5e5).expansion());
        assertEquals(Expansion.OVER_EXPANDED, cd.flow(AIR, 7e5, T0, 1.5e5).expansion());
        JetState shock = cd.flow(AIR, 7e5, T0, 5e5);
        assertEquals(Expansion.SHOCK_IN_NOZZLE, shock.expansion());
        assertEquals(5e5, shock.exitPressurePa(), 1.0);
        assertTrue(shock.exitMach() < 1.0);
        // still choked: same mass flow as the ideal case
        assertEquals(cd.flow(AIR, 7e5, T0, 1e5).massFlowKgPerS(), shock.massFlowKgPerS(), 1e-15);
    }

    @Test
    void underExpandedConvergingJetIsBelowIdealExpansion() {
        JetState jet = Nozzle.converging(AREA_2MM, 1.0, 1.0).flow(AIR, 7e5, T0, 1e5);
        assertTrue(jet.jetVelocityMPerS() > Isentropic.criticalVelocity(AIR, T0));
        assertTrue(jet.jetVelocityMPerS() < Isentropic.expansionVelocity(AIR, T0, 1.0 / 7.0));
    }

    @Test
    void massFlowIsContinuousAcrossChoking() {
        Nozzle n = Nozzle.converging(AREA_2MM, 0.9, 1.0);
        double pc = 7e5 * Isentropic.criticalPressureRatio(1.4);
        double above = n.flow(AIR, 7e5, T0, pc * (1 + 1e-9)).massFlowKgPerS();
        double below = n.flow(AIR, 7e5, T0, pc * (1 - 1e-9)).massFlowKgPerS();
        assertEquals(above, below, below * 1e-7);
    }
}
