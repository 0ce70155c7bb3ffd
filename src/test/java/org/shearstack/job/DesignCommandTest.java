package org.shearstack.job;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.cli.Main;

/** End to end: the design command as a user runs it, into a temporary folder. */
class DesignCommandTest {

    @TempDir
    Path tmp;

    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void theDemoWritesItsReportAndTheExitCodeFollowsTheVerdict() throws IOException {
        Path out = tmp.resolve("demo");
        Run r = run("design", "examples/classroom-demo.yaml", "-o", out.toString(), "--no-preview");
        for (String f : new String[] {"report.html", "report.json", "summary.md"}) {
            assertTrue(Files.size(out.resolve(f)) > 0, f);
        }
        JsonNode json = new ObjectMapper().readTree(out.resolve("report.json").toFile());
        String verdict = json.get("verdict").asText();
        assertEquals(verdict.equals("fail") ? 3 : 0, r.code(), r.out() + r.err());
        assertTrue(r.out().startsWith("classroom-demo: " + verdict.toUpperCase(java.util.Locale.ROOT)), r.out());
        assertTrue(r.out().contains("report: " + out.toAbsolutePath().resolve("report.html")), r.out());
        assertEquals("classroom-demo", json.at("/design/name").asText());
    }

    @Test
    void aFailingCheckStillWritesTheReportAndExitsWithThree() throws IOException {
        Path out = tmp.resolve("pinned");
        Run r = run("design", "src/test/resources/report/pinned-demo.yaml", "-o", out.toString(), "--check-only");
        assertEquals(3, r.code(), r.out() + r.err());
        JsonNode json = new ObjectMapper().readTree(out.resolve("report.json").toFile());
        assertEquals("fail", json.get("verdict").asText());
        // the first figure printed is the maximum safe supply pressure
        String second = r.out().lines().skip(1).findFirst().orElse("");
        assertTrue(second.trim().startsWith("maximum safe supply pressure"), r.out());
        assertTrue(r.out().contains("FAIL BURST-RUNAWAY"), r.out());
    }

    @Test
    void aBrokenSpecWritesNothingAndLeavesThePreviousOutput() throws IOException {
        Path out = tmp.resolve("kit");
        Files.createDirectories(out);
        Files.writeString(out.resolve("report.html"), "previous");
        Path spec = tmp.resolve("broken.yaml");
        Files.writeString(spec, "name: broken\nsupply:\n  pressure: 4 parsecs\n");
        Run r = run("design", spec.toString(), "-o", out.toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("broken.yaml:3"), "the problem is located: " + r.err());
        assertEquals("previous", Files.readString(out.resolve("report.html")));
        try (var s = Files.list(tmp)) {
            assertEquals(2, s.count(), "only the spec and the untouched folder");
        }
        Path fresh = tmp.resolve("fresh");
        assertEquals(2, run("design", spec.toString(), "-o", fresh.toString()).code());
        assertFalse(Files.exists(fresh));
    }

    @Test
    void designIsRegisteredUnderTheRootCommand() {
        Run r = run("--help");
        assertTrue(r.out().contains("design"), r.out());
    }
}
