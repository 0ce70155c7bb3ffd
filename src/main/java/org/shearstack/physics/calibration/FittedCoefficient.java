package org.shearstack.physics.calibration;

/**
 * One calibration coefficient before and after fitting to bench data.
 *
 * @param key    the calibration file key ("bearing-speed-factor")
 * @param before value of the prior calibration
 * @param after  value after fitting (equal to before when not fitted)
 * @param fitted true when the bench data determined it
 * @param note   why it was or was not fitted
 */
public record FittedCoefficient(String key, double before, double after, boolean fitted, String note) {
}
