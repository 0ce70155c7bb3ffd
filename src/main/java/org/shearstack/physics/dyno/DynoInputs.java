package org.shearstack.physics.dyno;

import java.util.Optional;
import java.util.OptionalInt;

/**
 * What the analysis needs besides the log.
 *
 * @param inertiaKgM2  moment of inertia of everything that spins (rotor, shaft, coupling, generator rotor)
 * @param runUp        run-up time range, or empty to detect it
 * @param coastDown    coast-down time range, or empty to detect it
 * @param windowPoints Savitzky–Golay window in points, or empty to choose it from the sample rate
 * @param prediction   predicted torque curve to compare with, or empty
 */
public record DynoInputs(double inertiaKgM2, Optional<TimeRange> runUp, Optional<TimeRange> coastDown,
        OptionalInt windowPoints, Optional<Prediction> prediction) {
    public DynoInputs {
        if (!(inertiaKgM2 > 0) || !Double.isFinite(inertiaKgM2)) {
            throw new IllegalArgumentException("inertia must be a positive number of kg·m², found " + inertiaKgM2);
        }
    }

    /** Inputs with everything detected and no prediction. */
    public static DynoInputs of(double inertiaKgM2) {
        return new DynoInputs(inertiaKgM2, Optional.empty(), Optional.empty(), OptionalInt.empty(), Optional.empty());
    }

    public DynoInputs withPrediction(Prediction p) {
        return new DynoInputs(inertiaKgM2, runUp, coastDown, windowPoints, Optional.of(p));
    }
}
