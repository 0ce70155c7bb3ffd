package org.shearstack.physics.calibration;

import java.util.function.DoubleUnaryOperator;

/** Golden-section search for the minimum of a one-dimensional function on an interval. */
final class GoldenSection {
    private static final double R = (Math.sqrt(5) - 1) / 2;

    private GoldenSection() {
    }

    /** {x, f(x)} at the minimum found, to an absolute tolerance in x. */
    static double[] minimize(DoubleUnaryOperator f, double lo, double hi, double tol) {
        double a = lo;
        double b = hi;
        double c = b - R * (b - a);
        double d = a + R * (b - a);
        double fc = f.applyAsDouble(c);
        double fd = f.applyAsDouble(d);
        while (b - a > tol) {
            if (fc < fd) {
                b = d;
                d = c;
                fd = fc;
                c = b - R * (b - a);
                fc = f.applyAsDouble(c);
            } else {
                a = c;
                c = d;
                fc = fd;
                d = a + R * (b - a);
                fd = f.applyAsDouble(d);
            }
        }
        double x = (a + b) / 2;
        return new double[] {x, f.applyAsDouble(x)};
    }
}
