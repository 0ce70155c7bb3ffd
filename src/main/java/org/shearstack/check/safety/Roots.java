package org.shearstack.check.safety;

import java.util.function.DoubleUnaryOperator;

/** Bracketed bisection for monotone functions; deterministic, no tolerance surprises. */
final class Roots {

    private Roots() {
    }

    /**
     * A root of f in [lo, hi], where f(lo) and f(hi) differ in sign, to an absolute tolerance in x.
     */
    static double bisect(DoubleUnaryOperator f, double lo, double hi, double xTolerance) {
        double flo = f.applyAsDouble(lo);
        double fhi = f.applyAsDouble(hi);
        if (flo == 0) {
            return lo;
        }
        if (fhi == 0) {
            return hi;
        }
        if (Math.signum(flo) == Math.signum(fhi)) {
            throw new IllegalArgumentException("root not bracketed in [" + lo + ", " + hi + "]");
        }
        for (int i = 0; i < 200 && hi - lo > xTolerance; i++) {
            double mid = 0.5 * (lo + hi);
            double fm = f.applyAsDouble(mid);
            if (Math.signum(fm) == Math.signum(flo)) {
                lo = mid;
                flo = fm;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }
}
