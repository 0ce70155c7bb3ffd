package org.shearstack.physics.stress;

/**
 * How a spinning part stands at the highest speed it can reach.
 *
 * @param burstSpeedRadPerS     speed at which the peak stress reaches the design strength
 * @param allowableSpeedRadPerS burst speed divided by √(safety factor on stress)
 * @param reachableSpeedRadPerS the highest speed the air can drive it to (runaway)
 * @param stressAtReachablePa   peak stress at that speed
 * @param strengthPa            the design strength used
 * @param safetyFactor          the required factor on stress
 */
public record BurstAssessment(double burstSpeedRadPerS, double allowableSpeedRadPerS, double reachableSpeedRadPerS,
        double stressAtReachablePa, double strengthPa, SafetyFactor safetyFactor) {

    /** Assesses a part of the given density, Poisson ratio and design strength at a reachable speed. */
    public static BurstAssessment of(SpinningAnnulus part, double densityKgPerM3, double poisson, double strengthPa,
            SafetyFactor factor, double reachableSpeedRadPerS) {
        double burst = part.burstSpeedRadPerS(strengthPa, densityKgPerM3, poisson);
        double stress = part.peakStressPa(densityKgPerM3, poisson, reachableSpeedRadPerS);
        return new BurstAssessment(burst, factor.allowableSpeedRadPerS(burst), reachableSpeedRadPerS, stress,
                strengthPa, factor);
    }

    /**
     * The allowable speed of a part: its peak-stress burst speed at the design strength, divided by the safety
     * factor on speed (√ of the factor on stress). The one computation the burst checks and the sizing rules share.
     */
    public static double allowableSpeedRadPerS(SpinningAnnulus part, double densityKgPerM3, double poisson,
            double strengthPa, SafetyFactor factor) {
        return factor.allowableSpeedRadPerS(part.burstSpeedRadPerS(strengthPa, densityKgPerM3, poisson));
    }

    /**
     * Allowable rim speed (m/s) of a printed disc with exhaust ports out to {@code portRingRatio} × its radius:
     * design strength {@link PrintedStrength#inPlanePa}, the port allowance of
     * {@link SpinningAnnulus#withExhaustPorts}, the safety factor on stress. Independent of the diameter because
     * σ ∝ ρv² (physics.md §4.2).
     */
    public static double allowableRimSpeedOfPortedDiscMPerS(double portRingRatio, double densityKgPerM3,
            double poisson, double tensileXyPa, SafetyFactor factor) {
        SpinningAnnulus unit = SpinningAnnulus.withExhaustPorts(1.0, portRingRatio);
        return allowableSpeedRadPerS(unit, densityKgPerM3, poisson, PrintedStrength.inPlanePa(tensileXyPa), factor);
    }

    /** Achieved factor on stress: strength / stress at the reachable speed (infinite at rest). */
    public double stressFactor() {
        return stressAtReachablePa == 0 ? Double.POSITIVE_INFINITY : strengthPa / stressAtReachablePa;
    }

    /** Burst margin as a speed ratio: burst speed / reachable speed. */
    public double burstSpeedRatio() {
        return reachableSpeedRadPerS == 0 ? Double.POSITIVE_INFINITY : burstSpeedRadPerS / reachableSpeedRadPerS;
    }

    /** True when the reachable speed is within the allowable speed (the stress factor meets the requirement). */
    public boolean withinAllowable() {
        return reachableSpeedRadPerS <= allowableSpeedRadPerS;
    }

    /** True when the reachable speed is at or beyond the burst estimate itself. */
    public boolean beyondBurst() {
        return reachableSpeedRadPerS >= burstSpeedRadPerS;
    }
}
