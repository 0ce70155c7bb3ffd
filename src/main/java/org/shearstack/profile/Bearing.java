package org.shearstack.profile;

/**
 * A deep-groove ball bearing's boundary dimensions (ISO 15), in mm.
 *
 * @param widthShieldedMm width of the shielded/sealed version, NaN when it equals {@code widthMm}
 * @param chamferMinMm    smallest ring chamfer r_s min: a mating fillet must be no larger
 */
public record Bearing(String designation, double boreMm, double outerMm, double widthMm, double widthShieldedMm,
                      double chamferMinMm) {

    /** Mean diameter (d + D) / 2, for the n·dm speed factor. */
    public double meanDiameterMm() {
        return (boreMm + outerMm) / 2;
    }
}
