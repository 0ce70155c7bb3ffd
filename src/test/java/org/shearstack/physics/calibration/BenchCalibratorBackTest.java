package org.shearstack.physics.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.shearstack.io.benchlog.BenchLogOptions;
import org.shearstack.io.benchlog.BenchLogReader;
import org.shearstack.physics.dyno.DynoAnalyzer;
import org.shearstack.physics.dyno.DynoInputs;
import org.shearstack.physics.dyno.DynoResult;
import org.shearstack.physics.rotor.TurbineModel;

/**
 * Back-test: the invented logs in tests-fixtures/bench/ were generated from the coupled model with known
 * coefficients (their "# truth:" line, {@link ModelBenchRun}); calibrating the nominal model to them must recover
 * the identifiable coefficients within 10 % and the no-load speed within 5 %. These are self-consistency checks
 * of the fitting, not outside references.
 */
class BenchCalibratorBackTest {

    private static Map<String, String> truth(Path log) throws Exception {
        Map<String, String> m = new HashMap<>();
        for (String line : Files.readAllLines(log)) {
            if (line.startsWith("# truth:")) {
                for (String kv : line.substring(8).trim().split(" ")) {
                    String[] p = kv.split("=");
                    m.put(p[0], p[1]);
                }
            }
        }
        return m;
    }

    private static CalibrationFit calibrate(String name, boolean sealed, Map<String, String> t) throws Exception {
        Path log = Path.of("tests-fixtures", "bench", name + ".csv");
        t.putAll(truth(log));
        DynoResult r = DynoAnalyzer.analyze(BenchLogReader.read(log, BenchLogOptions.FROM_HEADER).log(),
                DynoInputs.of(Double.parseDouble(t.get("inertia-kg-m2"))));
        TurbineModel prior = FixtureModels.model(sealed);
        return BenchCalibrator.fit(prior, List.of(r));
    }

    private static double after(CalibrationFit f, String key) {
        return f.coefficients().stream().filter(c -> c.key().equals(key)).findFirst().orElseThrow().after();
    }

    private static void within(Map<String, String> t, CalibrationFit f, String key, double share) {
        double truth = Double.parseDouble(t.get(key));
        assertEquals(truth, after(f, key), share * truth, key);
    }

    @Test
    void recoversSealedRun() throws Exception {
        Map<String, String> t = new HashMap<>();
        CalibrationFit f = calibrate("sealed-run", true, t);
        within(t, f, "windage-scale", 0.10);
        within(t, f, "bearing-speed-factor", 0.10);
        within(t, f, "seal-torque-per-bearing-nm", 0.10);
        within(t, f, "discharge-scale", 0.10);
        double noLoad = Double.parseDouble(t.get("no-load-rad-per-s"));
        assertEquals(noLoad, f.noLoadAfterRadPerS(), 0.05 * noLoad);
        assertEquals(f.measuredNoLoadRadPerS(), f.noLoadAfterRadPerS(), 0.05 * f.measuredNoLoadRadPerS());
        assertTrue(f.torqueRmsAfterNm() < f.torqueRmsBeforeNm());
        assertTrue(f.notes().stream().anyMatch(n -> n.contains("the data prefer jet-fraction-only")), f.notes().toString());
    }

    @Test
    void recoversShieldedRunAndSaysWhatItCannotTell() throws Exception {
        Map<String, String> t = new HashMap<>();
        CalibrationFit f = calibrate("shielded-run", false, t);
        within(t, f, "windage-scale", 0.10);
        within(t, f, "bearing-speed-factor", 0.10);
        within(t, f, "discharge-scale", 0.10);
        double noLoad = Double.parseDouble(t.get("no-load-rad-per-s"));
        assertEquals(noLoad, f.noLoadAfterRadPerS(), 0.05 * noLoad);
        // the bearing load term is about 2.4e-5 N·m, under 3 % of the loss everywhere: it must not be "fitted"
        assertTrue(f.coefficients().stream().anyMatch(c -> c.key().equals("bearing-friction-coefficient")
                && !c.fitted() && c.after() == c.before()));
        assertTrue(f.notes().stream().anyMatch(n -> n.contains("the data prefer rim-struck-capped")), f.notes().toString());
    }
}
