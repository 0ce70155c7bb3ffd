package org.shearstack.physics.gas;

import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;

/**
 * One-dimensional isentropic flow of a perfect gas: stagnation-to-static ratios, the area–Mach relation and
 * its inverse, the critical (sonic) state and the choked mass-flux constant. Relations as tabulated in
 * NACA Report 1135 (Ames Research Staff, 1953) and NACA TN 1592 (Burcher, 1948); see physics.md §1.1–§1.3.
 */
public final class Isentropic {

    private static final double MACH_TOLERANCE = 1e-13;

    private Isentropic() {
    }

    /** T₀/T = 1 + (γ−1)/2·M², returned as the static-to-stagnation ratio T/T₀. */
    public static double temperatureRatio(double gamma, double mach) {
        return 1.0 / (1.0 + 0.5 * (gamma - 1.0) * mach * mach);
    }

    /** p/p₀ = (T/T₀)^(γ/(γ−1)). */
    public static double pressureRatio(double gamma, double mach) {
        return Math.pow(temperatureRatio(gamma, mach), gamma / (gamma - 1.0));
    }

    /** ρ/ρ₀ = (T/T₀)^(1/(γ−1)). */
    public static double densityRatio(double gamma, double mach) {
        return Math.pow(temperatureRatio(gamma, mach), 1.0 / (gamma - 1.0));
    }

    /** A/A* = (1/M)·[(2/(γ+1))(1 + (γ−1)/2·M²)]^((γ+1)/(2(γ−1))). */
    public static double areaRatio(double gamma, double mach) {
        if (!(mach > 0)) {
            throw new IllegalArgumentException("Mach number must be positive for the area ratio, found " + mach);
        }
        double e = (gamma + 1.0) / (2.0 * (gamma - 1.0));
        return Math.pow(2.0 / (gamma + 1.0) * (1.0 + 0.5 * (gamma - 1.0) * mach * mach), e) / mach;
    }

    /** Mach number for a static-to-stagnation pressure ratio p/p₀ in (0, 1]. */
    public static double machFromPressureRatio(double gamma, double pressureRatio) {
        if (!(pressureRatio > 0) || pressureRatio > 1.0) {
            throw new IllegalArgumentException("pressure ratio p/p0 must be in (0, 1], found " + pressureRatio);
        }
        return Math.sqrt(2.0 / (gamma - 1.0) * (Math.pow(pressureRatio, -(gamma - 1.0) / gamma) - 1.0));
    }

    /**
     * Inverse of the area–Mach relation by bracketed root finding (Hipparchus BracketingNthOrderBrentSolver).
     *
     * @param areaRatio  A/A* ≥ 1
     * @param supersonic which branch: true for M &gt; 1, false for M &lt; 1
     */
    public static double machFromAreaRatio(double gamma, double areaRatio, boolean supersonic) {
        if (!(areaRatio >= 1.0)) {
            throw new IllegalArgumentException("area ratio A/A* must be at least 1, found " + areaRatio);
        }
        if (areaRatio == 1.0) {
            return 1.0;
        }
        double lo;
        double hi;
        if (supersonic) {
            lo = 1.0;
            hi = 2.0;
            while (areaRatio(gamma, hi) < areaRatio) {
                hi *= 2.0;
            }
        } else {
            lo = 1e-12;
            hi = 1.0;
        }
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-15, MACH_TOLERANCE, 1e-15, 5);
        return solver.solve(200, m -> areaRatio(gamma, m) - areaRatio, lo, hi, AllowedSolution.ANY_SIDE);
    }

    /** Critical pressure ratio p* / p₀ = (2/(γ+1))^(γ/(γ−1)). */
    public static double criticalPressureRatio(double gamma) {
        return Math.pow(2.0 / (gamma + 1.0), gamma / (gamma - 1.0));
    }

    /** Critical temperature ratio T* / T₀ = 2/(γ+1). */
    public static double criticalTemperatureRatio(double gamma) {
        return 2.0 / (gamma + 1.0);
    }

    /** Critical density ratio ρ* / ρ₀ = (2/(γ+1))^(1/(γ−1)). */
    public static double criticalDensityRatio(double gamma) {
        return Math.pow(2.0 / (gamma + 1.0), 1.0 / (gamma - 1.0));
    }

    /** Choked mass-flux constant K = √(γ/R)·(2/(γ+1))^((γ+1)/(2(γ−1))), so that ṁ = A p₀ K/√T₀. */
    public static double chokedFluxConstant(Gas gas) {
        double g = gas.gamma();
        return Math.sqrt(g / gas.gasConstantJPerKgK()) * Math.pow(2.0 / (g + 1.0), (g + 1.0) / (2.0 * (g - 1.0)));
    }

    /**
     * Ideal mass flux (kg/(m² s)) through a section where the static pressure is {@code pressureRatio}·p₀,
     * on the subsonic branch: p₀·√(2γ/((γ−1)RT₀)·(π^(2/γ) − π^((γ+1)/γ))). At π = p* / p₀ it equals the choked
     * flux p₀K/√T₀.
     */
    public static double subsonicMassFlux(Gas gas, double stagnationPressurePa, double stagnationTemperatureK,
            double pressureRatio) {
        double g = gas.gamma();
        double pi = Math.min(1.0, Math.max(0.0, pressureRatio));
        double bracket = Math.pow(pi, 2.0 / g) - Math.pow(pi, (g + 1.0) / g);
        return stagnationPressurePa * Math.sqrt(2.0 * g / ((g - 1.0) * gas.gasConstantJPerKgK()
                * stagnationTemperatureK) * Math.max(0.0, bracket));
    }

    /** Choked mass flux p₀K/√T₀ (kg/(m² s)). */
    public static double chokedMassFlux(Gas gas, double stagnationPressurePa, double stagnationTemperatureK) {
        return stagnationPressurePa * chokedFluxConstant(gas) / Math.sqrt(stagnationTemperatureK);
    }

    /** Velocity after isentropic expansion to p/p₀: V = √(2c_pT₀(1 − (p/p₀)^((γ−1)/γ))). */
    public static double expansionVelocity(Gas gas, double stagnationTemperatureK, double pressureRatio) {
        double pi = Math.min(1.0, Math.max(0.0, pressureRatio));
        double g = gas.gamma();
        return Math.sqrt(2.0 * gas.cpJPerKgK() * stagnationTemperatureK * (1.0 - Math.pow(pi, (g - 1.0) / g)));
    }

    /** Sonic speed at the throat a* = √(2γRT₀/(γ+1)). */
    public static double criticalVelocity(Gas gas, double stagnationTemperatureK) {
        double g = gas.gamma();
        return Math.sqrt(2.0 * g * gas.gasConstantJPerKgK() * stagnationTemperatureK / (g + 1.0));
    }

    /** Upper bound of any expansion, V_max = √(2c_pT₀). */
    public static double maximumVelocity(Gas gas, double stagnationTemperatureK) {
        return Math.sqrt(2.0 * gas.cpJPerKgK() * stagnationTemperatureK);
    }
}
