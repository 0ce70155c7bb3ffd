package org.shearstack.physics.supply;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;
import org.shearstack.physics.gas.Gas;
import org.shearstack.physics.gas.Nozzle;

class SupplyTest {

    private static final Gas AIR = Gas.AIR;
    private static final double T0 = 293.15;
    private static final double DM3 = ReferenceAtmosphere.DM3_PER_S_BAR;

    private static void assertRelative(double expected, double actual, double tolerance) {
        assertEquals(expected, actual, Math.abs(expected) * tolerance, () -> "expected " + expected + " got " + actual);
    }

    @Test
    void referenceAtmosphereIsNearlyAPerfectGasState() {
        // ISO 8778:2003 values (corroborated secondarily, physics.md §2.1): rho0 R T0 = 99 716 Pa, within 0.3 % of p0
        double p = ReferenceAtmosphere.DENSITY_KG_PER_M3 * AIR.gasConstantJPerKgK() * ReferenceAtmosphere.TEMPERATURE_K;
        assertEquals(99_716, p, 1.0);
    }

    @Test
    void pn01ChokedIso6358Flow() {
        // derived (physics.md §2.1, PN-01, calc/checks.py): C = 1 dm3/(s bar), 7 bar abs -> 8.295 g/s
        FlowCharacteristic c = FlowCharacteristic.ofDm3PerSBar(1.0, 0.5);
        assertRelative(8.295e-3, c.massFlowKgPerS(7e5, 1e5, T0), 1e-6);
    }

    @Test
    void pn02SubsonicEllipticBranch() {
        // derived (physics.md §2.1, PN-02): b = 0.3, 2 -> 1.5 bar, m = 0.5 -> 1.81539 g/s, 0.765986 of choked
        FlowCharacteristic c = FlowCharacteristic.ofDm3PerSBar(1.0, 0.3);
        double q = c.massFlowKgPerS(2e5, 1.5e5, T0);
        assertRelative(1.81539e-3, q, 1e-5);
        assertRelative(0.765986, q / c.chokedMassFlowKgPerS(2e5, T0), 1e-5);
        // the branch meets the choked value at b and falls to zero at p2 = p1
        assertRelative(c.chokedMassFlowKgPerS(2e5, T0), c.massFlowKgPerS(2e5, 0.6e5, T0), 1e-12);
        assertEquals(0.0, c.massFlowKgPerS(2e5, 2e5, T0));
    }

    @Test
    void pn03IdealOrificeConductance() {
        // derived (physics.md §2.1, PN-03): 1 mm2, Cd = 1 -> 0.19919 dm3/(s bar); b = p*/p0
        FlowCharacteristic c = FlowCharacteristic.ofOrifice(AIR, 1e-6, 1.0);
        assertRelative(0.19919, c.conductanceDm3PerSBar(), 1e-4);
        assertRelative(0.528282, c.criticalRatio(), 1e-6);
        assertRelative(1e-6, c.effectiveAreaM2(AIR), 1e-12);
    }

    @Test
    void pn04To06BlowdownConductances() {
        // derived (physics.md §2.3, PN-04..06, calc/checks.py): 24 L, 8 -> 4 bar abs in 10 s, 293.15 K
        Blowdown test = new Blowdown(0.024, 8e5, 4e5, 10.0, T0);
        assertRelative(1.6683, test.conductanceM3PerSPa(AIR, TankProcess.ISOTHERMAL) / DM3, 1e-4);
        assertRelative(1.2526, test.conductanceM3PerSPa(AIR, TankProcess.adiabatic(1.4)) / DM3, 1e-4);
        assertRelative(1.4312, test.conductanceM3PerSPa(AIR, TankProcess.polytropic(1.2)) / DM3, 1e-4);
        BlowdownEstimate e = test.estimate(AIR);
        assertTrue(e.isothermalM3PerSPa() > e.middleM3PerSPa() && e.middleM3PerSPa() > e.adiabaticM3PerSPa());
        assertEquals(0.145, e.spreadFraction(), 0.005);
    }

    @Test
    void adiabaticConductanceReproducesTheTestWhenIntegrated() {
        // derived (physics.md §2.3): an ODE of the adiabatic tank with C_adiabatic reaches 4.000 bar at 10 s, 240.5 K
        double c = new Blowdown(0.024, 8e5, 4e5, 10.0, T0).conductanceM3PerSPa(AIR, TankProcess.adiabatic(1.4));
        FlowCharacteristic path = new FlowCharacteristic(c, 0.5, 0.5);
        OrdinaryDifferentialEquation tank = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                double md = path.massFlowKgPerS(y[0], 1e5, y[1]);
                double dp = -1.4 * AIR.gasConstantJPerKgK() * y[1] * md / 0.024;
                return new double[] {dp, y[1] * 0.4 / 1.4 * dp / y[0]};
            }
        };
        double[] end = new DormandPrince853Integrator(1e-6, 1.0, 1e-6, 1e-11)
                .integrate(tank, new ODEState(0.0, new double[] {8e5, T0}), 10.0).getPrimaryState();
        assertRelative(4e5, end[0], 1e-6);
        assertEquals(240.5, end[1], 0.05);
    }

    @Test
    void pn07SeriesSupplyAndNozzleByRootFinding() {
        // derived (physics.md §2.1, PN-07, calc/more.py): C_s 1.668, b_s 0.3, 8 bar; nozzle 2 mm, Cd 0.85; 1 bar
        SupplyPath supply = new SupplyPath(8e5, T0, 1e5, FlowCharacteristic.ofDm3PerSBar(1.668, 0.3));
        Nozzle nozzle = Nozzle.converging(Math.PI * 1e-6, 0.85, 1.0);
        SeriesFlow flow = SeriesSolver.solve(AIR, supply, nozzle, 1e5);
        assertRelative(7.7277e5, flow.plenumPressurePa(), 1e-3);
        assertRelative(4.8709e-3, flow.massFlowKgPerS(), 1e-3);
        // the two flows agree at the plenum pressure
        assertRelative(supply.path().massFlowKgPerS(8e5, flow.plenumPressurePa(), T0), flow.massFlowKgPerS(), 1e-9);
        // equivalent C 0.514 dm3/(s bar); the 1/C^3 shortcut (from memory) gives 0.526, about 2.4 % high
        assertEquals(0.514, flow.equivalentConductanceM3PerSPa(supply) / DM3, 0.001);
    }

    @Test
    void seriesFlowFallsToZeroAsBackPressureReachesSupply() {
        SupplyPath supply = new SupplyPath(8e5, T0, 1e5, FlowCharacteristic.ofDm3PerSBar(1.668, 0.3));
        Nozzle nozzle = Nozzle.converging(Math.PI * 1e-6, 0.85, 1.0);
        double previous = Double.MAX_VALUE;
        for (double pb = 1e5; pb < 8e5; pb += 0.5e5) {
            double m = SeriesSolver.solve(AIR, supply, nozzle, pb).massFlowKgPerS();
            assertTrue(m <= previous + 1e-15);
            previous = m;
        }
        assertEquals(0.0, SeriesSolver.solve(AIR, supply, nozzle, 8e5).massFlowKgPerS());
    }

    @Test
    void pn08TankRunTime() {
        // derived (physics.md §2.2, PN-08): 24 L, 8 -> 5 bar abs, 4.4 g/s, isothermal -> 19.45 s
        assertRelative(19.45, TankRunTime.isothermalConstantFlowS(AIR, 0.024, 8e5, 5e5, T0, 4.4e-3), 1e-3);
        assertTrue(TankRunTime.compressorKeepsUp(1e-3, 1e-3));
        assertFalse(TankRunTime.compressorKeepsUp(2e-3, 1e-3));
    }

    @Test
    void freeAirFlowCharacteristic() {
        // a choked path passing 600 L/min ANR at 7 bar abs has C = Q/p1 = 1.4286 dm3/(s bar) (definition, ISO 6358)
        FlowCharacteristic c = FlowCharacteristic.fromFreeAirFlow(0.01, 7e5, 1e5, 0.3, 0.5);
        assertRelative(0.01 / 7e5, c.conductanceM3PerSPa(), 1e-12);
    }

    @Test
    void tradeBlowdownCaseMeansConductanceNotJetSpeed() {
        // Common practice, no published source: a 100 L receiver blown down from 10 to 6.5 bar(g) through the
        // supply path in 64 s; the mean free-air flow over a 6 mm bore is quoted as close to 190 m/s.
        // Ambient 1.013 bar(a) assumed. Values below derived here with the formulas of physics.md §2.3.
        Blowdown test = new Blowdown(0.100, 11.013e5, 7.513e5, 64.0, T0);
        BlowdownEstimate e = test.estimate(AIR);
        assertEquals(0.5993, e.isothermalM3PerSPa() / DM3, 5e-4);
        assertEquals(0.5074, e.middleM3PerSPa() / DM3, 5e-4);
        assertEquals(0.4400, e.adiabaticM3PerSPa() / DM3, 5e-4);
        // the path stays choked to the end for any b above 0.135, so the test cannot tell b
        assertTrue(test.staysChoked(1.013e5, 0.14));
        FreeAirSpeed speed = FreeAirSpeed.of(AIR, test, 0.006, 1.013e5);
        assertEquals(194.0, speed.freeAirSpeedMPerS(), 0.5); // near the trade's "about 190 m/s"
        // the air in the hose is compressed about 9 times and really moves at about 21 m/s
        assertEquals(20.9, speed.meanHoseSpeedMPerS(), 0.1);
        // the jet at a sonic throat is 313 m/s whatever the flow (NZ-08)
        assertRelative(313.33, speed.sonicJetSpeedMPerS(), 1e-4);
        assertTrue(speed.expandedJetSpeedMPerS() > speed.sonicJetSpeedMPerS());
    }
}
