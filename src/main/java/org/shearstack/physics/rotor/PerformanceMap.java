package org.shearstack.physics.rotor;

import java.util.List;

/**
 * The performance map as an estimate inside an uncertainty band (physics.md §12.6): the estimate under the chosen
 * calibration, and the optimistic and pessimistic readings around it. Safety uses the band's upper runaway.
 *
 * @param estimate     the chosen estimate
 * @param optimistic   capped admission, low parasitic coefficients, higher discharge coefficient
 * @param pessimistic  rim-struck flow does no work, high parasitic coefficients, lower discharge coefficient
 */
public record PerformanceMap(PerformanceCurve estimate, PerformanceCurve optimistic, PerformanceCurve pessimistic) {

    public List<OperatingPoint> points() {
        return estimate.points();
    }

    public double runawaySpeedRadPerS() {
        return estimate.runawaySpeedRadPerS();
    }

    public double stallTorqueNm() {
        return estimate.stallTorqueNm();
    }

    /** Highest runaway speed of the band: the figure a safety check must use. */
    public double runawayUpperBoundRadPerS() {
        return Math.max(estimate.runawaySpeedRadPerS(),
                Math.max(optimistic.runawaySpeedRadPerS(), pessimistic.runawaySpeedRadPerS()));
    }

    /** Fraction of the estimate's points outside the validity range. */
    public double fractionOutOfRange() {
        return estimate.fractionOutOfRange();
    }
}
