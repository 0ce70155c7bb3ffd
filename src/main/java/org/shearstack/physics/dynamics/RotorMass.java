package org.shearstack.physics.dynamics;

/** Mass and polar moment of inertia of flat annular parts (discs, spacers) about the spin axis. SI units. */
public final class RotorMass {

    private RotorMass() {
    }

    /** Mass of an annulus: ρ π (r_o² − r_i²) t. */
    public static double annulusMassKg(double densityKgPerM3, double thicknessM, double outerRadiusM,
            double innerRadiusM) {
        check(thicknessM, outerRadiusM, innerRadiusM);
        return densityKgPerM3 * Math.PI * (outerRadiusM * outerRadiusM - innerRadiusM * innerRadiusM) * thicknessM;
    }

    /** Polar moment of inertia of an annulus: (π/2) ρ t (r_o⁴ − r_i⁴). */
    public static double annulusInertiaKgM2(double densityKgPerM3, double thicknessM, double outerRadiusM,
            double innerRadiusM) {
        check(thicknessM, outerRadiusM, innerRadiusM);
        return Math.PI / 2 * densityKgPerM3 * thicknessM * (Math.pow(outerRadiusM, 4) - Math.pow(innerRadiusM, 4));
    }

    private static void check(double t, double ro, double ri) {
        if (!(t > 0 && ro > 0 && ri >= 0 && ri < ro)) {
            throw new IllegalArgumentException("need t > 0 and 0 <= inner < outer radius, found t=" + t + " m, ro="
                    + ro + " m, ri=" + ri + " m");
        }
    }
}
