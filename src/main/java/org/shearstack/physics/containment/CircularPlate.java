package org.shearstack.physics.containment;

/**
 * Flat circular plate of radius a and thickness t under uniform pressure q, linear small-deflection theory
 * (Timoshenko &amp; Woinowsky-Krieger, <i>Theory of Plates and Shells</i>, §15–16; Roark's Formulas, flat
 * circular plates, uniform load), valid while the deflection stays below about t/2. A printed cover is neither
 * perfectly clamped nor simply supported; the two cases bound it.
 */
public final class CircularPlate {

    private CircularPlate() {
    }

    /** Flexural rigidity D = E t³ / (12(1 − ν²)). */
    public static double flexuralRigidityNm(double youngsModulusPa, double thicknessM, double poisson) {
        if (!(youngsModulusPa > 0 && thicknessM > 0)) {
            throw new IllegalArgumentException("modulus and thickness must be positive");
        }
        return youngsModulusPa * thicknessM * thicknessM * thicknessM / (12 * (1 - poisson * poisson));
    }

    /** Clamped edge: largest stress (at the edge) 3 q a² / (4 t²). */
    public static double clampedMaxStressPa(double pressurePa, double radiusM, double thicknessM) {
        return 3 * pressurePa * radiusM * radiusM / (4 * thicknessM * thicknessM);
    }

    /** Clamped edge: centre deflection q a⁴ / (64 D). */
    public static double clampedCentreDeflectionM(double pressurePa, double radiusM, double thicknessM,
            double youngsModulusPa, double poisson) {
        double d = flexuralRigidityNm(youngsModulusPa, thicknessM, poisson);
        return pressurePa * Math.pow(radiusM, 4) / (64 * d);
    }

    /** Simply supported edge: largest stress (at the centre) 3(3 + ν) q a² / (8 t²). */
    public static double simplySupportedMaxStressPa(double pressurePa, double radiusM, double thicknessM,
            double poisson) {
        return 3 * (3 + poisson) * pressurePa * radiusM * radiusM / (8 * thicknessM * thicknessM);
    }

    /** Simply supported edge: centre deflection (5 + ν) q a⁴ / (64 (1 + ν) D). */
    public static double simplySupportedCentreDeflectionM(double pressurePa, double radiusM, double thicknessM,
            double youngsModulusPa, double poisson) {
        double d = flexuralRigidityNm(youngsModulusPa, thicknessM, poisson);
        return (5 + poisson) * pressurePa * Math.pow(radiusM, 4) / (64 * (1 + poisson) * d);
    }

    /** True while the small-deflection theory holds (deflection ≤ t/2, from memory). */
    public static boolean smallDeflection(double deflectionM, double thicknessM) {
        return deflectionM <= thicknessM / 2;
    }
}
