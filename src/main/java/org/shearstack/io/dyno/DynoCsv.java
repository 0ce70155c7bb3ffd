package org.shearstack.io.dyno;

import java.util.Locale;
import org.shearstack.physics.dyno.CoastPoint;
import org.shearstack.physics.dyno.DynoPoint;
import org.shearstack.physics.dyno.DynoResult;

/** dyno.csv: one row per analysed sample, run-up then coast-down; empty fields where a value is unknown. */
public final class DynoCsv {
    /** The header line. */
    public static final String HEADER = "segment,time_s,speed_rpm,speed_rad_per_s,acceleration_rad_per_s2,"
            + "loss_torque_nm,fitted_loss_torque_nm,generator_torque_nm,shaft_torque_nm,rotor_torque_nm,shaft_power_w,"
            + "rotor_power_w,electrical_power_w,generator_efficiency,predicted_torque_nm";

    private DynoCsv() {
    }

    public static String render(DynoResult r) {
        StringBuilder s = new StringBuilder(HEADER).append('\n');
        for (DynoPoint p : r.runUp()) {
            row(s, "run-up", p.timeS(), p.speedRadPerS(), p.accelerationRadPerS2(), p.lossTorqueNm(), Double.NaN,
                    p.generatorTorqueNm(), p.shaftTorqueNm(), p.rotorTorqueNm(), p.shaftPowerW(), p.rotorPowerW(),
                    p.electricalPowerW(), p.generatorEfficiency(), p.predictedTorqueNm());
        }
        for (CoastPoint p : r.coastDown()) {
            row(s, "coast-down", p.timeS(), p.speedRadPerS(), p.accelerationRadPerS2(), p.measuredLossTorqueNm(),
                    p.fittedLossTorqueNm(), Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    Double.NaN, Double.NaN);
        }
        return s.toString();
    }

    private static void row(StringBuilder s, String seg, double t, double w, double... rest) {
        s.append(seg).append(',').append(num(t)).append(',').append(num(w * DynoReport.RPM_PER_RAD_S)).append(',')
                .append(num(w));
        for (double v : rest) {
            s.append(',').append(num(v));
        }
        s.append('\n');
    }

    static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.7g", v) : "";
    }
}
