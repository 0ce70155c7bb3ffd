package org.shearstack.check.safety;

/**
 * The first lines of every report: how far the supply may be turned up for this build, and the speeds behind it.
 * report.json carries these as safety.maxSafeSupplyPressureBarG, safety.runawaySpeedRpm,
 * safety.allowableSpeedRpm.
 *
 * @param maxSafeSupplyPressurePa  highest supply pressure (absolute) whose runaway stays within the allowable
 *                                 speed; {@link Double#POSITIVE_INFINITY} never, capped at the search ceiling
 * @param ambientPressurePa        ambient pressure used for the gauge value
 * @param runawaySpeedRadPerS      runaway speed at the design supply pressure
 * @param allowableSpeedRadPerS    allowable speed of the weakest spinning part
 * @param governingPart            the part that sets the allowable speed
 * @param ceilingReached           true when the runaway stays within the allowable up to the search ceiling
 */
public record SafetySummary(double maxSafeSupplyPressurePa, double ambientPressurePa, double runawaySpeedRadPerS,
        double allowableSpeedRadPerS, String governingPart, boolean ceilingReached) {

    public double maxSafeSupplyPressureBarG() {
        return (maxSafeSupplyPressurePa - ambientPressurePa) / 1e5;
    }

    public double runawaySpeedRpm() {
        return runawaySpeedRadPerS * 60 / (2 * Math.PI);
    }

    public double allowableSpeedRpm() {
        return allowableSpeedRadPerS * 60 / (2 * Math.PI);
    }
}
