package org.shearstack.physics.rotor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.shearstack.physics.rotor.GapMarch.Integration;

/** Behaviour of the coupled model on an invented demo design (DemoDesigns). */
class TurbineModelTest {

    private static final TurbineModel DEMO = DemoDesigns.demo();

    @Test
    void runawayIsWhereShaftTorqueVanishes() {
        double runaway = DEMO.runawaySpeedRadPerS();
        assertTrue(runaway > 0);
        assertEquals(0.0, DEMO.at(runaway).shaftTorqueNm(), 1e-6);
        assertTrue(DEMO.at(0.9 * runaway).shaftTorqueNm() > 0);
        assertTrue(DEMO.at(1.1 * runaway).shaftTorqueNm() < 0);
    }

    @Test
    void curveRunsFromStallToRunawayWithFallingTorque() {
        PerformanceCurve curve = DEMO.curve(20);
        List<OperatingPoint> pts = curve.points();
        assertEquals(20, pts.size());
        assertEquals(0.0, pts.get(0).speedRadPerS());
        assertEquals(curve.runawaySpeedRadPerS(), pts.get(19).speedRadPerS(), 1e-9);
        assertEquals(pts.get(0).shaftTorqueNm(), curve.stallTorqueNm());
        for (int i = 1; i < pts.size(); i++) {
            assertTrue(pts.get(i).shaftTorqueNm() < pts.get(i - 1).shaftTorqueNm());
        }
        OperatingPoint peak = curve.peakPower();
        assertTrue(peak.shaftPowerW() > 0 && peak.speedRadPerS() > 0 && peak.speedRadPerS() < curve.runawaySpeedRadPerS());
    }

    @Test
    void energyAndAngularMomentumBoundsHoldAtEveryPoint() {
        double cosAngle = Math.cos(Math.toRadians(DEMO.geometry().jetAngleDeg()));
        for (OperatingPoint p : DEMO.curve(15).points()) {
            assertTrue(p.flowing());
            // no angular momentum from nothing (physics.md §12.2): the rotor cannot take more than the jet brings
            double maxTorque = p.massFlowKgPerS() * DEMO.geometry().outerRadiusM() * p.jetVelocityMPerS() * cosAngle;
            assertTrue(p.rotorTorqueNm() <= maxTorque, () -> "torque " + p.rotorTorqueNm() + " > " + maxTorque);
            assertTrue(p.shaftPowerW() <= p.isentropicPowerW());
            assertTrue(p.efficiency() < 1.0);
            // the parasitic terms are all named and resist rotation
            ParasiticTorques d = p.parasitic();
            assertEquals(d.endFacesNm() + d.rimNm() + d.bearingLoadNm() + d.bearingSpeedNm() + d.sealsNm(), d.totalNm(),
                    1e-15);
            assertEquals(p.rotorTorqueNm() - d.totalNm(), p.shaftTorqueNm(), 1e-15);
        }
    }

    @Test
    void bandBracketsTheEstimateAndSafetyUsesItsTop() {
        PerformanceMap map = DEMO.map(8);
        double est = map.runawaySpeedRadPerS();
        double opt = map.optimistic().runawaySpeedRadPerS();
        double pes = map.pessimistic().runawaySpeedRadPerS();
        assertTrue(pes < est && est < opt, () -> pes + " < " + est + " < " + opt);
        assertEquals(opt, map.runawayUpperBoundRadPerS());
        assertTrue(map.optimistic().peakPower().shaftPowerW() > map.estimate().peakPower().shaftPowerW());
        assertTrue(map.pessimistic().peakPower().shaftPowerW() < map.estimate().peakPower().shaftPowerW());
        assertTrue(map.fractionOutOfRange() >= 0 && map.fractionOutOfRange() <= 1);
    }

    @Test
    void parasiticDragLowersRunaway() {
        Calibration none = new Calibration(AdmissionReading.RIM_STRUCK_CAPPED, 0, 0, 0, 0, 0, 1.0, "no drag");
        double free = DEMO.withCalibration(none).runawaySpeedRadPerS();
        assertTrue(free > 1.2 * DEMO.runawaySpeedRadPerS());
    }

    @Test
    void validityFlagsTurbulentGapFlow() {
        // the demo's gap Reynolds numbers are above 2000 (laminar plane-channel limit, physics.md §3.4 [M]): every
        // point is beyond the laminar range and the blended closure carries it; only points beyond the closure's
        // own range (Re above 1e5, Blasius's fit, from memory), transonic or failed count as outside the model
        OperatingPoint p = DEMO.at(1000.0);
        assertTrue(p.validity().gapReynolds() > Validity.LAMINAR_REYNOLDS_LIMIT);
        assertTrue(!p.validity().laminar() && !p.validity().inLaminarRange());
        assertEquals(p.validity().gapReynolds() <= Validity.BLENDED_REYNOLDS_LIMIT
                && p.validity().relativeMach() < 1 && p.validity().marchCompleted(), p.validity().inRange());
        PerformanceCurve c = DEMO.curve(5);
        assertEquals(1.0, c.fractionBeyondLaminar());
        assertTrue(c.fractionOutOfRange() <= c.fractionBeyondLaminar());
    }

    @Test
    void fastIntegrationAgreesWithHipparchusReferenceOnTheCoupledPoint() {
        TurbineModel ref = new TurbineModel(DEMO.gas(), DEMO.supply(), DEMO.nozzle(), DEMO.geometry(), DEMO.losses(),
                DEMO.calibration(), DEMO.closure(), Integration.ADAPTIVE, 40);
        OperatingPoint a = DEMO.at(1500.0);
        OperatingPoint b = ref.at(1500.0);
        assertEquals(b.shaftTorqueNm(), a.shaftTorqueNm(), Math.abs(b.shaftTorqueNm()) * 2e-3);
        assertEquals(b.massFlowKgPerS(), a.massFlowKgPerS(), b.massFlowKgPerS() * 1e-6);
    }

    @Test
    void operatingPointMeetsTheLoad() {
        double k = 1e-5; // N m s, a viscous load
        OperatingPoint p = DEMO.operatingPoint(w -> k * w);
        assertEquals(k * p.speedRadPerS(), p.shaftTorqueNm(), 1e-6);
        assertTrue(p.speedRadPerS() > 0 && p.speedRadPerS() < DEMO.runawaySpeedRadPerS());
        // a load above the stall torque holds the rotor still
        assertEquals(0.0, DEMO.operatingPoint(w -> 1.0).speedRadPerS());
    }

    @Test
    void dailyNeceLaminarRegimeIsTwoFaceCouetteDrag() {
        // Regime I of Daily & Nece is exactly Couette flow on both faces: M = pi mu Omega a^4 / s (physics.md §12.1)
        double mu = 1.8e-5;
        double a = 0.04;
        double s = 0.0002;
        double omega = 10.0;
        double m = ParasiticLosses.endFaceMomentNm(omega, a, s, 1.2, mu);
        assertEquals(Math.PI * mu * omega * Math.pow(a, 4) / s, m, m * 1e-12);
    }

    @Test
    void br02BearingLoadTerm() {
        // derived (physics.md §7, BR-02): mu 0.0015, P 10 N, d 8 mm -> 0.0600 N mm; mu from RoyMech / Koyo table 4-1
        LossModel one = new LossModel(1, 0.008, 0.015, 10.0, 0, 70.0, 1.0);
        ParasiticTorques t = ParasiticLosses.at(100.0, DEMO.geometry(), one, Calibration.nominal(), 1.2, 1.8e-5);
        assertEquals(0.0600e-3, t.bearingLoadNm(), 1e-12);
    }

    @Test
    void variantsForSafetyRemedies() {
        double base = DEMO.runawaySpeedRadPerS();
        double braked = DEMO.runawaySpeedRadPerS(0.005);
        assertTrue(braked < base);
        assertEquals(0.005, DEMO.at(braked).shaftTorqueNm(), 1e-6);
        // a lower supply pressure and a smaller throat both lower the runaway speed
        double ps = DEMO.supply().supplyPressurePa();
        assertTrue(DEMO.variant(0.6 * ps, 1.0, 1.0).runawaySpeedRadPerS() < base);
        assertTrue(DEMO.variant(ps, 0.5, 1.0).runawaySpeedRadPerS() < base);
        assertEquals(base, DEMO.variant(ps, 1.0, 1.0).runawaySpeedRadPerS(), base * 1e-9);
        assertTrue(DEMO.runawayUpperBoundRadPerS(0.0) >= base);
    }
}
