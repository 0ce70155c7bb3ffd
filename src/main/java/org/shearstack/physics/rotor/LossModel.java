package org.shearstack.physics.rotor;

/**
 * The hardware that causes losses outside the gaps (the coefficients live in {@link Calibration}).
 *
 * @param bearingCount                 number of rolling bearings on the shaft
 * @param bearingBoreM                 bearing bore d
 * @param bearingMeanDiameterM         bearing pitch diameter d_m = (d + D)/2
 * @param bearingLoadN                 radial load per bearing (rotor weight share plus unbalance)
 * @param sealedBearings               how many of them carry contact seals
 * @param lubricantViscosityCSt        base-oil viscosity at running temperature, for the Palmgren speed term
 * @param exhaustLossCoefficient       static-pressure loss of the exhaust ports in dynamic heads of the port flow
 */
public record LossModel(int bearingCount, double bearingBoreM, double bearingMeanDiameterM, double bearingLoadN,
        int sealedBearings, double lubricantViscosityCSt, double exhaustLossCoefficient) {

    public LossModel {
        if (bearingCount < 0 || sealedBearings < 0 || sealedBearings > bearingCount) {
            throw new IllegalArgumentException("bearing counts must satisfy 0 <= sealed <= count, found "
                    + sealedBearings + " of " + bearingCount);
        }
        if (!(bearingBoreM >= 0) || !(bearingMeanDiameterM >= bearingBoreM) || !(bearingLoadN >= 0)
                || !(lubricantViscosityCSt >= 0) || !(exhaustLossCoefficient >= 0)) {
            throw new IllegalArgumentException("loss model values must be >= 0 with d_m >= bore");
        }
    }

    /**
     * Two shielded 608 bearings (8 × 22 mm, d_m 15 mm), 2 N each, grease base oil 40 cSt at running temperature; exhaust ports losing
     * 1.5 dynamic heads (0.5 sharp entry + 1 exit, Idelchik's handbook values from memory).
     */
    public static LossModel twoShielded608() {
        return new LossModel(2, 0.008, 0.015, 2.0, 0, 40.0, 1.5);
    }

    /** No bearings and a free exhaust (K = 1): for checks of the rotor alone. */
    public static LossModel none() {
        return new LossModel(0, 0.0, 0.0, 0.0, 0, 0.0, 1.0);
    }
}
