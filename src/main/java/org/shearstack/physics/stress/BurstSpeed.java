package org.shearstack.physics.stress;

/**
 * Burst-speed estimates for thin rotating discs (physics.md §4.2). Stress scales with ω², so each
 * estimate is the speed at which the chosen stress reaches the strength S.
 *
 * <ul>
 *   <li>Peak-stress criterion: first fracture where the elastic stress is highest (Timoshenko &amp; Goodier
 *       §32 closed forms). Used for brittle printed plastics.</li>
 *   <li>Mean-hoop-stress criterion (Robinson 1944, from memory): ductile discs burst when the average hoop
 *       stress over the section reaches S. Optimistic for printed parts; reported for comparison only.</li>
 * </ul>
 */
public final class BurstSpeed {

    private BurstSpeed() {
    }

    /** Peak-stress burst speed of a solid disc: √(8S/((3+ν)ρb²)). */
    public static double peakStressSolidRadPerS(double strengthPa, double densityKgPerM3, double poisson,
            double outerRadiusM) {
        requirePositive(strengthPa, densityKgPerM3, outerRadiusM);
        return Math.sqrt(8 * strengthPa / ((3 + poisson) * densityKgPerM3 * outerRadiusM * outerRadiusM));
    }

    /** Peak-stress burst speed of a holed disc: √(4S/((3+ν)ρb²(1 + (1−ν)a²/((3+ν)b²)))). */
    public static double peakStressHoledRadPerS(double strengthPa, double densityKgPerM3, double poisson,
            double innerRadiusM, double outerRadiusM) {
        requirePositive(strengthPa, densityKgPerM3, outerRadiusM);
        double unitStress = RotatingDisc.holedPeakHoopStressPa(densityKgPerM3, poisson, 1.0, innerRadiusM,
                outerRadiusM);
        return Math.sqrt(strengthPa / unitStress);
    }

    /** Mean-hoop burst speed of an annulus (a = 0 for solid): √(3S(b − a)/(ρ(b³ − a³))). */
    public static double meanHoopRadPerS(double strengthPa, double densityKgPerM3, double innerRadiusM,
            double outerRadiusM) {
        requirePositive(strengthPa, densityKgPerM3, outerRadiusM);
        double unitStress = RotatingDisc.meanHoopStressPa(densityKgPerM3, 1.0, innerRadiusM, outerRadiusM);
        return Math.sqrt(strengthPa / unitStress);
    }

    /**
     * Speed at which a stress that scales with ω² reaches the strength, given that stress at one known speed.
     * Works for any of the closed forms (including those multiplied by a stress-concentration allowance).
     */
    public static double speedForStressRadPerS(double strengthPa, double stressAtSpeedPa, double speedRadPerS) {
        if (!(stressAtSpeedPa > 0 && speedRadPerS > 0 && strengthPa > 0)) {
            throw new IllegalArgumentException("need positive strength, stress and speed");
        }
        return speedRadPerS * Math.sqrt(strengthPa / stressAtSpeedPa);
    }

    /**
     * Allowable tip speed, independent of diameter because σ ∝ ρv²: √(8S/((3+ν)ρ)) for a solid disc,
     * √(4S/((3+ν)ρ)) for a disc with a small central hole.
     */
    public static double allowableTipSpeedMPerS(double allowableStressPa, double densityKgPerM3, double poisson,
            boolean smallCentralHole) {
        requirePositive(allowableStressPa, densityKgPerM3, 1);
        double c = smallCentralHole ? 4 : 8;
        return Math.sqrt(c * allowableStressPa / ((3 + poisson) * densityKgPerM3));
    }

    private static void requirePositive(double strengthPa, double densityKgPerM3, double radiusM) {
        if (!(strengthPa > 0)) {
            throw new IllegalArgumentException("strength must be positive, found " + strengthPa + " Pa");
        }
        if (!(densityKgPerM3 > 0)) {
            throw new IllegalArgumentException("density must be positive, found " + densityKgPerM3 + " kg/m3");
        }
        if (!(radiusM > 0)) {
            throw new IllegalArgumentException("outer radius must be positive, found " + radiusM + " m");
        }
    }
}
