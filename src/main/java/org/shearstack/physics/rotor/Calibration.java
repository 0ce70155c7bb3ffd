package org.shearstack.physics.rotor;

/**
 * The loss coefficients and readings the physics cannot pin down from first principles, as one input to the
 * model. Defaults are the tool's nominal estimate; bench data (run-up, coast-down) can fit them later.
 *
 * @param admission                  how rim-struck jet flow is treated
 * @param endFaceScale               multiplier on the Daily &amp; Nece end-face moment
 * @param rimScale                   multiplier on the rim friction moment
 * @param bearingFrictionCoefficient μ of the load term M = μ·P·d/2 per bearing
 * @param bearingSpeedFactor         f₀ of the Palmgren speed term M₀ = 10⁻⁷ f₀ (ν n)^(2/3) d_m³ N·mm
 * @param sealTorquePerBearingNm     drag of the contact seals of one sealed bearing
 * @param dischargeScale             multiplier on the nozzle's discharge coefficient (result capped at 1)
 * @param name                       a short label ("nominal", "optimistic", "pessimistic", "calibrated")
 */
public record Calibration(AdmissionReading admission, double endFaceScale, double rimScale,
        double bearingFrictionCoefficient, double bearingSpeedFactor, double sealTorquePerBearingNm,
        double dischargeScale, String name) {

    public Calibration {
        java.util.Objects.requireNonNull(admission, "admission");
        for (double v : new double[] {endFaceScale, rimScale, bearingFrictionCoefficient, bearingSpeedFactor,
                sealTorquePerBearingNm}) {
            if (!(v >= 0) || Double.isInfinite(v)) {
                throw new IllegalArgumentException("calibration coefficients must be finite and >= 0, found " + v);
            }
        }
        if (!(dischargeScale > 0)) {
            throw new IllegalArgumentException("discharge scale must be positive, found " + dischargeScale);
        }
    }

    /**
     * Nominal estimate: rim-struck flow capped at the smaller of jet and rim swirl; Daily &amp; Nece and rim
     * friction as correlated; μ = 0.0015 for deep-groove ball bearings (RoyMech; Koyo catalogue table 4-1
     * gives 0.0010–0.0015); f₀ = 1.0 for a greased deep-groove bearing (Palmgren; 0.7–2 from memory); 1 mN·m seal drag
     * per sealed bearing (engineering judgment, from memory; calibrate by coast-down).
     */
    public static Calibration nominal() {
        return new Calibration(AdmissionReading.RIM_STRUCK_CAPPED, 1.0, 1.0, 0.0015, 1.0, 1.0e-3, 1.0, "nominal");
    }

    /** Optimistic reading around a base: capped admission, low parasitic coefficients, discharge +5 %. */
    public Calibration optimistic() {
        return new Calibration(AdmissionReading.RIM_STRUCK_CAPPED, endFaceScale * 0.7, rimScale * 0.7,
                bearingFrictionCoefficient * (0.0010 / 0.0015), bearingSpeedFactor * 0.7,
                sealTorquePerBearingNm * 0.5, dischargeScale * 1.05, "optimistic");
    }

    /** Pessimistic reading around a base: rim-struck flow does no work, high parasitic coefficients, discharge −10 %. */
    public Calibration pessimistic() {
        return new Calibration(AdmissionReading.JET_FRACTION_ONLY, endFaceScale * 1.5, rimScale * 1.5,
                bearingFrictionCoefficient * 2.0, bearingSpeedFactor * 2.0, sealTorquePerBearingNm * 2.0,
                dischargeScale * 0.9, "pessimistic");
    }
}
