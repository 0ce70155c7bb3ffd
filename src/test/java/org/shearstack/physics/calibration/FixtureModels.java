package org.shearstack.physics.calibration;

import org.shearstack.physics.gas.Nozzle;
import org.shearstack.physics.rotor.AdmissionReading;
import org.shearstack.physics.rotor.Calibration;
import org.shearstack.physics.rotor.LossModel;
import org.shearstack.physics.rotor.TurbineGeometry;
import org.shearstack.physics.rotor.TurbineModel;
import org.shearstack.physics.supply.FlowCharacteristic;
import org.shearstack.physics.supply.SupplyPath;

/**
 * Invented demo-sized turbines and the "true" coefficients behind the synthetic bench logs in
 * tests-fixtures/bench/ (not measured turbines).
 */
public final class FixtureModels {
    /** Rotor, hub, shaft and generator rotor together (invented). */
    public static final double INERTIA_KG_M2 = 5.0e-5;

    private FixtureModels() {
    }

    /** 80 mm discs, 0.4 mm gaps, 6 bar(g) supply; bearings sealed or shielded. Prior calibration: nominal. */
    public static TurbineModel model(boolean sealed) {
        SupplyPath supply = new SupplyPath(7.013e5, 293.15, 1.013e5, FlowCharacteristic.ofDm3PerSBar(0.6, 0.3));
        Nozzle nozzle = Nozzle.converging(Math.PI * 0.001 * 0.001, 0.9, 0.95);
        TurbineGeometry geometry = new TurbineGeometry(0.040, 0.012, 0.0004, 0.00075, 10, 0.001, 0.001,
                200e-6, 10.0);
        LossModel losses = new LossModel(2, 0.008, 0.015, 2.0, sealed ? 2 : 0, 70.0, 1.5);
        return TurbineModel.of(supply, nozzle, geometry, losses, Calibration.nominal());
    }

    /** Truth of fixture "sealed-run": rim-struck flow does no work, more windage, weaker grease drag, sealed. */
    public static Calibration sealedTruth() {
        return new Calibration(AdmissionReading.JET_FRACTION_ONLY, 1.4, 1.4, 0.0015, 0.8, 1.6e-3, 0.92, "truth");
    }

    /** Truth of fixture "shielded-run": capped admission, less windage, stiffer grease, lower discharge. */
    public static Calibration shieldedTruth() {
        return new Calibration(AdmissionReading.RIM_STRUCK_CAPPED, 0.8, 0.8, 0.0015, 2.0, 1.0e-3, 0.85, "truth");
    }

    /** Truth of fixture "classroom-run" (examples/classroom-demo.yaml): rim-struck flow does no work. */
    public static Calibration classroomTruth() {
        return new Calibration(AdmissionReading.JET_FRACTION_ONLY, 1.3, 1.3, 0.0015, 0.7, 1.0e-3, 0.9, "truth");
    }
}
