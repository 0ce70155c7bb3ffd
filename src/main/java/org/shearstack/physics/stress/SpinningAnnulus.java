package org.shearstack.physics.stress;

/**
 * A spinning flat part (disc, spacer, hub flange) reduced to what its burst estimate needs: outer radius,
 * effective inner radius and a stress-concentration allowance.
 *
 * <p>Exhaust ports near the hub make a disc behave like a holed disc whose hole reaches the outer edge of the
 * port ring (physics.md §4.2, from memory); use that radius as {@code innerRadiusM}. The holed-disc peak already
 * carries the factor of two that a small round hole gets in an equibiaxial field (the "hole doubles the peak"
 * result of §4.1). {@code concentration} is the extra allowance on top for port shape, sharp corners and webs:
 * {@link #EXHAUST_PORT_ALLOWANCE} by default, 1 for a plain bore.
 *
 * @param outerRadiusM  outer radius b
 * @param innerRadiusM  effective inner radius a (0 for a solid disc)
 * @param concentration multiplier on the closed-form peak stress, ≥ 1
 */
public record SpinningAnnulus(double outerRadiusM, double innerRadiusM, double concentration) {

    /**
     * Extra allowance for kidney-shaped exhaust ports and their corner radii, over the holed-disc peak: 1.5.
     * Engineering judgement from memory (physics.md §4.2 quotes k_t ≈ 2–3 around a round hole in a biaxial
     * field [M]; the holed-disc formula already contains about 2 of that). Not a published value.
     */
    public static final double EXHAUST_PORT_ALLOWANCE = 1.5;

    public SpinningAnnulus {
        if (!(outerRadiusM > 0 && innerRadiusM >= 0 && innerRadiusM < outerRadiusM)) {
            throw new IllegalArgumentException("need 0 <= inner radius < outer radius, found inner " + innerRadiusM
                    + " m, outer " + outerRadiusM + " m");
        }
        if (!(concentration >= 1 && concentration <= 5)) {
            throw new IllegalArgumentException("stress-concentration allowance must be in [1, 5], found "
                    + concentration);
        }
    }

    /** A disc with a plain central bore. */
    public static SpinningAnnulus plainBore(double outerRadiusM, double boreRadiusM) {
        return new SpinningAnnulus(outerRadiusM, boreRadiusM, 1.0);
    }

    /** A disc whose exhaust ports reach out to {@code portRingOuterRadiusM}, with the default allowance. */
    public static SpinningAnnulus withExhaustPorts(double outerRadiusM, double portRingOuterRadiusM) {
        return new SpinningAnnulus(outerRadiusM, portRingOuterRadiusM, EXHAUST_PORT_ALLOWANCE);
    }

    /** Peak elastic stress at a speed, allowance included. */
    public double peakStressPa(double densityKgPerM3, double poisson, double speedRadPerS) {
        double nominal = innerRadiusM == 0
                ? RotatingDisc.solidPeakStressPa(densityKgPerM3, poisson, speedRadPerS, outerRadiusM)
                : RotatingDisc.holedPeakHoopStressPa(densityKgPerM3, poisson, speedRadPerS, innerRadiusM,
                        outerRadiusM);
        return concentration * nominal;
    }

    /** Speed at which the peak stress reaches the strength (peak-stress criterion). */
    public double burstSpeedRadPerS(double strengthPa, double densityKgPerM3, double poisson) {
        return BurstSpeed.speedForStressRadPerS(strengthPa, peakStressPa(densityKgPerM3, poisson, 1.0), 1.0);
    }
}
