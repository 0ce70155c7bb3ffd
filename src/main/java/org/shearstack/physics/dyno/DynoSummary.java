package org.shearstack.physics.dyno;

/**
 * Headline numbers of one bench run. NaN where the log cannot tell.
 *
 * @param peakShaftPowerW           highest shaft power in the run-up
 * @param speedAtPeakShaftPowerRadPerS speed where it occurs
 * @param peakRotorPowerW           highest rotor power (shaft + loss)
 * @param speedAtPeakRotorPowerRadPerS speed where it occurs
 * @param stallRotorTorqueNm        rotor torque extrapolated to zero speed (straight line through the lower half)
 * @param stallShaftTorqueNm        the same less the constant loss term
 * @param noLoadSpeedRadPerS        speed where the shaft torque is zero
 * @param noLoadSource              how it was found (measured steady stretch, extrapolated, or highest speed)
 * @param backEmfConstantVsPerRad   generator k_e from open-circuit samples
 * @param coastDownStopTimeS        time from the top speed to standstill predicted by the fitted loss law
 */
public record DynoSummary(double peakShaftPowerW, double speedAtPeakShaftPowerRadPerS, double peakRotorPowerW,
        double speedAtPeakRotorPowerRadPerS, double stallRotorTorqueNm, double stallShaftTorqueNm,
        double noLoadSpeedRadPerS, String noLoadSource, double backEmfConstantVsPerRad, double coastDownStopTimeS) {
}
