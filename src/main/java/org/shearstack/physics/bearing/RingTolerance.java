package org.shearstack.physics.bearing;

import org.shearstack.physics.fit.ToleranceZone;

/**
 * Normal-class (ISO class 0) tolerances of the mean bore and mean outside diameter of radial bearings
 * (governing standard ISO 492, not read directly). Bore Δdmp: NTN handbook table 5.1, cross-checked by a
 * bearing fit table (standards.md §1.3, keys NTNTOL and GBB). Outside ΔDmp: SKF "Tolerances and resultant
 * fits", table 8 (SKF8). Upper deviation is always 0.
 */
public final class RingTolerance {

    // Ranges "over ... up to and including", mm.
    private static final double[] LIMITS = {2.5, 10, 18, 30, 50, 80};
    private static final int[] BORE_LOWER_UM = {-8, -8, -10, -12, -15};
    // Outside diameter over 6 up to 10 is -8 as well (SKF8); the table starts at D > 6.
    private static final int[] OD_LOWER_UM = {-8, -8, -9, -11, -13};

    private RingTolerance() {
    }

    /** Lower deviation of the mean bore (µm); the upper is 0. */
    public static int boreLowerDeviationMicrometres(double boreMm) {
        return BORE_LOWER_UM[rangeIndex(boreMm, 2.5, "bore")];
    }

    /** Lower deviation of the mean outside diameter (µm); the upper is 0. */
    public static int outsideLowerDeviationMicrometres(double outsideDiameterMm) {
        return OD_LOWER_UM[rangeIndex(outsideDiameterMm, 6, "outside diameter")];
    }

    /** The bore of a normal-class bearing as an internal tolerance zone. */
    public static ToleranceZone boreZone(double boreMm) {
        return new ToleranceZone(boreMm, "bearing bore, normal class", true, 0, boreLowerDeviationMicrometres(boreMm));
    }

    /** The outside diameter of a normal-class bearing as an external tolerance zone. */
    public static ToleranceZone outsideZone(double outsideDiameterMm) {
        return new ToleranceZone(outsideDiameterMm, "bearing outside diameter, normal class", false, 0,
                outsideLowerDeviationMicrometres(outsideDiameterMm));
    }

    private static int rangeIndex(double sizeMm, double smallest, String what) {
        if (sizeMm > smallest) {
            for (int i = 1; i < LIMITS.length; i++) {
                if (sizeMm <= LIMITS[i]) {
                    return i - 1;
                }
            }
        }
        throw new IllegalArgumentException("bearing " + what + " " + sizeMm + " mm outside the tabulated range (over "
                + smallest + " up to 80 mm)");
    }
}
