package org.shearstack.physics.calibration;

import java.util.List;
import org.shearstack.physics.rotor.Calibration;

/**
 * The result of calibrating a model to bench runs, with before/after against the measurement.
 *
 * @param before                  the prior calibration
 * @param after                   the fitted calibration
 * @param coefficients            every coefficient with its status
 * @param measuredNoLoadRadPerS   mean measured no-load speed of the runs
 * @param noLoadBeforeRadPerS     model no-load speed with the prior calibration
 * @param noLoadAfterRadPerS      model no-load speed with the fitted calibration
 * @param lossRmsBeforeNm         rms of coast-down loss torque, model − measured, before
 * @param lossRmsAfterNm          the same after
 * @param torqueRmsBeforeNm       rms of run-up shaft torque, model − measured, before
 * @param torqueRmsAfterNm        the same after
 * @param curve                   measured and predicted shaft torque at the run-up's speed bins
 * @param notes                   what the data could and could not tell
 */
public record CalibrationFit(Calibration before, Calibration after, List<FittedCoefficient> coefficients,
        double measuredNoLoadRadPerS, double noLoadBeforeRadPerS, double noLoadAfterRadPerS, double lossRmsBeforeNm,
        double lossRmsAfterNm, double torqueRmsBeforeNm, double torqueRmsAfterNm, List<CurveSample> curve,
        List<String> notes) {
    public CalibrationFit {
        coefficients = List.copyOf(coefficients);
        curve = List.copyOf(curve);
        notes = List.copyOf(notes);
    }

    /** Measured shaft torque against the model before and after, at one speed. */
    public record CurveSample(double speedRadPerS, double measuredShaftTorqueNm, double beforeShaftTorqueNm,
            double afterShaftTorqueNm) {
    }
}
