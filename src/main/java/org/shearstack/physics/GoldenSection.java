package org.shearstack.physics;

import java.util.function.DoubleUnaryOperator;

/**
 * Golden-section search on a closed interval for a unimodal function (Kiefer 1953), the one copy used by the
 * sizing rules (maximum) and the bench calibration (minimum).
 */
public final class GoldenSection {

    private static final double INV_PHI = (Math.sqrt(5.0) - 1.0) / 2.0;

    private GoldenSection() {
    }

    /** The argument of the maximum within {@code tolerance} (absolute, in the argument). */
    public static double maximize(DoubleUnaryOperator f, double lo, double hi, double tolerance) {
        Bracket b = narrow(f, lo, hi, tolerance, true);
        return b.fc >= b.fd ? b.c : b.d;
    }

    /** {x, f(x)} at the minimum found, to an absolute tolerance in x. */
    public static double[] minimize(DoubleUnaryOperator f, double lo, double hi, double tolerance) {
        Bracket b = narrow(f, lo, hi, tolerance, false);
        double x = (b.a + b.b) / 2;
        return new double[] {x, f.applyAsDouble(x)};
    }

    /** The final interval [a, b] with its two interior points c &lt; d and their values. */
    private record Bracket(double a, double b, double c, double d, double fc, double fd) {
    }

    private static Bracket narrow(DoubleUnaryOperator f, double lo, double hi, double tolerance, boolean seekMax) {
        double a = lo;
        double b = hi;
        double c = b - INV_PHI * (b - a);
        double d = a + INV_PHI * (b - a);
        double fc = f.applyAsDouble(c);
        double fd = f.applyAsDouble(d);
        while (b - a > tolerance) {
            boolean keepLeft = seekMax ? fc >= fd : fc < fd;
            if (keepLeft) {
                b = d;
                d = c;
                fd = fc;
                c = b - INV_PHI * (b - a);
                fc = f.applyAsDouble(c);
            } else {
                a = c;
                c = d;
                fc = fd;
                d = a + INV_PHI * (b - a);
                fd = f.applyAsDouble(d);
            }
        }
        return new Bracket(a, b, c, d, fc, fd);
    }
}
