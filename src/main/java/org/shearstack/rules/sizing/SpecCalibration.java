package org.shearstack.rules.sizing;

import static org.shearstack.spec.Dimension.DIMENSIONLESS;
import static org.shearstack.spec.Dimension.TEXT;
import static org.shearstack.spec.Dimension.TORQUE;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.shearstack.io.calibration.CalibrationFile;
import org.shearstack.physics.rotor.AdmissionReading;
import org.shearstack.physics.rotor.Calibration;
import org.shearstack.rules.Derivation;
import org.shearstack.rules.Key;
import org.shearstack.rules.Seed;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.Problem;
import org.shearstack.spec.Spec;

/**
 * The spec key {@code calibration: FILE.yaml} (relative to the spec): the file written by
 * {@code shearstack calibrate}, read with its one reader ({@link CalibrationFile}), becomes CALIBRATED seeds the
 * performance model of the sizing rules and of every later stage reads ({@link #calibration}).
 */
public final class SpecCalibration {

    /** The spec key naming the file. */
    public static final String SPEC_KEY = "calibration";

    public static final Key ADMISSION = Key.of("calibration.admission", TEXT);
    public static final Key END_FACE_SCALE = Key.of("calibration.end-face-scale", DIMENSIONLESS);
    public static final Key RIM_SCALE = Key.of("calibration.rim-scale", DIMENSIONLESS);
    public static final Key BEARING_FRICTION = Key.of("calibration.bearing-friction-coefficient", DIMENSIONLESS);
    public static final Key BEARING_SPEED_FACTOR = Key.of("calibration.bearing-speed-factor", DIMENSIONLESS);
    public static final Key SEAL_TORQUE = Key.of("calibration.seal-torque-per-bearing", TORQUE);
    public static final Key DISCHARGE_SCALE = Key.of("calibration.discharge-scale", DIMENSIONLESS);

    /** Every key a calibrated spec seeds; rules that build the model list them as (optional) reads. */
    public static final List<Key> KEYS = List.of(ADMISSION, END_FACE_SCALE, RIM_SCALE, BEARING_FRICTION,
            BEARING_SPEED_FACTOR, SEAL_TORQUE, DISCHARGE_SCALE);

    private SpecCalibration() {
    }

    /**
     * Seeds from the spec's calibration file; none when the spec has no {@code calibration} key. A missing or
     * bad file adds located problems.
     */
    public static List<Seed> seeds(Spec spec, List<Problem> problems) {
        if (spec.text(SPEC_KEY).isEmpty()) {
            return List.of();
        }
        String name = spec.text(SPEC_KEY).get();
        Path base = Path.of(spec.sourceFile()).toAbsolutePath().getParent();
        Path file = base == null ? Path.of(name) : base.resolve(name);
        if (!Files.isRegularFile(file)) {
            problems.add(spec.problemAt(SPEC_KEY, "a calibration file written by 'shearstack calibrate'",
                    "no file " + file, ""));
            return List.of();
        }
        CalibrationFile.Contents c;
        try {
            c = CalibrationFile.read(file);
        } catch (BadInputException e) {
            problems.addAll(e.problems());
            return List.of();
        } catch (IOException e) {
            problems.add(spec.problemAt(SPEC_KEY, "a readable calibration file", e.getMessage(), ""));
            return List.of();
        }
        Calibration k = c.calibration();
        String source = "calibration file " + name + (c.fittedKeys().isEmpty() ? " (nothing fitted: prior values)"
                : " (fitted: " + String.join(", ", c.fittedKeys()) + ")");
        List<Seed> s = new ArrayList<>();
        s.add(Seed.text(ADMISSION, k.admission().name().toLowerCase(Locale.ROOT).replace('_', '-'),
                Derivation.Origin.CALIBRATED, SPEC_KEY, "admission reading from the calibration file", source));
        s.add(number(END_FACE_SCALE, k.endFaceScale(), "end-face-scale", c, source));
        s.add(number(RIM_SCALE, k.rimScale(), "rim-scale", c, source));
        s.add(number(BEARING_FRICTION, k.bearingFrictionCoefficient(), "bearing-friction-coefficient", c, source));
        s.add(number(BEARING_SPEED_FACTOR, k.bearingSpeedFactor(), "bearing-speed-factor", c, source));
        s.add(number(SEAL_TORQUE, k.sealTorquePerBearingNm(), "seal-torque-per-bearing", c, source));
        s.add(number(DISCHARGE_SCALE, k.dischargeScale(), "discharge-scale", c, source));
        return s;
    }

    private static Seed number(Key key, double value, String fileKey, CalibrationFile.Contents c, String source) {
        return Seed.number(key, value, Derivation.Origin.CALIBRATED, SPEC_KEY,
                fileKey + (c.fittedKeys().contains(fileKey) ? " fitted to bench data" : " as the file gives it (prior,"
                        + " not fitted)"), source);
    }

    /** True when the values carry a calibration from a file. */
    static boolean calibrated(Values v) {
        return v.has(END_FACE_SCALE);
    }

    /** The calibration the values carry, or the nominal one. */
    static Calibration calibration(Values v) {
        if (!calibrated(v)) {
            return Calibration.nominal();
        }
        Calibration n = Calibration.nominal();
        AdmissionReading adm = v.has(ADMISSION)
                ? AdmissionReading.valueOf(v.text(ADMISSION).toUpperCase(Locale.ROOT).replace('-', '_'))
                : n.admission();
        return new Calibration(adm, or(v, END_FACE_SCALE, n.endFaceScale()), or(v, RIM_SCALE, n.rimScale()),
                or(v, BEARING_FRICTION, n.bearingFrictionCoefficient()),
                or(v, BEARING_SPEED_FACTOR, n.bearingSpeedFactor()), or(v, SEAL_TORQUE, n.sealTorquePerBearingNm()),
                or(v, DISCHARGE_SCALE, n.dischargeScale()), "calibrated");
    }

    /** Words for derivations: which calibration the model used. */
    static String words(Values v) {
        return calibrated(v) ? "calibrated coefficients from the spec's calibration file (fitted to bench runs)"
                : "nominal calibration";
    }

    private static double or(Values v, Key k, double fallback) {
        return v.has(k) ? v.get(k) : fallback;
    }
}
