package org.shearstack.physics.dyno;

import java.util.Objects;
import java.util.function.DoubleUnaryOperator;

/**
 * A predicted torque-vs-speed curve to compare a bench run with.
 *
 * @param torqueNm torque in N·m as a function of speed in rad/s
 * @param basis    which measured torque it should be compared with
 * @param label    where it comes from, e.g. "performance map of demo.yaml"
 */
public record Prediction(DoubleUnaryOperator torqueNm, Basis basis, String label) {
    /** What the predicted torque includes. */
    public enum Basis {
        /** Torque of the air on the discs, before bearing and windage losses (compare with rotor torque). */
        ROTOR,
        /** Torque left for a load after the rotor's own losses (compare with shaft torque). */
        SHAFT
    }

    public Prediction {
        Objects.requireNonNull(torqueNm, "torqueNm");
        Objects.requireNonNull(basis, "basis");
        label = label == null ? "" : label;
    }
}
