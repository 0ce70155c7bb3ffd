package org.shearstack.physics.dynamics;

/**
 * First lateral critical speed of a rotor on a shaft (physics.md §6.1): single mass on a massless shaft,
 * beam stiffnesses from the standard beam-deflection tables, the uniform shaft between simple supports,
 * Rayleigh's energy estimate (Shigley's Mechanical Engineering Design, 10th ed., Eq. 7-23) and Dunkerley's
 * (1894) lower-bound combination. SI units.
 */
public final class CriticalSpeed {

    /** Standard gravity, m/s² (CGPM 1901). */
    public static final double G = 9.80665;

    private CriticalSpeed() {
    }

    /** Second moment of area of a solid round shaft: π d⁴ / 64. */
    public static double roundShaftSecondMomentM4(double diameterM) {
        return Math.PI * Math.pow(diameterM, 4) / 64;
    }

    /** Lateral stiffness at a point load at distance a from one support of a simply supported span L: 3EIL/(a²b²). */
    public static double simplySupportedStiffnessNPerM(double youngsModulusPa, double secondMomentM4, double spanM,
            double loadFromSupportM) {
        double a = loadFromSupportM;
        double b = spanM - a;
        if (!(spanM > 0 && a > 0 && b > 0)) {
            throw new IllegalArgumentException("load position must lie strictly inside the span, found a=" + a
                    + " m in L=" + spanM + " m");
        }
        return 3 * youngsModulusPa * secondMomentM4 * spanM / (a * a * b * b);
    }

    /** Stiffness at the middle of a simply supported span: 48 EI / L³. */
    public static double simplySupportedCentralStiffnessNPerM(double youngsModulusPa, double secondMomentM4,
            double spanM) {
        return 48 * youngsModulusPa * secondMomentM4 / (spanM * spanM * spanM);
    }

    /** Stiffness at the tip of a cantilever of length L (overhung rotor, rigid bearing support): 3 EI / L³. */
    public static double overhungStiffnessNPerM(double youngsModulusPa, double secondMomentM4, double overhangM) {
        return 3 * youngsModulusPa * secondMomentM4 / (overhangM * overhangM * overhangM);
    }

    /** Single mass on a massless shaft: ω = √(k/m). */
    public static double singleMassRadPerS(double stiffnessNPerM, double massKg) {
        if (!(stiffnessNPerM > 0 && massKg > 0)) {
            throw new IllegalArgumentException("stiffness and mass must be positive");
        }
        return Math.sqrt(stiffnessNPerM / massKg);
    }

    /** From the static deflection under standard gravity: ω = √(g/δ). */
    public static double fromStaticDeflectionRadPerS(double staticDeflectionM) {
        return fromStaticDeflectionRadPerS(staticDeflectionM, G);
    }

    /** From the static deflection under a stated gravity: ω = √(g/δ). */
    public static double fromStaticDeflectionRadPerS(double staticDeflectionM, double gravityMPerS2) {
        if (!(staticDeflectionM > 0)) {
            throw new IllegalArgumentException("static deflection must be positive, found " + staticDeflectionM);
        }
        return Math.sqrt(gravityMPerS2 / staticDeflectionM);
    }

    /**
     * Uniform shaft between simple supports, first mode: ω₁ = (π/L)² √(E I / (ρ A)), written with the specific
     * weight γ = ρ g as in Shigley: (π/L)² √(g E I / (A γ)).
     */
    public static double uniformShaftSimplySupportedRadPerS(double youngsModulusPa, double diameterM, double spanM,
            double densityKgPerM3) {
        double i = roundShaftSecondMomentM4(diameterM);
        double area = Math.PI * diameterM * diameterM / 4;
        return Math.pow(Math.PI / spanM, 2) * Math.sqrt(youngsModulusPa * i / (densityKgPerM3 * area));
    }

    /**
     * Rayleigh's estimate for masses m_i with static deflections y_i under their own weights:
     * ω² = g Σ m_i y_i / Σ m_i y_i².
     */
    public static double rayleighRadPerS(double[] massesKg, double[] staticDeflectionsM) {
        if (massesKg.length != staticDeflectionsM.length || massesKg.length == 0) {
            throw new IllegalArgumentException("need equal, non-empty mass and deflection arrays, found "
                    + massesKg.length + " and " + staticDeflectionsM.length);
        }
        double num = 0;
        double den = 0;
        for (int i = 0; i < massesKg.length; i++) {
            double y = Math.abs(staticDeflectionsM[i]);
            num += massesKg[i] * y;
            den += massesKg[i] * y * y;
        }
        return Math.sqrt(G * num / den);
    }

    /** Dunkerley: 1/ω₁² ≈ Σ 1/ω_i² (each subsystem alone); always at or below the true first critical. */
    public static double dunkerleyRadPerS(double... partialCriticalsRadPerS) {
        if (partialCriticalsRadPerS.length == 0) {
            throw new IllegalArgumentException("need at least one partial critical speed");
        }
        double s = 0;
        for (double w : partialCriticalsRadPerS) {
            if (!(w > 0)) {
                throw new IllegalArgumentException("partial critical speeds must be positive, found " + w);
            }
            s += 1 / (w * w);
        }
        return 1 / Math.sqrt(s);
    }
}
