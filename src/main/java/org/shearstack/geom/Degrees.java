package org.shearstack.geom;

/** Degree helpers that are exact at multiples of 90°. */
final class Degrees {

    private Degrees() {
    }

    /** Quarter turns if {@code deg} is an exact multiple of 90, else -1. Result in 0..3. */
    static int quarterTurns(double deg) {
        double q = deg / 90.0;
        if (q != Math.rint(q) || !Double.isFinite(q)) {
            return -1;
        }
        return (int) Math.floorMod((long) q, 4L);
    }

    static double cos(double deg) {
        int q = quarterTurns(deg);
        return switch (q) {
            case 0 -> 1;
            case 1, 3 -> 0;
            case 2 -> -1;
            default -> Math.cos(Math.toRadians(deg));
        };
    }

    static double sin(double deg) {
        int q = quarterTurns(deg);
        return switch (q) {
            case 0, 2 -> 0;
            case 1 -> 1;
            case 3 -> -1;
            default -> Math.sin(Math.toRadians(deg));
        };
    }

    /**
     * Unit-circle points at angles 2πk/n, k = 0..n-1, as x0, y0, x1, ... For n a multiple of 4 the four
     * quadrants are exact rotations of the first (quadrant points are exactly (±1, 0), (0, ±1)).
     */
    static double[] unitCircle(int n) {
        double[] xy = new double[2 * n];
        if (n % 4 != 0) {
            for (int k = 0; k < n; k++) {
                xy[2 * k] = Math.cos(2 * Math.PI * k / n);
                xy[2 * k + 1] = Math.sin(2 * Math.PI * k / n);
            }
            return xy;
        }
        int quarter = n / 4;
        for (int k = 0; k <= quarter; k++) {
            double c;
            double s;
            if (2 * k <= quarter) {
                c = Math.cos(2 * Math.PI * k / n);
                s = Math.sin(2 * Math.PI * k / n);
            } else { // mirror about 45 degrees for symmetry
                int m = quarter - k;
                c = Math.sin(2 * Math.PI * m / n);
                s = Math.cos(2 * Math.PI * m / n);
            }
            if (k < quarter) {
                for (int q = 0; q < 4; q++) {
                    int idx = k + q * quarter;
                    double x = c;
                    double y = s;
                    for (int r = 0; r < q; r++) {
                        double t = x;
                        x = -y;
                        y = t;
                    }
                    xy[2 * idx] = x;
                    xy[2 * idx + 1] = y;
                }
            }
        }
        return xy;
    }
}
