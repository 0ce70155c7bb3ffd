package org.shearstack.physics.dyno;

/**
 * The run-up averaged over one speed bin: what a torque or power curve shows.
 *
 * @param speedRadPerS      mean smoothed speed of the bin's samples
 * @param shaftTorqueNm     mean shaft torque
 * @param rotorTorqueNm     mean rotor torque
 * @param shaftPowerW       mean shaft power
 * @param rotorPowerW       mean rotor power
 * @param predictedTorqueNm predicted torque at the bin's speed (NaN without a prediction)
 * @param samples           samples in the bin
 */
public record CurvePoint(double speedRadPerS, double shaftTorqueNm, double rotorTorqueNm, double shaftPowerW,
        double rotorPowerW, double predictedTorqueNm, int samples) {
    /** Number of equal-width speed bins between zero and the highest run-up speed. */
    public static final int BINS = 40;

    /** Averages run-up samples into {@link #BINS} equal speed bins; empty bins are left out. */
    public static java.util.List<CurvePoint> bin(java.util.List<DynoPoint> run,
            java.util.Optional<Prediction> prediction) {
        double wMax = 0;
        for (DynoPoint p : run) {
            wMax = Math.max(wMax, p.speedRadPerS());
        }
        double[][] acc = new double[BINS][6];
        for (DynoPoint p : run) {
            if (p.speedRadPerS() < 0) {
                continue;
            }
            int b = Math.min(BINS - 1, (int) (p.speedRadPerS() / wMax * BINS));
            acc[b][0] += p.speedRadPerS();
            acc[b][1] += p.shaftTorqueNm();
            acc[b][2] += p.rotorTorqueNm();
            acc[b][3] += p.shaftPowerW();
            acc[b][4] += p.rotorPowerW();
            acc[b][5] += 1;
        }
        java.util.List<CurvePoint> out = new java.util.ArrayList<>();
        for (double[] a : acc) {
            int n = (int) a[5];
            if (n == 0) {
                continue;
            }
            double w = a[0] / n;
            double pred = prediction.map(p -> p.torqueNm().applyAsDouble(w)).orElse(Double.NaN);
            out.add(new CurvePoint(w, a[1] / n, a[2] / n, a[3] / n, a[4] / n, pred, n));
        }
        return out;
    }
}
