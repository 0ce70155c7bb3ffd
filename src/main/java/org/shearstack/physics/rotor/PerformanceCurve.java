package org.shearstack.physics.rotor;

import java.util.List;

/**
 * Map points from stall to runaway under one calibration.
 *
 * @param calibration            the coefficients and readings used
 * @param points                 points at evenly spaced speeds from 0 to the runaway speed
 * @param runawaySpeedRadPerS    no-load speed where the shaft torque is zero
 * @param stallTorqueNm          shaft torque at zero speed
 */
public record PerformanceCurve(Calibration calibration, List<OperatingPoint> points, double runawaySpeedRadPerS,
        double stallTorqueNm) {

    public PerformanceCurve {
        points = List.copyOf(points);
    }

    /** The point of highest shaft power. */
    public OperatingPoint peakPower() {
        OperatingPoint best = points.get(0);
        for (OperatingPoint p : points) {
            if (p.shaftPowerW() > best.shaftPowerW()) {
                best = p;
            }
        }
        return best;
    }

    /** Fraction of the points outside the model's validity range ({@link Validity#inRange()}). */
    public double fractionOutOfRange() {
        long out = points.stream().filter(p -> !p.validity().inRange()).count();
        return points.isEmpty() ? 0.0 : (double) out / points.size();
    }

    /** Fraction of the points whose gap flow is beyond the laminar limit (carried by the turbulent closure). */
    public double fractionBeyondLaminar() {
        long out = points.stream().filter(p -> !p.validity().laminar()).count();
        return points.isEmpty() ? 0.0 : (double) out / points.size();
    }
}
