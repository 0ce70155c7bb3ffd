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

class MainTest {

    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return Main.run(args, new PrintWriter(out), new PrintWriter(err));
    }

    @Test
    void helpListsCommandsAndEverySubcommandHasHelpAndVersion() {
        assertEquals(0, run("--help"));
        assertTrue(out.toString().contains("explain"));
        assertTrue(out.toString().contains("profiles"));
        for (String sub : Main.commandLine().getSubcommands().keySet()) {
            assertEquals(0, run(sub, "--help"), sub);
            assertEquals(0, run(sub, "--version"), sub);
        }
        assertEquals(0, run("--version"));
        assertTrue(out.toString().contains("shearstack "));
    }

    @Test
    void explainPrintsDerivationsWithSources() {
        assertEquals(0, run("explain", "examples/classroom-demo.yaml", "print.min-wall"));
        assertTrue(out.toString().startsWith("print.min-wall = 0.9 mm   [rule PRN-MIN-WALL]"), out.toString());
        assertTrue(out.toString().contains("source: profiles/printers/generic-0.4.yaml"), out.toString());
    }

    @Test
    void badSpecExitsTwoWithLocatedMessages() throws IOException {
        Path spec = dir.resolve("bad.yaml");
        Files.writeString(spec, "name: bad\nsupply:\n  pressure: 6 mm\n");
        assertEquals(2, run("explain", spec.toString()));
        assertTrue(err.toString().startsWith(spec + ":3:13: supply.pressure: expected a pressure"), err.toString());
        assertEquals("", out.toString());
    }

    @Test
    void unknownOptionOrCommandExitsTwo() {
        assertEquals(2, run("desing"));
        assertEquals(2, run("explain"));
    }

    @Test
    void profilesListsAndShowsAndRefusesUnknownNames() {
        assertEquals(0, run("profiles", "printers", "generic-0.6"));
        assertTrue(out.toString().contains("nozzle-diameter        0.6 mm"), out.toString());
        assertEquals(2, run("profiles", "printers", "nope"));
        assertTrue(err.toString().contains("fine-0.25, generic-0.4, generic-0.6"), err.toString());
    }

    @Test
    void completionScriptIsGenerated() {
        assertEquals(0, run("generate-completion"));
        assertTrue(out.toString().contains("complete -F"), out.toString().substring(0, 200));
    }
}
