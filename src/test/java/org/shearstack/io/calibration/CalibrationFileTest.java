package org.shearstack.io.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.shearstack.physics.calibration.CalibrationFit;
import org.shearstack.physics.calibration.FittedCoefficient;
import org.shearstack.physics.rotor.AdmissionReading;
import org.shearstack.physics.rotor.Calibration;
import org.shearstack.spec.BadInputException;

class CalibrationFileTest {
    private static final double SIX_DIGITS = 1e-5;

    private static CalibrationFit fit() {
        Calibration before = Calibration.nominal();
        Calibration after = new Calibration(AdmissionReading.JET_FRACTION_ONLY, 1.3575506, 1.3575506, 0.0015,
                0.82566546, 1.5729783e-3, 0.91183716, "calibrated");
        return new CalibrationFit(before, after, List.of(
                new FittedCoefficient("seal-torque-per-bearing-nm", 1e-3, 1.5729783e-3, true, ""),
                new FittedCoefficient("bearing-speed-factor", 1.5, 0.82566546, true, ""),
                new FittedCoefficient("windage-scale", 1, 1.3575506, true, ""),
                new FittedCoefficient("discharge-scale", 1, 0.91183716, true, ""),
                new FittedCoefficient("admission", 1, 0, false, "")), 2133.9, 2653.4, 2144.7, 1e-3, 1e-4, 2e-3,
                2e-4, List.of(), List.of());
    }

    @Test
    void roundTrips() {
        String text = CalibrationFile.render(fit(), "demo.yaml", List.of("run 1.csv", "it's.csv"));
        CalibrationFile.Contents c = CalibrationFile.parse("bench.yaml", text);
        Calibration k = c.calibration();
        assertEquals(AdmissionReading.JET_FRACTION_ONLY, k.admission());
        assertEquals(1.3575506, k.endFaceScale(), SIX_DIGITS);
        assertEquals(1.3575506, k.rimScale(), SIX_DIGITS);
        assertEquals(0.82566546, k.bearingSpeedFactor(), SIX_DIGITS);
        assertEquals(1.5729783e-3, k.sealTorquePerBearingNm(), 1e-8);
        assertEquals(0.91183716, k.dischargeScale(), SIX_DIGITS);
        assertEquals(0.0015, k.bearingFrictionCoefficient(), 0);
        assertEquals(Set.of("bearing-speed-factor", "discharge-scale", "end-face-scale", "rim-scale",
                "seal-torque-per-bearing"), c.fittedKeys());
    }

    @Test
    void locatesUnknownKeysAndBadValues() {
        String text = "format: shearstack-calibration/1\nadmission: full\nrim-scale: -2\nseal-torque-per-bearing: 3 bar\n"
                + "windage: 1\n";
        BadInputException e = assertThrows(BadInputException.class, () -> CalibrationFile.parse("bench.yaml", text));
        assertEquals(List.of(
                "bench.yaml:5:1: windage: expected one of [admission, bearing-friction-coefficient, bearing-speed-factor,"
                        + " before-after, discharge-scale, end-face-scale, fitted, format, from, rim-scale,"
                        + " seal-torque-per-bearing], found unknown key 'windage'",
                "bench.yaml:2:12: admission: expected jet-fraction-only or rim-struck-capped, found 'full'",
                "bench.yaml:3:12: rim-scale: expected a value >= 0, found '-2'"),
                e.problems().subList(0, 3).stream().map(p -> p.format()).toList());
        assertEquals(4, e.problems().get(3).line());
        assertEquals("seal-torque-per-bearing", e.problems().get(3).keyPath());
    }

    @Test
    void requiresTheFormatKey() {
        BadInputException e = assertThrows(BadInputException.class,
                () -> CalibrationFile.parse("bench.yaml", "rim-scale: 1\n"));
        assertEquals("bench.yaml:1:1: format: expected the key 'format: shearstack-calibration/1', found no format key",
                e.getMessage());
    }
}
