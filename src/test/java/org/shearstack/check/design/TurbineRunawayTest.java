package org.shearstack.check.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.shearstack.check.Severity;
import org.shearstack.check.safety.BurstCheck;
import org.shearstack.check.safety.BurstInputs;
import org.shearstack.check.safety.LockedFlowBound;
import org.shearstack.check.safety.RunawayModel;
import org.shearstack.check.safety.SpinningPart;
import org.shearstack.physics.gas.Nozzle;
import org.shearstack.physics.rotor.Calibration;
import org.shearstack.physics.rotor.LossModel;
import org.shearstack.physics.rotor.TurbineGeometry;
import org.shearstack.physics.rotor.TurbineModel;
import org.shearstack.physics.stress.SafetyFactor;
import org.shearstack.physics.stress.SpinningAnnulus;
import org.shearstack.physics.supply.FlowCharacteristic;
import org.shearstack.physics.supply.SupplyPath;

/** The performance model as the burst check's runaway model (an invented 80 mm demo turbine, not measured). */
class TurbineRunawayTest {

    static TurbineModel demo(double supplyPa) {
        SupplyPath supply = new SupplyPath(supplyPa, 293.15, 1.013e5, FlowCharacteristic.ofDm3PerSBar(0.6, 0.3));
        Nozzle nozzle = Nozzle.converging(Math.PI * 0.001 * 0.001, 0.9, 0.95);
        TurbineGeometry geometry = new TurbineGeometry(0.040, 0.012, 0.0004, 0.00075, 10, 0.001, 0.001, 200e-6, 10.0);
        return TurbineModel.of(supply, nozzle, geometry, LossModel.twoShielded608(), Calibration.nominal());
    }

    @Test
    void bandUpperRunawayIsBelowTheLosslessBoundAndRespondsToLoad() {
        TurbineModel m = demo(7.013e5);
        TurbineRunaway r = new TurbineRunaway(m);
        RunawayModel.Variant v = RunawayModel.Variant.atPressure(7.013e5);
        double band = r.runawayRadPerS(v);
        assertTrue(band >= m.runawaySpeedRadPerS());
        double bound = new LockedFlowBound(0.040, 0.012, 293.15, 1.013e5).runawayRadPerS(v);
        assertTrue(band < bound, "lossy model " + band + " must stay below the lossless bound " + bound);
        assertTrue(r.runawayRadPerS(v.withLoadTorque(0.005)) < band);
        assertTrue(r.runawayRadPerS(v.withPressure(3.013e5)) < band);
    }

    @Test
    void burstCheckOnThePerformanceModel() {
        TurbineModel m = demo(7.013e5);
        RunawayModel model = Caching.wrap(new TurbineRunaway(m));
        List<SpinningPart> parts = List.of(new SpinningPart("disc", SpinningAnnulus.withExhaustPorts(0.040, 0.014), true));
        BurstCheck.Result r = BurstCheck.run(new BurstInputs(parts, 1270, 0.38, 44e6, SafetyFactor.standard(), 7.013e5,
                1.013e5, Double.NaN, model));
        double allow = r.summary().allowableSpeedRadPerS();
        if (r.findings().get(0).severity() == Severity.FAIL) {
            double atMax = model.runawayRadPerS(RunawayModel.Variant.atPressure(r.summary().maxSafeSupplyPressurePa()));
            assertEquals(allow, atMax, 0.01 * allow);
        } else {
            assertTrue(r.summary().runawaySpeedRadPerS() <= allow);
        }
    }
}
