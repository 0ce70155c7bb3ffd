package org.shearstack.check.design;

import java.util.List;
import org.shearstack.check.safety.RunawayModel;
import org.shearstack.physics.gas.Nozzle;
import org.shearstack.physics.rotor.Calibration;
import org.shearstack.physics.rotor.TurbineGeometry;
import org.shearstack.physics.rotor.TurbineModel;

/**
 * The performance model as a runaway model for the burst check: the highest runaway of the band (estimate,
 * optimistic and pessimistic readings, physics.md §12.6), with the supply pressure, throat area, disc diameters
 * and a permanent load varied as the check asks.
 *
 * @param model the coupled turbine model of the design
 */
public record TurbineRunaway(TurbineModel model) implements RunawayModel {

    @Override
    public double runawayRadPerS(Variant v) {
        if (v.supplyPressurePa() <= model.supply().ambientPressurePa() * (1 + 1e-6)) {
            return 0;
        }
        TurbineModel m = variant(v);
        double max = 0;
        for (Calibration c : List.of(m.calibration(), m.calibration().optimistic(), m.calibration().pessimistic())) {
            TurbineModel mc = m.withCalibration(c);
            double w = v.extraLoadTorqueNm() > 0
                    ? mc.operatingPoint(s -> v.extraLoadTorqueNm()).speedRadPerS()
                    : mc.runawaySpeedRadPerS();
            max = Math.max(max, w);
        }
        return max;
    }

    private TurbineModel variant(Variant v) {
        TurbineModel m = model;
        if (v.supplyPressurePa() != m.supply().supplyPressurePa()) {
            m = new TurbineModel(m.gas(), m.supply().atPressure(v.supplyPressurePa()), m.nozzle(), m.geometry(),
                    m.losses(), m.calibration(), m.closure(), m.integration(), m.marchSteps());
        }
        if (v.throatScale() != 1) {
            Nozzle n = m.nozzle();
            m = m.withNozzle(new Nozzle(n.kind(), n.throatAreaM2() * v.throatScale(), n.exitAreaM2() * v.throatScale(),
                    n.dischargeCoefficient(), n.velocityCoefficient()));
        }
        if (v.diameterScale() != 1) {
            TurbineGeometry g = m.geometry();
            double s = v.diameterScale();
            m = m.withGeometry(new TurbineGeometry(g.outerRadiusM() * s, g.exhaustRadiusM() * s, g.gapM(),
                    g.discThicknessM(), g.discCount(), g.endClearanceM(), g.rimClearanceM(), g.exhaustAreaM2() * s * s,
                    g.jetAngleDeg()));
        }
        return m;
    }

    @Override
    public String description() {
        return "performance model, highest runaway of its uncertainty band";
    }
}
