package org.shearstack.physics.rotor;

import org.shearstack.physics.gas.Nozzle;
import org.shearstack.physics.supply.FlowCharacteristic;
import org.shearstack.physics.supply.SupplyPath;

/** An invented demo-sized design for tests and the benchmark (not a measured turbine). */
final class DemoDesigns {

    private DemoDesigns() {
    }

    static TurbineModel demo() {
        SupplyPath supply = new SupplyPath(7.013e5, 293.15, 1.013e5, FlowCharacteristic.ofDm3PerSBar(0.6, 0.3));
        Nozzle nozzle = Nozzle.converging(Math.PI * 0.001 * 0.001, 0.9, 0.95);
        TurbineGeometry geometry = new TurbineGeometry(0.040, 0.012, 0.0004, 0.00075, 10, 0.001, 0.001,
                200e-6, 10.0);
        return TurbineModel.of(supply, nozzle, geometry, LossModel.twoShielded608(), Calibration.nominal());
    }
}
