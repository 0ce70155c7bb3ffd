package org.shearstack.profile;

/** A threaded inlet port, in mm; {@code pilotMm} is the tap drill / printed pilot. */
public record Port(String port, double threadMajorMm, double pitchMm, double pilotMm, double spotFaceMm,
                   double depthMm, String source) {
}
