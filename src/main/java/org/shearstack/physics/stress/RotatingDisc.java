package org.shearstack.physics.stress;

/**
 * Elastic stresses in a thin rotating disc of uniform thickness (plane stress, isotropic, no thermal
 * gradient, free edges): Timoshenko &amp; Goodier, <i>Theory of Elasticity</i>, §32; Roark's Formulas,
 * rotating-disk table. Valid for thickness below about a tenth of the radius. SI units throughout.
 */
public final class RotatingDisc {

    private RotatingDisc() {
    }

    /** Radial stress of a solid disc at radius r: (3+ν)/8 · ρω²(b² − r²). */
    public static double solidRadialStressPa(double densityKgPerM3, double poisson, double speedRadPerS,
            double outerRadiusM, double radiusM) {
        requireRadius(radiusM, 0, outerRadiusM);
        double k = densityKgPerM3 * speedRadPerS * speedRadPerS;
        return (3 + poisson) / 8 * k * (outerRadiusM * outerRadiusM - radiusM * radiusM);
    }

    /** Hoop stress of a solid disc at radius r: (3+ν)/8 · ρω²b² − (1+3ν)/8 · ρω²r². */
    public static double solidHoopStressPa(double densityKgPerM3, double poisson, double speedRadPerS,
            double outerRadiusM, double radiusM) {
        requireRadius(radiusM, 0, outerRadiusM);
        double k = densityKgPerM3 * speedRadPerS * speedRadPerS;
        return (3 + poisson) / 8 * k * outerRadiusM * outerRadiusM - (1 + 3 * poisson) / 8 * k * radiusM * radiusM;
    }

    /** Peak stress of a solid disc (centre, radial = hoop): (3+ν)/8 · ρω²b². */
    public static double solidPeakStressPa(double densityKgPerM3, double poisson, double speedRadPerS,
            double outerRadiusM) {
        return solidRadialStressPa(densityKgPerM3, poisson, speedRadPerS, outerRadiusM, 0);
    }

    /**
     * Radial stress of a disc with a central hole (Lamé form, free edges):
     * (3+ν)/8 · ρω² (b² + a² − a²b²/r² − r²).
     */
    public static double holedRadialStressPa(double densityKgPerM3, double poisson, double speedRadPerS,
            double innerRadiusM, double outerRadiusM, double radiusM) {
        requireAnnulus(innerRadiusM, outerRadiusM);
        requireRadius(radiusM, innerRadiusM, outerRadiusM);
        double a2 = innerRadiusM * innerRadiusM;
        double b2 = outerRadiusM * outerRadiusM;
        double r2 = radiusM * radiusM;
        return (3 + poisson) / 8 * densityKgPerM3 * speedRadPerS * speedRadPerS * (b2 + a2 - a2 * b2 / r2 - r2);
    }

    /**
     * Hoop stress of a disc with a central hole: (3+ν)/8 · ρω² (b² + a² + a²b²/r² − (1+3ν)/(3+ν) r²).
     */
    public static double holedHoopStressPa(double densityKgPerM3, double poisson, double speedRadPerS,
            double innerRadiusM, double outerRadiusM, double radiusM) {
        requireAnnulus(innerRadiusM, outerRadiusM);
        requireRadius(radiusM, innerRadiusM, outerRadiusM);
        double a2 = innerRadiusM * innerRadiusM;
        double b2 = outerRadiusM * outerRadiusM;
        double r2 = radiusM * radiusM;
        return (3 + poisson) / 8 * densityKgPerM3 * speedRadPerS * speedRadPerS
                * (b2 + a2 + a2 * b2 / r2 - (1 + 3 * poisson) / (3 + poisson) * r2);
    }

    /** Peak (hoop, at the bore) stress of a holed disc: (3+ν)/4 · ρω² [b² + (1−ν)/(3+ν) · a²]. */
    public static double holedPeakHoopStressPa(double densityKgPerM3, double poisson, double speedRadPerS,
            double innerRadiusM, double outerRadiusM) {
        requireAnnulus(innerRadiusM, outerRadiusM);
        return (3 + poisson) / 4 * densityKgPerM3 * speedRadPerS * speedRadPerS
                * (outerRadiusM * outerRadiusM + (1 - poisson) / (3 + poisson) * innerRadiusM * innerRadiusM);
    }

    /** Largest radial stress of a holed disc, at r = √(ab): (3+ν)/8 · ρω² (b − a)². */
    public static double holedPeakRadialStressPa(double densityKgPerM3, double poisson, double speedRadPerS,
            double innerRadiusM, double outerRadiusM) {
        requireAnnulus(innerRadiusM, outerRadiusM);
        double d = outerRadiusM - innerRadiusM;
        return (3 + poisson) / 8 * densityKgPerM3 * speedRadPerS * speedRadPerS * d * d;
    }

    /** Hoop stress of a thin ring of mean radius R: ρω²R² = ρv². */
    public static double thinRingHoopStressPa(double densityKgPerM3, double speedRadPerS, double meanRadiusM) {
        double v = speedRadPerS * meanRadiusM;
        return densityKgPerM3 * v * v;
    }

    /** Mean hoop stress over the section of an annulus: ρω²(b³ − a³)/(3(b − a)); a = 0 for a solid disc. */
    public static double meanHoopStressPa(double densityKgPerM3, double speedRadPerS, double innerRadiusM,
            double outerRadiusM) {
        if (!(innerRadiusM >= 0 && outerRadiusM > innerRadiusM)) {
            throw new IllegalArgumentException("need 0 <= inner radius < outer radius, found a=" + innerRadiusM
                    + " m, b=" + outerRadiusM + " m");
        }
        double a = innerRadiusM;
        double b = outerRadiusM;
        return densityKgPerM3 * speedRadPerS * speedRadPerS * (b * b * b - a * a * a) / (3 * (b - a));
    }

    static void requireAnnulus(double innerRadiusM, double outerRadiusM) {
        if (!(innerRadiusM > 0 && outerRadiusM > innerRadiusM)) {
            throw new IllegalArgumentException("holed disc needs 0 < inner radius < outer radius, found a="
                    + innerRadiusM + " m, b=" + outerRadiusM + " m");
        }
    }

    private static void requireRadius(double radiusM, double lo, double hi) {
        if (!(radiusM >= lo && radiusM <= hi)) {
            throw new IllegalArgumentException("radius " + radiusM + " m outside [" + lo + ", " + hi + "] m");
        }
    }
}
