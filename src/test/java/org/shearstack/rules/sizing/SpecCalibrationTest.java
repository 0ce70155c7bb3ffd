package org.shearstack.rules.sizing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.physics.rotor.AdmissionReading;
import org.shearstack.physics.rotor.TurbineModel;
import org.shearstack.profile.Profiles;
import org.shearstack.rules.Derivation;
import org.shearstack.rules.DesignResolver;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.Problem;
import org.shearstack.spec.SpecReader;

/**
 * A spec with {@code calibration: FILE.yaml} predicts with the fitted coefficients and says so. The calibration
 * file is in the format 'shearstack calibrate' writes (io.calibration.CalibrationFile, its one reader); the
 * coefficient values are invented for the test (our own scenario).
 */
class SpecCalibrationTest {

    private static final String SPEC = String.join("\n",
            "name: calibrated",
            "supply:",
            "  pressure: 2 bar(g)",
            "  conductance: 0.6 dm3/(s*bar)",
            "  critical-ratio: 0.35",
            "rotor:",
            "  diameter: 80 mm",
            "  gap: 0.8 mm",
            "  discs: 8",
            "targets:",
            "  speed: 8000 rpm",
            "");

    private static final String FILE = String.join("\n",
            "format: shearstack-calibration/1",
            "admission: jet-fraction-only",
            "end-face-scale: 3",
            "rim-scale: 3",
            "bearing-friction-coefficient: 0.003",
            "bearing-speed-factor: 2",
            "seal-torque-per-bearing: 2 mN*m",
            "discharge-scale: 0.9",
            "fitted: [end-face-scale, rim-scale]",
            "");

    private static ResolvedDesign resolve(Path dir, String spec) throws Exception {
        Path s = dir.resolve("calibrated.yaml");
        Files.writeString(s, spec);
        return DesignResolver.resolve(SpecReader.read(s).orThrow(), Profiles.shipped(), SizingRulesTest.engine());
    }

    @Test
    void calibratedSpecPredictsWithTheFittedCoefficientsAndSaysSo(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("bench.yaml"), FILE);
        ResolvedDesign nominal = resolve(dir, SPEC);
        ResolvedDesign calibrated = resolve(dir, SPEC + "calibration: bench.yaml\n");

        assertEquals(Derivation.Origin.CALIBRATED, calibrated.derivation(SpecCalibration.END_FACE_SCALE).origin());
        TurbineModel m = DesignModels.turbineModel(calibrated);
        assertEquals(3.0, m.calibration().endFaceScale(), 0.0);
        assertEquals(AdmissionReading.JET_FRACTION_ONLY, m.calibration().admission());
        assertEquals(2e-3, m.calibration().sealTorquePerBearingNm(), 1e-12);
        // more drag and a weaker admission reading can only lower the no-load speed (physics.md §12.3)
        assertTrue(calibrated.get(SizingKeys.RUNAWAY_SPEED) < nominal.get(SizingKeys.RUNAWAY_SPEED));
        for (var k : new org.shearstack.rules.Key[] {SizingKeys.RUNAWAY_SPEED, SizingKeys.OPERATING_POWER,
                SizingKeys.STALL_TORQUE, SizingKeys.RUNAWAY_UPPER_BOUND}) {
            Derivation d = calibrated.derivation(k);
            assertTrue(d.formula().contains("calibrated coefficients"), k + ": " + d.formula());
            assertTrue(d.source().contains("CALIBRATED"), k + ": " + d.source());
            assertTrue(d.inputs().stream().anyMatch(i -> i.key().equals(SpecCalibration.END_FACE_SCALE)), k.name());
            assertTrue(!nominal.derivation(k).formula().contains("calibrated coefficients"), k.name());
        }
    }

    @Test
    void missingOrBadCalibrationFileIsLocatedBadInput(@TempDir Path dir) throws Exception {
        BadInputException missing = assertThrows(BadInputException.class,
                () -> resolve(dir, SPEC + "calibration: nowhere.yaml\n"));
        assertTrue(missing.problems().stream().map(Problem::format).anyMatch(s -> s.contains("calibration")
                && s.contains("nowhere.yaml")), missing.problems().toString());
        Files.writeString(dir.resolve("bad.yaml"), FILE.replace("rim-scale: 3", "rim-scale: lots"));
        BadInputException bad = assertThrows(BadInputException.class,
                () -> resolve(dir, SPEC + "calibration: bad.yaml\n"));
        assertTrue(bad.problems().stream().map(Problem::format).anyMatch(s -> s.contains("bad.yaml")
                && s.contains("rim-scale")), bad.problems().toString());
    }
}
