package org.shearstack.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CheckCommandTest {

    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return Main.run(args, new PrintWriter(out), new PrintWriter(err));
    }

    @Test
    void demoPrintsSafetyFirstAndExitsByItsFindings() {
        int code = run("check", "--no-parts", "examples/classroom-demo.yaml");
        String text = out.toString();
        assertTrue(text.startsWith("design classroom-demo"), text);
        assertTrue(text.lines().skip(1).findFirst().orElse("").startsWith("SAFETY:"), text);
        boolean failed = text.lines().anyMatch(l -> l.startsWith("FAIL "));
        assertEquals(failed ? 3 : 0, code, text);
        // the demo's regulator is set below the maximum safe pressure, so the burst check passes (OK lines are
        // not printed) and the safety line still shows runaway against the allowable speed
        assertTrue(text.contains("allowable") && text.lines().noneMatch(l -> l.matches("FAIL\\s+BURST-RUNAWAY.*")),
                text);
    }

    @Test
    void unthrottledShopAirExampleFailsOnBurstWithRemedies() {
        int code = run("check", "--no-parts", "examples/shop-air-unthrottled.yaml");
        String text = out.toString();
        assertEquals(3, code, text);
        assertTrue(text.lines().anyMatch(l -> l.matches("FAIL\\s+BURST-RUNAWAY.*"))
                && text.contains("with a regulator you cannot bypass"), text);
    }

    @Test
    void badSpecExitsTwo() throws IOException {
        Path spec = dir.resolve("bad.yaml");
        Files.writeString(spec, "name: bad\nsupply:\n  pressure: 6 mm\n");
        assertEquals(2, run("check", spec.toString()));
        assertEquals("", out.toString());
        assertTrue(err.toString().contains("supply.pressure"), err.toString());
    }
}
