package org.shearstack.job;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.io.report.PerformanceData;
import org.shearstack.physics.generator.DcGenerator;
import org.shearstack.physics.generator.GeneratorCoupling;
import org.shearstack.physics.generator.GeneratorPoint;
import org.shearstack.physics.rotor.OperatingPoint;
import org.shearstack.physics.rotor.PerformanceMap;
import org.shearstack.physics.rotor.TurbineModel;
import org.shearstack.rules.sizing.SizingKeys;

/**
 * The performance map with its band, and the operating point: against the spec's generator and load when given,
 * else at the target speed, else at the operating speed the sizing chose (capped at the allowable speed), else at peak
 * shaft power.
 */
final class PerformanceStage {

    private PerformanceStage() {
    }

    static PerformanceData run(TurbineModel model, ResolvedDesign design, int mapPoints) {
        PerformanceMap map = model.map(mapPoints);
        Values v = new Values(design);
        double e = v.optional("generator.open-circuit-voltage");
        double eSpeed = v.optional("generator.open-circuit-voltage.speed");
        double ra = v.optional("generator.winding-resistance");
        double load = v.optional("generator.load");
        if (!Double.isNaN(e) && !Double.isNaN(eSpeed) && !Double.isNaN(ra) && !Double.isNaN(load)) {
            DcGenerator gen = DcGenerator.fromOpenCircuit(e, eSpeed, ra, 0.0);
            GeneratorPoint gp = GeneratorCoupling.run(model, gen, load);
            OperatingPoint op = model.at(gp.speedRadPerS());
            List<PerformanceData.GeneratorSample> samples = new ArrayList<>();
            for (OperatingPoint p : map.points()) {
                double w = p.speedRadPerS();
                samples.add(new PerformanceData.GeneratorSample(w, gen.torqueNm(w, load), gen.loadPowerW(w, load)));
            }
            return new PerformanceData(map, op, "DC generator on a " + trim(load) + " ohm load",
                    Optional.of(new PerformanceData.GeneratorCurve(load, samples, gp.electricalPowerW(),
                            gp.terminalVoltageV())));
        }
        double target = v.optional("targets.speed");
        if (!Double.isNaN(target) && target > 0 && target < map.runawaySpeedRadPerS()) {
            return new PerformanceData(map, model.at(target), "the design speed", Optional.empty());
        }
        double sized = v.optional(SizingKeys.OPERATING_SPEED.name());
        if (!Double.isNaN(sized) && sized > 0 && sized < map.runawaySpeedRadPerS()) {
            return new PerformanceData(map, model.at(sized), "the design operating point (SIZE-PERFORMANCE)",
                    Optional.empty());
        }
        return new PerformanceData(map, map.estimate().peakPower(), "peak shaft power", Optional.empty());
    }

    private static String trim(double v) {
        return org.shearstack.io.report.Num.sig(v, 4).replaceAll("\\.?0+$", "");
    }
}
