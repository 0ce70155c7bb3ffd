package org.shearstack.physics.dyno;

/**
 * Least-squares fit of a {@link LossLaw} to loss-torque samples, with every coefficient kept
 * non-negative (a negative friction term is not physical): all seven subsets of the three terms are
 * fitted and the best one whose coefficients are all non-negative is kept.
 */
public final class LossFit {
    private LossFit() {
    }

    /**
     * The fitted law and its residual.
     *
     * @param law     fitted coefficients
     * @param rmsNm   root-mean-square residual, N·m
     * @param samples number of samples used
     * @param terms   which terms were kept, e.g. "constant + viscous + quadratic"
     */
    public record Result(LossLaw law, double rmsNm, int samples, String terms) {
    }

    /** Fits T_loss(ω) = c0 + c1 ω + c2 ω², coefficients ≥ 0, to samples (at least 3). */
    public static Result fit(double[] speedRadPerS, double[] lossTorqueNm) {
        int n = speedRadPerS.length;
        if (lossTorqueNm.length != n) {
            throw new IllegalArgumentException("speed and torque arrays differ in length");
        }
        if (n < 3) {
            throw new IllegalArgumentException("a loss fit needs at least 3 samples, found " + n);
        }
        double scale = 0;
        for (double w : speedRadPerS) {
            scale = Math.max(scale, Math.abs(w));
        }
        if (scale == 0) {
            throw new IllegalArgumentException("all coast-down samples are at zero speed");
        }
        double[] best = null;
        double bestSse = Double.POSITIVE_INFINITY;
        int bestMask = 0;
        for (int mask = 1; mask < 8; mask++) {
            double[] c = solveSubset(speedRadPerS, lossTorqueNm, scale, mask);
            if (c == null) {
                continue;
            }
            boolean ok = c[0] >= 0 && c[1] >= 0 && c[2] >= 0;
            if (!ok) {
                continue;
            }
            double sse = 0;
            for (int i = 0; i < n; i++) {
                double r = lossTorqueNm[i] - (c[0] + speedRadPerS[i] * (c[1] + speedRadPerS[i] * c[2]));
                sse += r * r;
            }
            if (sse < bestSse * (1 - 1e-12)) {
                bestSse = sse;
                best = c;
                bestMask = mask;
            }
        }
        if (best == null) {
            throw new IllegalArgumentException("no non-negative loss law fits the coast-down samples");
        }
        String[] names = {"constant", "viscous", "quadratic"};
        StringBuilder terms = new StringBuilder();
        for (int k = 0; k < 3; k++) {
            if ((bestMask & (1 << k)) != 0) {
                terms.append(terms.length() == 0 ? "" : " + ").append(names[k]);
            }
        }
        return new Result(new LossLaw(best[0], best[1], best[2]), Math.sqrt(bestSse / n), n, terms.toString());
    }

    private static double[] solveSubset(double[] w, double[] y, double scale, int mask) {
        int[] idx = new int[3];
        int m = 0;
        for (int k = 0; k < 3; k++) {
            if ((mask & (1 << k)) != 0) {
                idx[m++] = k;
            }
        }
        double[][] a = new double[m][m];
        double[] b = new double[m];
        for (int i = 0; i < w.length; i++) {
            double u = w[i] / scale;
            double[] phi = new double[m];
            for (int j = 0; j < m; j++) {
                phi[j] = Math.pow(u, idx[j]);
            }
            for (int r = 0; r < m; r++) {
                b[r] += phi[r] * y[i];
                for (int c = 0; c < m; c++) {
                    a[r][c] += phi[r] * phi[c];
                }
            }
        }
        double[] x = Linear.solve(a, b);
        if (x == null) {
            return null;
        }
        double[] c = new double[3];
        for (int j = 0; j < m; j++) {
            c[idx[j]] = x[j] / Math.pow(scale, idx[j]);
        }
        return c;
    }
}
