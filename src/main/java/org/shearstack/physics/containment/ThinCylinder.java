package org.shearstack.physics.containment;

/**
 * Thin-walled cylinder under internal gauge pressure (membrane stresses, wall thickness below about a tenth
 * of the radius; any mechanics-of-materials text, e.g. Roark's Formulas, thin-walled pressure vessels).
 */
public final class ThinCylinder {

    private ThinCylinder() {
    }

    /** Hoop stress p·r/t. */
    public static double hoopStressPa(double gaugePressurePa, double radiusM, double wallThicknessM) {
        requireGeometry(radiusM, wallThicknessM);
        return gaugePressurePa * radiusM / wallThicknessM;
    }

    /** Axial stress p·r/(2t) of a closed-ended cylinder. */
    public static double axialStressPa(double gaugePressurePa, double radiusM, double wallThicknessM) {
        requireGeometry(radiusM, wallThicknessM);
        return gaugePressurePa * radiusM / (2 * wallThicknessM);
    }

    /** True when t/r is small enough (≤ 0.1) for the membrane formulas; beyond that they are conservative-ish. */
    public static boolean isThin(double radiusM, double wallThicknessM) {
        return wallThicknessM / radiusM <= 0.1;
    }

    /**
     * Largest hoop stress of a thick cylinder under internal pressure (Lamé, at the bore):
     * p(b² + a²)/(b² − a²), a = inner, b = outer radius. Use for printed walls where t/r > 0.1.
     */
    public static double lameBoreHoopStressPa(double gaugePressurePa, double innerRadiusM, double outerRadiusM) {
        if (!(innerRadiusM > 0 && outerRadiusM > innerRadiusM)) {
            throw new IllegalArgumentException("need 0 < inner radius < outer radius, found " + innerRadiusM
                    + " m, " + outerRadiusM + " m");
        }
        double a2 = innerRadiusM * innerRadiusM;
        double b2 = outerRadiusM * outerRadiusM;
        return gaugePressurePa * (b2 + a2) / (b2 - a2);
    }

    private static void requireGeometry(double radiusM, double wallThicknessM) {
        if (!(radiusM > 0 && wallThicknessM > 0)) {
            throw new IllegalArgumentException("radius and wall thickness must be positive, found r=" + radiusM
                    + " m, t=" + wallThicknessM + " m");
        }
    }
}
