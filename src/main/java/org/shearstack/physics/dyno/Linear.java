package org.shearstack.physics.dyno;

/** Small dense linear solves for the fits of this package. */
final class Linear {
    private Linear() {
    }

    /** Solves a x = b by Gaussian elimination with partial pivoting; null when singular. */
    static double[] solve(double[][] a0, double[] b0) {
        int m = b0.length;
        double[][] a = new double[m][];
        for (int i = 0; i < m; i++) {
            a[i] = a0[i].clone();
        }
        double[] b = b0.clone();
        double norm = 0;
        for (double[] row : a) {
            for (double v : row) {
                norm = Math.max(norm, Math.abs(v));
            }
        }
        for (int c = 0; c < m; c++) {
            int p = c;
            for (int r = c + 1; r < m; r++) {
                if (Math.abs(a[r][c]) > Math.abs(a[p][c])) {
                    p = r;
                }
            }
            if (Math.abs(a[p][c]) <= 1e-13 * norm) {
                return null;
            }
            double[] tr = a[c];
            a[c] = a[p];
            a[p] = tr;
            double tb = b[c];
            b[c] = b[p];
            b[p] = tb;
            for (int r = c + 1; r < m; r++) {
                double f = a[r][c] / a[c][c];
                for (int k = c; k < m; k++) {
                    a[r][k] -= f * a[c][k];
                }
                b[r] -= f * b[c];
            }
        }
        double[] x = new double[m];
        for (int r = m - 1; r >= 0; r--) {
            double s = b[r];
            for (int k = r + 1; k < m; k++) {
                s -= a[r][k] * x[k];
            }
            x[r] = s / a[r][r];
        }
        return x;
    }

    /** Least-squares straight line y = a + b x; returns {a, b} or null when x does not vary. */
    static double[] line(double[] x, double[] y) {
        int n = x.length;
        double mx = 0;
        double my = 0;
        for (int i = 0; i < n; i++) {
            mx += x[i];
            my += y[i];
        }
        mx /= n;
        my /= n;
        double sxx = 0;
        double sxy = 0;
        for (int i = 0; i < n; i++) {
            sxx += (x[i] - mx) * (x[i] - mx);
            sxy += (x[i] - mx) * (y[i] - my);
        }
        if (n < 2 || sxx == 0) {
            return null;
        }
        double b = sxy / sxx;
        return new double[] {my - b * mx, b};
    }
}
