package org.shearstack.physics.rotor;

/**
 * The flow geometry of a disc pack in its housing, in SI units (metres, square metres, degrees for the jet angle).
 *
 * @param outerRadiusM     disc outer radius r₂ (rotor inlet)
 * @param exhaustRadiusM   radius r₁ where the flow leaves the gaps into the exhaust ports (rotor outlet)
 * @param gapM             face-to-face gap b between adjacent discs
 * @param discThicknessM   disc thickness t
 * @param discCount        number of discs N_d (N_d − 1 gaps)
 * @param endClearanceM    axial clearance s between an outer disc face and its cover
 * @param rimClearanceM    radial clearance between the disc rims and the housing bore
 * @param exhaustAreaM2    total flow area of the exhaust ports
 * @param jetAngleDeg      angle of the jet to the rotor tangent
 */
public record TurbineGeometry(double outerRadiusM, double exhaustRadiusM, double gapM, double discThicknessM,
        int discCount, double endClearanceM, double rimClearanceM, double exhaustAreaM2, double jetAngleDeg) {

    public TurbineGeometry {
        positive(outerRadiusM, "outerRadiusM");
        positive(exhaustRadiusM, "exhaustRadiusM");
        positive(gapM, "gapM");
        positive(discThicknessM, "discThicknessM");
        positive(endClearanceM, "endClearanceM");
        positive(rimClearanceM, "rimClearanceM");
        positive(exhaustAreaM2, "exhaustAreaM2");
        if (!(exhaustRadiusM < outerRadiusM)) {
            throw new IllegalArgumentException("exhaust radius must be below the outer radius, found "
                    + exhaustRadiusM + " m >= " + outerRadiusM + " m");
        }
        if (discCount < 2) {
            throw new IllegalArgumentException("a disc pack needs at least 2 discs, found " + discCount);
        }
        if (!(jetAngleDeg >= 0 && jetAngleDeg < 90)) {
            throw new IllegalArgumentException("jet angle to the tangent must be in [0, 90) deg, found " + jetAngleDeg);
        }
    }

    /** Number of gaps N_g = N_d − 1. */
    public int gapCount() {
        return discCount - 1;
    }

    /** Axial height of the pack N_d·t + N_g·b. */
    public double packHeightM() {
        return discCount * discThicknessM + gapCount() * gapM;
    }

    /**
     * Fraction of a slot jet spanning the pack that faces gaps rather than disc rims,
     * φ = N_g b/(N_g b + N_d t) (physics.md §1.5).
     */
    public double admissionFraction() {
        return gapCount() * gapM / packHeightM();
    }

    /** The same geometry with another speed-independent field changed: gap and count. */
    public TurbineGeometry withGapAndDiscs(double newGapM, int newDiscCount) {
        return new TurbineGeometry(outerRadiusM, exhaustRadiusM, newGapM, discThicknessM, newDiscCount,
                endClearanceM, rimClearanceM, exhaustAreaM2, jetAngleDeg);
    }

    private static void positive(double v, String name) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(name + " must be positive, found " + v);
        }
    }
}
