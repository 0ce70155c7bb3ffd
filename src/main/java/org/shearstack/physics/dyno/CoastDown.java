package org.shearstack.physics.dyno;

/**
 * Coast-down of a rotor with inertia I under a loss law: I dω/dt = −T_loss(ω). Closed forms for
 * Coulomb plus viscous friction, a numerical quadrature for the full law.
 */
public final class CoastDown {
    private CoastDown() {
    }

    /**
     * Stop time of I dω/dt = −(T_f + k_v ω) from ω₀: t_s = (I/k_v) ln(1 + k_v ω₀ / T_f)
     * (physics.md §8.1). With k_v = 0 the limit I ω₀ / T_f is returned.
     */
    public static double stopTimeS(double inertiaKgM2, double viscousNmPerRadPerS, double coulombNm,
            double initialSpeedRadPerS) {
        if (!(inertiaKgM2 > 0) || !(coulombNm > 0) || viscousNmPerRadPerS < 0 || initialSpeedRadPerS < 0) {
            throw new IllegalArgumentException("stop time needs I > 0, T_f > 0, k_v >= 0, ω0 >= 0");
        }
        if (viscousNmPerRadPerS == 0) {
            return inertiaKgM2 * initialSpeedRadPerS / coulombNm;
        }
        double x = viscousNmPerRadPerS * initialSpeedRadPerS / coulombNm;
        return inertiaKgM2 / viscousNmPerRadPerS * Math.log1p(x);
    }

    /**
     * Time to slow from ω₀ to ω₁ under a loss law: t = I ∫ dω / T_loss(ω) from ω₁ to ω₀, by
     * composite Simpson quadrature on {@code intervals} (even) intervals.
     */
    public static double timeBetweenS(double inertiaKgM2, LossLaw loss, double fromSpeedRadPerS,
            double toSpeedRadPerS, int intervals) {
        if (intervals < 2 || intervals % 2 != 0) {
            throw new IllegalArgumentException("intervals must be even and >= 2, found " + intervals);
        }
        double a = toSpeedRadPerS;
        double b = fromSpeedRadPerS;
        double h = (b - a) / intervals;
        double s = 1 / loss.torqueNm(a) + 1 / loss.torqueNm(b);
        for (int k = 1; k < intervals; k++) {
            s += (k % 2 == 1 ? 4 : 2) / loss.torqueNm(a + k * h);
        }
        return inertiaKgM2 * s * h / 3;
    }

    /** Speed after time t of a Coulomb + viscous coast-down from ω₀ (0 once stopped). */
    public static double speedAtRadPerS(double inertiaKgM2, double viscousNmPerRadPerS, double coulombNm,
            double initialSpeedRadPerS, double timeS) {
        double w;
        if (viscousNmPerRadPerS == 0) {
            w = initialSpeedRadPerS - coulombNm / inertiaKgM2 * timeS;
        } else {
            double r = coulombNm / viscousNmPerRadPerS;
            w = (initialSpeedRadPerS + r) * Math.exp(-viscousNmPerRadPerS * timeS / inertiaKgM2) - r;
        }
        return Math.max(0, w);
    }
}
