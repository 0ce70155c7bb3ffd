package org.shearstack.rules.sizing;

import java.util.function.DoubleUnaryOperator;

/** Golden-section search for the maximum of a unimodal function on a closed interval (Kiefer 1953). */
final class GoldenSection {

    private static final double INV_PHI = (Math.sqrt(5.0) - 1.0) / 2.0;

    private GoldenSection() {
    }

    /** The argument of the maximum within {@code tolerance} (absolute, in the argument). */
    static double maximize(DoubleUnaryOperator f, double lo, double hi, double tolerance) {
        double a = lo;
        double b = hi;
        double c = b - INV_PHI * (b - a);
        double d = a + INV_PHI * (b - a);
        double fc = f.applyAsDouble(c);
        double fd = f.applyAsDouble(d);
        while (b - a > tolerance) {
            if (fc >= fd) {
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
        return fc >= fd ? c : d;
    }
}
