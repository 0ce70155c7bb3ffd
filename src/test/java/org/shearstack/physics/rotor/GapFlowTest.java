package org.shearstack.physics.rotor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.shearstack.physics.rotor.GapFlowClosedForm.KAPPA;

import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.shearstack.physics.gas.Gas;
import org.shearstack.physics.rotor.GapMarch.Integration;

/**
 * Case "ROT" of physics.md §3.5: air rho 1.2 kg/m3, mu 1.8e-5 Pa s, b 0.4 mm, r2 50 mm, r1 20 mm, 0.5 g/s per gap,
 * 2000 rad/s, W2 = 50 m/s. All values derived (physics.md §3.3-§3.5, calc/rotor.py, calc/sweep.py).
 */
class GapFlowTest {

    private static final double RHO = 1.2;
    private static final double MU = 1.8e-5;
    private static final double B = 0.4e-3;
    private static final double R2 = 0.05;
    private static final double R1 = 0.02;
    private static final double MG = 0.5e-3;
    private static final double OMEGA = 2000.0;
    private static final double W2 = 50.0;
    private static final GapFluid FLUID = GapFluid.incompressible(Gas.AIR, RHO, MU);

    private static void assertRelative(double expected, double actual, double tolerance) {
        assertEquals(expected, actual, Math.abs(expected) * tolerance, () -> "expected " + expected + " got " + actual);
    }

    private static double lambda() {
        return GapFlowClosedForm.lambdaPerM2(MU, B, MG);
    }

    private static GapSolution march(double omega, double w2, Integration integration) {
        return GapMarch.march(FLUID, FrictionClosure.LAMINAR, B, R2, R1, new GapInlet(MG, omega, 2e5, 293.15, w2),
                integration, 40);
    }

    @Test
    void rt01SlipDecayConstant() {
        assertRelative(6785.84, lambda(), 1e-6);
    }

    @Test
    void rt07bSlipDecayNumberAndResidualSlip() {
        assertRelative(5.93761, GapFlowClosedForm.slipDecayNumber(lambda(), R2, R1), 1e-5);
        assertRelative(0.736828, GapFlowClosedForm.residualSlipRatio(MU, B, MG, R1), 1e-5);
    }

    @Test
    void rt02ClosedFormOutletSwirlAndRt03Torque() {
        // RT-02 corrected in physics.md §12.1: 29.725169 m/s
        double w1 = GapFlowClosedForm.relativeSwirlMPerS(lambda(), OMEGA, R2, W2, R1);
        assertRelative(29.725169, w1, 1e-6);
        assertRelative(3.24330e-3, GapFlowClosedForm.torquePerGapNm(MG, OMEGA, R2, W2, R1, w1), 1e-6);
    }

    @Test
    void closedFormEqualsOdeIntegration() {
        double closed = GapFlowClosedForm.relativeSwirlMPerS(lambda(), OMEGA, R2, W2, R1);
        assertRelative(closed, march(OMEGA, W2, Integration.ADAPTIVE).outletRelativeSwirlMPerS(), 1e-9);
        assertRelative(closed, march(OMEGA, W2, Integration.EXPONENTIAL).outletRelativeSwirlMPerS(), 1e-12);
    }

    @Test
    void rt04EulerTorqueEqualsWallShearIntegral() {
        double lam = lambda();
        double w1 = GapFlowClosedForm.relativeSwirlMPerS(lam, OMEGA, R2, W2, R1);
        double euler = GapFlowClosedForm.torquePerGapNm(MG, OMEGA, R2, W2, R1, w1);
        // two walls, parabolic-profile shear 6 mu W / b, moment arm r, area 2 pi r dr
        double shear = new IterativeLegendreGaussIntegrator(5, 1e-14, 1e-18).integrate(10_000,
                r -> 2.0 * (6.0 * MU * GapFlowClosedForm.relativeSwirlMPerS(lam, OMEGA, R2, W2, r) / B)
                        * 2.0 * Math.PI * r * r, R1, R2);
        assertRelative(euler, shear, 1e-9);
    }

    @Test
    void rt05InviscidLimitGivesZeroTorque() {
        double w1 = GapFlowClosedForm.relativeSwirlMPerS(0.0, OMEGA, R2, W2, R1);
        assertEquals(0.0, GapFlowClosedForm.torquePerGapNm(MG, OMEGA, R2, W2, R1, w1), 1e-12);
        double w1small = GapFlowClosedForm.relativeSwirlMPerS(1e-9, OMEGA, R2, W2, R1);
        assertEquals(0.0, GapFlowClosedForm.torquePerGapNm(MG, OMEGA, R2, W2, R1, w1small), 1e-12);
    }

    @Test
    void rt06PressureDropAndRt07Efficiency() {
        GapSolution s = march(OMEGA, W2, Integration.ADAPTIVE);
        double dp = 2e5 - s.outletPressurePa();
        assertRelative(9418.9, dp, 1e-4);
        assertRelative(dp, 2e5 - march(OMEGA, W2, Integration.EXPONENTIAL).outletPressurePa(), 1e-4);
        double eta = efficiency(OMEGA, W2, s);
        assertRelative(0.72782, eta, 1e-4);
    }

    private static double efficiency(double omega, double w2, GapSolution s) {
        double u2 = -MG / (2 * Math.PI * RHO * B * R2);
        double u1 = -MG / (2 * Math.PI * RHO * B * R1);
        double ke2 = GapFlowClosedForm.kineticEnergyJPerKg(u2, omega, R2, w2);
        double ke1 = GapFlowClosedForm.kineticEnergyJPerKg(u1, omega, R1, s.outletRelativeSwirlMPerS());
        double work = GapFlowClosedForm.torquePerGapNm(MG, omega, R2, w2, R1, s.outletRelativeSwirlMPerS()) * omega / MG;
        return work / ((2e5 - s.outletPressurePa()) / RHO + ke2 - ke1);
    }

    @Test
    void rt07cFlatJetSweepPoint() {
        // flat jet V_theta 150 m/s entering with W2 = (V_theta - Omega r2)/kappa (calc/sweep.py)
        double w2 = GapFlowClosedForm.inletRelativeSwirlMPerS(150.0, OMEGA, R2);
        assertRelative((150.0 - 100.0) / KAPPA, w2, 1e-12);
        GapSolution s = march(OMEGA, w2, Integration.ADAPTIVE);
        assertRelative(2.994e-3, GapFlowClosedForm.torquePerGapNm(MG, OMEGA, R2, w2, R1, s.outletRelativeSwirlMPerS()),
                1e-3);
        assertRelative(0.746, efficiency(OMEGA, w2, s), 1e-3);
        assertRelative(9183, 2e5 - s.outletPressurePa(), 1e-3);
    }

    @Test
    void rt08ZeroRotationLimitIsLaminarRadialFlowBetweenDiscs() {
        // Bird, Stewart & Lightfoot radial flow between parallel discs: dp = 6 mu Q ln(r2/r1)/(pi h^3);
        // RT-08 (physics.md §3.8): 49.218 Pa for Q = 1e-4 m3/s, h = 0.4 mm, r2/r1 = 2.5.
        double q = 1e-4;
        double viscous = 6 * MU * q * Math.log(R2 / R1) / (Math.PI * B * B * B);
        assertRelative(49.218, viscous, 1e-4);
        GapSolution s = GapMarch.march(FLUID, FrictionClosure.LAMINAR, B, R2, R1,
                new GapInlet(RHO * q, 0.0, 100.0, 293.15, 0.0), Integration.ADAPTIVE, 40);
        assertEquals(0.0, s.outletRelativeSwirlMPerS(), 1e-12);
        // the march adds the radial-inertia term rho kappa Q^2 (1/r1^2 - 1/r2^2)/(8 pi^2 h^2) of our closure
        double inertia = RHO * KAPPA * q * q * (1 / (R1 * R1) - 1 / (R2 * R2)) / (8 * Math.PI * Math.PI * B * B);
        assertRelative(viscous, 100.0 - s.outletPressurePa() - inertia, 1e-9);
    }

    @Test
    void compressibleMarchFastSchemeMatchesHipparchusReference() {
        GapFluid air = GapFluid.compressible(Gas.AIR);
        for (FrictionClosure closure : FrictionClosure.values()) {
            GapInlet inlet = new GapInlet(MG, OMEGA, 1.5e5, 293.15, 120.0);
            GapSolution fast = GapMarch.march(air, closure, B, R2, R1, inlet, Integration.EXPONENTIAL, 40);
            GapSolution ref = GapMarch.march(air, closure, B, R2, R1, inlet, Integration.ADAPTIVE, 40);
            assertTrue(fast.ok() && ref.ok());
            // the fast scheme (40 clustered steps) is a map-speed approximation of the reference
            assertRelative(ref.outletRelativeSwirlMPerS(), fast.outletRelativeSwirlMPerS(), 5e-4);
            assertRelative(1.5e5 - ref.outletPressurePa(), 1.5e5 - fast.outletPressurePa(), 5e-4);
        }
    }

    @Test
    void compressibleMarchConservesRothalpySoEnthalpyDropEqualsEulerWork() {
        double t0 = 293.15;
        Gas air = Gas.AIR;
        GapInlet inlet = new GapInlet(MG, OMEGA, 1.5e5, t0, 120.0);
        GapSolution s = GapMarch.march(GapFluid.compressible(air), FrictionClosure.BLENDED, B, R2, R1, inlet,
                Integration.ADAPTIVE, 40);
        double u1 = -MG / (2 * Math.PI * s.outletDensityKgPerM3() * B * R1);
        double h0out = air.cpJPerKgK() * s.outletTemperatureK()
                + GapFlowClosedForm.kineticEnergyJPerKg(u1, OMEGA, R1, s.outletRelativeSwirlMPerS());
        double work = GapFlowClosedForm.torquePerGapNm(MG, OMEGA, R2, 120.0, R1, s.outletRelativeSwirlMPerS()) * OMEGA
                / MG;
        assertRelative(work, air.cpJPerKgK() * t0 - h0out, 1e-9);
    }

    @Test
    void frictionClosureIsLaminarBelowAndBlasiusAbove() {
        FrictionClosure f = FrictionClosure.BLENDED;
        assertEquals(1.0, f.multiplier(500.0), 1e-3);
        double re = 1e5;
        // Blasius (1913) f = 0.0791 Re^-0.25 over the plane-Poiseuille f = 24/Re
        assertRelative(0.0791 * Math.pow(re, -0.25) / (24.0 / re), f.multiplier(re), 1e-6);
        assertEquals(2039, FrictionClosure.TRANSITION_REYNOLDS, 1);
        double previous = 1.0;
        for (double r = 100; r < 1e6; r *= 1.1) {
            assertTrue(f.multiplier(r) >= previous);
            previous = f.multiplier(r);
        }
        assertEquals(1.0, FrictionClosure.LAMINAR.multiplier(1e6));
    }
}
