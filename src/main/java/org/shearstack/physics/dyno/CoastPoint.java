package org.shearstack.physics.dyno;

/**
 * One coast-down sample after smoothing.
 *
 * @param timeS                sample time
 * @param speedRadPerS         smoothed speed
 * @param accelerationRadPerS2 smoothed dω/dt (negative)
 * @param measuredLossTorqueNm −I·α
 * @param fittedLossTorqueNm   the fitted loss law at this speed
 * @param usedInFit            false for samples trimmed at the segment's ends or below the stop threshold
 */
public record CoastPoint(double timeS, double speedRadPerS, double accelerationRadPerS2, double measuredLossTorqueNm,
        double fittedLossTorqueNm, boolean usedInFit) {
}
