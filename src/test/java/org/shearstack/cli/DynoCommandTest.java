package org.shearstack.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Runs the dyno command on the invented example log examples/bench-run-demo.csv, whose comment lines state
 * the simulation it came from (inertia 1.2e-4 kg·m², loss 1.2e-3 + 1.0e-6 ω + 6e-10 ω² N·m, k_e 0.0191 V·s/rad).
 */
class DynoCommandTest {
    private static final Path EXAMPLE = Path.of("examples", "bench-run-demo.csv");

    private record Run(int exit, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        String[] all = new String[args.length + 1];
        all[0] = "dyno";
        System.arraycopy(args, 0, all, 1, args.length);
        int code = Main.run(all, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void analysesTheExampleLog(@TempDir Path dir) throws Exception {
        // the README's command line
        Run r = run(EXAMPLE.toString(), "--inertia", "1.2e-4", "-o", dir.toString());
        assertEquals(0, r.exit(), r.err());
        JsonNode j = new ObjectMapper().readTree(dir.resolve("dyno.json").toFile());
        assertEquals("shearstack-dyno/1", j.get("format").asText());
        assertEquals(1.2e-4, j.get("inertiaKgM2").asDouble(), 1e-12);
        // the example's stated simulation parameters (invented data, see the file's comment lines)
        assertEquals(1.2e-3, j.at("/loss/constantNm").asDouble(), 0.10 * 1.2e-3);
        assertEquals(1.0e-6, j.at("/loss/viscousNmPerRadPerS").asDouble(), 0.10 * 1.0e-6);
        assertEquals(6e-10, j.at("/loss/quadraticNmPerRadPerSSquared").asDouble(), 0.10 * 6e-10);
        assertEquals(0.0191, j.at("/summary/backEmfConstantVsPerRad").asDouble(), 0.01 * 0.0191);
        // 0.040 (1 − ω/3800) = loss(ω) solved by the quadratic formula: ω = 2921.8 rad/s; the run stops at 98 %
        assertEquals(2921.8, j.at("/summary/noLoadSpeedRadPerS").asDouble(), 0.03 * 2921.8);
        assertEquals(0.040, j.at("/summary/stallRotorTorqueNm").asDouble(), 0.05 * 0.040);
        assertTrue(j.at("/smoothing/run-up/reason").asText().contains("Savitzky–Golay"));
        assertEquals("run-up", j.at("/segments/0/kind").asText());
        assertEquals("coast-down", j.at("/segments/2/kind").asText());

        String html = Files.readString(dir.resolve("dyno.html"));
        assertEquals(4, html.split("<svg ", -1).length - 1, "speed, torque, power and loss charts");
        assertTrue(html.contains("speed [rpm]") && html.contains("torque [mN·m]") && html.contains("power [W]"));
        assertFalse(html.contains("<script"), "self-contained, no scripts");
        String csv = Files.readString(dir.resolve("dyno.csv"));
        assertTrue(csv.startsWith("segment,time_s,speed_rpm,"));
        assertTrue(r.out().contains("wrote "), r.out());
    }

    /**
     * Issue "done when": the example log against the demo design gives the page and the JSON, with the inertia
     * from the kit's rotating parts and the design's performance model as the prediction.
     */
    @Test
    void analysesTheExampleLogAgainstTheDemoDesign(@TempDir Path dir) throws Exception {
        Run r = run(EXAMPLE.toString(), "--design", "examples/classroom-demo.yaml", "--extra-inertia", "25 g*cm^2",
                "-o", dir.toString());
        assertEquals(0, r.exit(), r.err());
        JsonNode j = new ObjectMapper().readTree(dir.resolve("dyno.json").toFile());
        assertTrue(j.get("inertiaSource").asText().startsWith("design classroom-demo: "), j.get("inertiaSource").asText());
        assertTrue(j.get("inertiaSource").asText().endsWith(" + --extra-inertia 2.500e-06 kg*m^2"));
        assertTrue(j.get("inertiaKgM2").asDouble() > 2.5e-6);
        assertEquals("performance model of classroom-demo", j.at("/comparison/prediction").asText());
        assertEquals("shaft", j.at("/comparison/measuredTorque").asText());
        assertTrue(Files.readString(dir.resolve("dyno.html")).contains(">predicted<"));
    }

    @Test
    void missingInertiaIsBadInput(@TempDir Path dir) {
        Run r = run(EXAMPLE.toString(), "-o", dir.toString());
        assertEquals(2, r.exit());
        assertEquals("the rotor inertia is unknown: give --design DIR|SPEC or --inertia (kg*m^2, e.g."
                + " 9.7e-5 or '97 kg*mm^2')", r.err().strip());
        assertFalse(Files.exists(dir.resolve("dyno.json")), "nothing written");
    }

    @Test
    void badLogIsReportedWithLineAndExitCodeTwo(@TempDir Path dir) throws Exception {
        Path log = dir.resolve("bad.csv");
        StringBuilder s = new StringBuilder("time [s],speed [rpm]\n");
        for (int i = 0; i < 30; i++) {
            s.append(i == 20 ? 1.0 : i * 0.1).append(',').append(i * 10).append('\n');
        }
        Files.writeString(log, s.toString());
        Run r = run(log.toString(), "--inertia", "1e-4", "-o", dir.resolve("out").toString());
        assertEquals(2, r.exit());
        assertEquals(log + ":22:1: expected a time after 1.9 s (line 21); samples must be in time order (two logs"
                + " joined together?), found 1 s", r.err().strip());
        assertFalse(Files.exists(dir.resolve("out")));
    }

    @Test
    void badInertiaUnitNamesTheExpectedFormat() {
        Run r = run(EXAMPLE.toString(), "--inertia", "3 lb*ft^2");
        assertEquals(2, r.exit());
        assertTrue(r.err().contains("expected an inertia like 2.5e-6 (kg*m^2) or '25 g*cm^2', '2500 g*mm^2',"
                + " '2.5 kg*mm^2', found '3 lb*ft^2'"), r.err());
    }
}
