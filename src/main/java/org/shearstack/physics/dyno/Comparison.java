package org.shearstack.physics.dyno;

/**
 * Measured against predicted torque over the middle of the speed range (20–80 % of the no-load speed).
 *
 * @param label                  the prediction's label
 * @param basis                  which measured torque was compared
 * @param meanRatio              mean of measured / predicted
 * @param rmsDifferenceNm        root-mean-square of measured − predicted
 * @param samples                samples compared
 */
public record Comparison(String label, Prediction.Basis basis, double meanRatio, double rmsDifferenceNm, int samples) {
}
