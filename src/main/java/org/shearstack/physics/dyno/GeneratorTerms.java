package org.shearstack.physics.dyno;

import java.util.Arrays;
import java.util.Optional;

/** Generator quantities from a log's voltage and current columns (physics.md §8.3). */
final class GeneratorTerms {
    /** Current below this share of the largest current counts as open circuit. */
    static final double OPEN_CIRCUIT_SHARE = 0.02;

    private GeneratorTerms() {
    }

    /**
     * k_e (V·s/rad) by least squares through the origin, V = k_e ω, over open-circuit samples above 10 %
     * of the top speed; NaN when there are fewer than 5 such samples or no electrical columns.
     */
    static double backEmfConstant(SpeedLog log, double topSpeedRadPerS) {
        if (!log.hasElectrical()) {
            return Double.NaN;
        }
        double[] v = log.voltagesV().orElseThrow();
        double[] i = log.currentsA().orElseThrow();
        double imax = 0;
        for (double x : i) {
            imax = Math.max(imax, Math.abs(x));
        }
        double limit = OPEN_CIRCUIT_SHARE * imax + 1e-3;
        double svw = 0;
        double sww = 0;
        int n = 0;
        for (int k = 0; k < log.size(); k++) {
            double w = log.speedRadPerS(k);
            if (Math.abs(i[k]) <= limit && w > 0.1 * topSpeedRadPerS) {
                svw += v[k] * w;
                sww += w * w;
                n++;
            }
        }
        return n >= 5 ? svw / sww : Double.NaN;
    }

    /** A column smoothed over a segment with the segment's window, or null when not logged. */
    static double[] smoothed(Optional<double[]> column, Segment s, DynoAnalyzer.Fitted f) {
        if (column.isEmpty()) {
            return null;
        }
        double[] part = Arrays.copyOfRange(column.get(), s.from(), s.to());
        return SavitzkyGolay.apply(f.t(), part, f.perSample(), f.window().order()).value();
    }
}
