package org.shearstack.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.view.Snapshots;

/** The view command's argument handling (no display needed) and, under a display, its picture. */
class ViewCommandTest {

    /** First eight bytes of every PNG file (PNG specification, ISO/IEC 15948:2004, section 5.2). */
    private static final byte[] PNG_SIGNATURE = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n'};

    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    @Test
    void badSizeIsBadInputNamingTheOptionAndTheExpectedForm() {
        int code = run("view", "--sample", "--snapshot", dir.resolve("a.png").toString(), "--size", "12x");
        assertEquals(2, code);
        assertTrue(err.toString().contains("--size: size: expected WIDTHxHEIGHT"), err.toString());
        assertTrue(err.toString().contains("found '12x'"), err.toString());
        assertFalse(Files.exists(dir.resolve("a.png")));
    }

    @Test
    void sizeOutOfRangeIsBadInput() {
        assertEquals(2, run("view", "--sample", "--snapshot", dir.resolve("a.png").toString(), "--size", "9x9000"));
        assertTrue(err.toString().contains("found 9x9000"), err.toString());
    }

    @Test
    void missingInputAndUnknownKindsAreBadInput() {
        assertEquals(2, run("view"));
        assertTrue(err.toString().contains("found neither"), err.toString());
        assertEquals(2, run("view", dir.resolve("nope.yaml").toString()));
        assertTrue(err.toString().contains("nope.yaml: expected a spec"), err.toString());
        assertEquals(2, run("view", dir.resolve("nope.yaml").toString(), "--sample"));
        assertTrue(err.toString().contains("found both"), err.toString());
    }

    @Test
    void fileOfAnotherKindIsBadInput() throws Exception {
        Path text = Files.writeString(dir.resolve("notes.txt"), "hello");
        assertEquals(2, run("view", text.toString()));
        assertTrue(err.toString().contains("found 'notes.txt'"), err.toString());
    }

    @Test
    @Tag("display")
    void snapshotWritesAPngAndSaysSo() throws Exception {
        Assumptions.assumeTrue(Snapshots.displayAvailable(), "skipped: no DISPLAY; run under xvfb-run -a");
        Path png = dir.resolve("pics").resolve("sample.png");
        int code = run("view", "--sample", "--snapshot", png.toString(), "--size", "320x200", "--section");
        assertEquals(0, code, err.toString());
        byte[] bytes = Files.readAllBytes(png);
        byte[] head = java.util.Arrays.copyOf(bytes, 8);
        assertArrayEquals(PNG_SIGNATURE, head);
        assertTrue(out.toString().contains("320x200, cut"), out.toString());
        try (var listing = Files.list(png.getParent())) {
            assertEquals(1, listing.count(), "no temporary file left behind");
        }
    }
}
