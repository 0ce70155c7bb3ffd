package org.shearstack.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.io.calibration.CalibrationFile;
import org.shearstack.physics.calibration.FixtureModels;
import org.shearstack.physics.rotor.AdmissionReading;
import picocli.CommandLine;

/**
 * The calibrate command on the invented model-generated log tests-fixtures/bench/sealed-run.csv, with the design
 * lookup replaced by the fixture's model (the lookup from a design folder is wired separately).
 */
class CalibrateCommandTest {
    private record Run(int exit, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        DesignLink.Source fixture = p -> new DesignLink.Design("fixture", FixtureModels.INERTIA_KG_M2,
                "fixture inertia", Optional.of(FixtureModels.model(true)));
        CommandLine cl = new CommandLine(new CalibrateCommand(fixture));
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        return new Run(cl.execute(args), out.toString(), err.toString());
    }

    @Test
    void writesACalibrationFileTheReaderAccepts(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("my-bench.yaml");
        Run r = run("--design", "fixture.yaml", "tests-fixtures/bench/sealed-run.csv", "-o", file.toString());
        assertEquals(0, r.exit(), r.err());
        CalibrationFile.Contents c = CalibrationFile.read(file);
        // truth of the fixture (its "# truth:" line): windage 1.4, f0 0.8, seals 1.6 mN·m, discharge 0.92
        assertEquals(1.4, c.calibration().endFaceScale(), 0.14);
        assertEquals(0.92, c.calibration().dischargeScale(), 0.092);
        assertEquals(AdmissionReading.JET_FRACTION_ONLY, c.calibration().admission());
        assertTrue(c.fittedKeys().contains("bearing-speed-factor"));
        assertTrue(r.out().contains("no-load speed: measured "), r.out());
        assertTrue(r.out().contains("wrote " + file), r.out());
        String html = Files.readString(dir.resolve("my-bench.html"));
        assertTrue(html.contains("model after") && html.contains("<svg "), "before/after chart");
    }

    @Test
    void badLogWritesNothing(@TempDir Path dir) throws Exception {
        Path log = dir.resolve("short.csv");
        Files.writeString(log, "time [s],speed [rpm]\n0,0\n0.1,100\n");
        Path file = dir.resolve("out.yaml");
        Run r = run("--design", "fixture.yaml", log.toString(), "-o", file.toString());
        assertEquals(2, r.exit());
        assertEquals(log + ": expected at least 20 samples, found 2", r.err().strip());
        assertFalse(Files.exists(file));
    }

    /**
     * Back-test through the real design lookup: tests-fixtures/bench/classroom-run.csv was generated from the
     * model of examples/classroom-demo.yaml with the coefficients on its "# truth:" line (ModelBenchRun; rerun it
     * when the design's sizing changes). The calibration must recover them within 10 % and bring the predicted
     * no-load speed within 5 % of the measured one. Self-consistency, not an outside reference.
     */
    @Test
    void calibratesTheExampleDesignFromItsSyntheticRun(@TempDir Path dir) throws Exception {
        Path log = Path.of("tests-fixtures", "bench", "classroom-run.csv");
        String truthLine = Files.readAllLines(log).stream().filter(l -> l.startsWith("# truth:")).findFirst()
                .orElseThrow();
        java.util.Map<String, Double> truth = new java.util.HashMap<>();
        for (String kv : truthLine.substring(8).trim().split(" ")) {
            String[] p = kv.split("=");
            try {
                truth.put(p[0], Double.parseDouble(p[1]));
            } catch (NumberFormatException e) {
                // text values (name, admission)
            }
        }
        Path file = dir.resolve("classroom-bench.yaml");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(new String[] {"calibrate", "--design", "examples/classroom-demo.yaml", log.toString(),
            "--inertia", String.valueOf(truth.get("inertia-kg-m2")), "-o", file.toString()},
                new PrintWriter(out, true), new PrintWriter(err, true));
        assertEquals(0, code, err.toString());
        CalibrationFile.Contents c = CalibrationFile.read(file);
        assertEquals(truth.get("windage-scale"), c.calibration().endFaceScale(), 0.10 * truth.get("windage-scale"));
        assertEquals(truth.get("bearing-speed-factor"), c.calibration().bearingSpeedFactor(),
                0.10 * truth.get("bearing-speed-factor"));
        assertEquals(truth.get("discharge-scale"), c.calibration().dischargeScale(), 0.10 * truth.get("discharge-scale"));
        assertEquals(AdmissionReading.JET_FRACTION_ONLY, c.calibration().admission());
        String yaml = Files.readString(file);
        double measured = value(yaml, "measured-no-load-speed");
        double after = value(yaml, "predicted-no-load-speed-after");
        assertEquals(measured, after, 0.05 * measured);
        assertEquals(truth.get("no-load-rad-per-s"), after, 0.05 * truth.get("no-load-rad-per-s"));
    }

    private static double value(String yaml, String key) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile(key + ": ([0-9.eE+-]+)").matcher(yaml);
        assertTrue(m.find(), key);
        return Double.parseDouble(m.group(1));
    }
}
