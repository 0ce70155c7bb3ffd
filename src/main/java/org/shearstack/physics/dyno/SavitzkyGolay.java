package org.shearstack.physics.dyno;

/**
 * Savitzky–Golay smoothing and differentiation (Savitzky &amp; Golay 1964, Anal. Chem. 36(8):1627):
 * a least-squares polynomial of a given order is fitted to a window of samples and evaluated, or
 * differentiated, at one of them. With uniform spacing the result is a fixed convolution; this class
 * also fits windows of unevenly spaced samples (real tachometer logs jitter), which reduces to the
 * classical coefficients when the spacing is uniform.
 */
public final class SavitzkyGolay {
    private SavitzkyGolay() {
    }

    /**
     * Classical convolution coefficients for a centred window of uniformly spaced samples, spacing 1.
     * Divide a derivative's result by h^derivative for spacing h.
     *
     * @param window     odd number of points, at least order + 1
     * @param order      polynomial order, 0..6
     * @param derivative 0 for smoothing, 1 for the first derivative, up to order
     */
    public static double[] coefficients(int window, int order, int derivative) {
        if (window < 1 || window % 2 == 0) {
            throw new IllegalArgumentException("window must be a positive odd number of points, found " + window);
        }
        double[] offsets = new double[window];
        int half = window / 2;
        for (int j = 0; j < window; j++) {
            offsets[j] = j - half;
        }
        return weights(offsets, order, derivative);
    }

    /**
     * Weights w such that sum(w[j] * y[j]) is the least-squares polynomial's derivative of the given
     * order at offset 0, for samples at the given offsets (any spacing, same unit as the result's
     * denominator).
     */
    public static double[] weights(double[] offsets, int order, int derivative) {
        if (order < 0 || order > 6) {
            throw new IllegalArgumentException("polynomial order must be 0..6, found " + order);
        }
        if (derivative < 0 || derivative > order) {
            throw new IllegalArgumentException("derivative must be 0.." + order + ", found " + derivative);
        }
        return weightsUpTo(offsets, order, derivative)[derivative];
    }

    /** Weights for derivatives 0..maxDerivative from one least-squares system. */
    private static double[][] weightsUpTo(double[] offsets, int order, int maxDerivative) {
        int n = offsets.length;
        if (n < order + 1) {
            throw new IllegalArgumentException("a window of " + n + " points cannot fit order " + order);
        }
        double scale = 0;
        for (double x : offsets) {
            scale = Math.max(scale, Math.abs(x));
        }
        if (scale == 0) {
            scale = 1;
        }
        int m = order + 1;
        // Vandermonde on scaled offsets; row d of (X'X)^-1 X' gives the d-th coefficient of the fit.
        double[][] gram = new double[m][m];
        double[][] powers = new double[n][m];
        for (int j = 0; j < n; j++) {
            double u = offsets[j] / scale;
            double p = 1;
            for (int k = 0; k < m; k++) {
                powers[j][k] = p;
                p *= u;
            }
        }
        for (int a = 0; a < m; a++) {
            for (int b = 0; b < m; b++) {
                double s = 0;
                for (int j = 0; j < n; j++) {
                    s += powers[j][a] * powers[j][b];
                }
                gram[a][b] = s;
            }
        }
        double[][] out = new double[maxDerivative + 1][n];
        double factorial = 1;
        for (int d = 0; d <= maxDerivative; d++) {
            factorial *= Math.max(1, d);
            double[] unit = new double[m];
            unit[d] = 1;
            double[] row = Linear.solve(gram, unit); // symmetric: a row of the inverse
            if (row == null) {
                throw new IllegalArgumentException("sample times do not determine a polynomial of order " + order);
            }
            double denom = factorial / Math.pow(scale, d);
            for (int j = 0; j < n; j++) {
                double s = 0;
                for (int k = 0; k < m; k++) {
                    s += row[k] * powers[j][k];
                }
                out[d][j] = s * denom;
            }
        }
        return out;
    }

    /**
     * Smooths and differentiates samples y(t) with a moving window of {@code window} points and
     * a polynomial of the given order fitted on the actual sample times. Near the ends the window is
     * shifted inwards (never shrunk), so every value comes from a full fit.
     */
    public static Smoothed apply(double[] timeS, double[] y, int window, int order) {
        int[] w = new int[y.length];
        java.util.Arrays.fill(w, window);
        return apply(timeS, y, w, order);
    }

    /**
     * As {@link #apply(double[], double[], int, int)} with a window of its own for each sample (odd, at least
     * order + 1, at most the number of samples).
     */
    public static Smoothed apply(double[] timeS, double[] y, int[] windows, int order) {
        int n = y.length;
        if (windows.length != n) {
            throw new IllegalArgumentException("one window per sample is needed: " + windows.length + " for " + n);
        }
        int window = 0;
        for (int v : windows) {
            window = Math.max(window, v);
        }
        if (timeS.length != n) {
            throw new IllegalArgumentException("time and value arrays differ in length: " + timeS.length + " vs " + n);
        }
        if (order < 1 || order > 6) {
            throw new IllegalArgumentException("smoothing with a slope needs polynomial order 1..6, found " + order);
        }
        if (window > n) {
            throw new IllegalArgumentException("window of " + window + " points is longer than the " + n + " samples");
        }
        double[] value = new double[n];
        double[] slope = new double[n];
        for (int i = 0; i < n; i++) {
            int win = windows[i];
            int half = win / 2;
            double[] offsets = new double[win];
            int start = Math.min(Math.max(0, i - half), n - win);
            for (int j = 0; j < win; j++) {
                offsets[j] = timeS[start + j] - timeS[i];
            }
            double[][] w = weightsUpTo(offsets, order, 1);
            double[] w0 = w[0];
            double[] w1 = w[1];
            double v = 0;
            double d = 0;
            for (int j = 0; j < win; j++) {
                v += w0[j] * y[start + j];
                d += w1[j] * y[start + j];
            }
            value[i] = v;
            slope[i] = d;
        }
        return new Smoothed(value, slope);
    }

    /** Smoothed values and their first derivative with respect to time (unit of y per second). */
    public record Smoothed(double[] value, double[] perSecond) {
    }
}
