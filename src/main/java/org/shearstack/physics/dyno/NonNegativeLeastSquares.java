package org.shearstack.physics.dyno;

/**
 * Least squares y ≈ Σ c_k φ_k with every c_k ≥ 0, for a handful of basis functions (at most 6): every subset of
 * the basis is fitted by ordinary least squares and the best subset whose coefficients are all non-negative wins.
 * Exact for small problems, and it says which terms were kept.
 */
public final class NonNegativeLeastSquares {
    private NonNegativeLeastSquares() {
    }

    /**
     * The fit.
     *
     * @param coefficients one per basis function; 0 for a dropped term
     * @param kept         true where the term is in the winning subset
     * @param rms          root-mean-square residual
     */
    public record Result(double[] coefficients, boolean[] kept, double rms) {
    }

    /**
     * Fits samples; {@code basis[k][i]} is function k at sample i. Columns are scaled internally.
     *
     * @throws IllegalArgumentException when no subset gives a non-negative solution or shapes disagree
     */
    public static Result fit(double[][] basis, double[] y) {
        int m = basis.length;
        int n = y.length;
        if (m < 1 || m > 6) {
            throw new IllegalArgumentException("1 to 6 basis functions are supported, found " + m);
        }
        double[] scale = new double[m];
        for (int k = 0; k < m; k++) {
            if (basis[k].length != n) {
                throw new IllegalArgumentException("basis " + k + " has " + basis[k].length + " samples, y has " + n);
            }
            for (double v : basis[k]) {
                scale[k] = Math.max(scale[k], Math.abs(v));
            }
        }
        double[] best = null;
        int bestMask = 0;
        double bestSse = Double.POSITIVE_INFINITY;
        for (int mask = 1; mask < (1 << m); mask++) {
            int[] idx = new int[Integer.bitCount(mask)];
            int q = 0;
            boolean usable = true;
            for (int k = 0; k < m; k++) {
                if ((mask & (1 << k)) != 0) {
                    idx[q++] = k;
                    usable &= scale[k] > 0;
                }
            }
            if (!usable || idx.length > n) {
                continue;
            }
            double[][] a = new double[idx.length][idx.length];
            double[] b = new double[idx.length];
            for (int i = 0; i < n; i++) {
                for (int r = 0; r < idx.length; r++) {
                    double pr = basis[idx[r]][i] / scale[idx[r]];
                    b[r] += pr * y[i];
                    for (int c = 0; c < idx.length; c++) {
                        a[r][c] += pr * basis[idx[c]][i] / scale[idx[c]];
                    }
                }
            }
            double[] x = Linear.solve(a, b);
            if (x == null) {
                continue;
            }
            double[] coef = new double[m];
            boolean ok = true;
            for (int r = 0; r < idx.length; r++) {
                coef[idx[r]] = x[r] / scale[idx[r]];
                ok &= coef[idx[r]] >= 0;
            }
            if (!ok) {
                continue;
            }
            double sse = 0;
            for (int i = 0; i < n; i++) {
                double f = 0;
                for (int k = 0; k < m; k++) {
                    f += coef[k] * basis[k][i];
                }
                sse += (y[i] - f) * (y[i] - f);
            }
            if (sse < bestSse * (1 - 1e-12)) {
                bestSse = sse;
                best = coef;
                bestMask = mask;
            }
        }
        if (best == null) {
            throw new IllegalArgumentException("no non-negative combination of the terms fits the samples");
        }
        boolean[] kept = new boolean[m];
        for (int k = 0; k < m; k++) {
            kept[k] = (bestMask & (1 << k)) != 0;
        }
        return new Result(best, kept, Math.sqrt(bestSse / n));
    }

    /** Solves a small dense system a x = b (partial pivoting); null when singular. */
    public static double[] solveLinear(double[][] a, double[] b) {
        return Linear.solve(a, b);
    }
}
