package org.shearstack.io.mesh;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.geom.Mesh;

/**
 * Independent check: every STL we write is accepted by admesh (Debian package "admesh", A. D. Martin 1995) in
 * exact mode (edges matched only by identical coordinates) with zero repairs. Skipped when admesh is absent.
 */
class AdmeshCheckTest {

    private static final String[] REPAIR_COUNTS = {"Degenerate facets", "Edges fixed", "Facets removed",
        "Facets added", "Facets reversed", "Backwards edges", "Total disconnected facets"};

    @Test
    void writtenStlsNeedNoRepairs(@TempDir Path dir) throws Exception {
        Path admesh = Path.of("/usr/bin/admesh");
        assumeTrue(Files.isExecutable(admesh), "admesh not installed (apt-get install admesh); independent check skipped");
        Map<String, Mesh> parts = new LinkedHashMap<>();
        parts.put("washer", SampleParts.washer());
        parts.put("disc", SampleParts.portedDisc());
        parts.put("boss", SampleParts.steppedBoss());
        for (Map.Entry<String, Mesh> p : parts.entrySet()) {
            Path stl = dir.resolve(p.getKey() + ".stl");
            StlWriter.write(p.getValue(), p.getKey(), stl);
            String out = run(admesh.toString(), "--exact", "--normal-directions", stl.toString());
            for (String label : REPAIR_COUNTS) {
                assertEquals(0, count(out, label), p.getKey() + ": " + label + "\n" + out);
            }
            assertEquals(1, count(out, "Number of parts"), p.getKey() + "\n" + out);
            assertEquals(p.getValue().triangleCount(), count(out, "Number of facets"), out);
            // admesh computes volume in float; kernel-notes P11 saw up to 6e-5 relative difference
            Matcher v = Pattern.compile("Volume\\s*:\\s*([0-9.]+)").matcher(out);
            assertTrue(v.find(), out);
            double exact = org.shearstack.geom.MeshCheck.validate(p.getValue()).signedVolumeMm3();
            assertEquals(exact, Double.parseDouble(v.group(1)), exact * 1e-4, out);
        }
    }

    private static long count(String out, String label) {
        Matcher m = Pattern.compile(Pattern.quote(label) + "\\s*:\\s*(\\d+)").matcher(out);
        if (!m.find()) {
            throw new AssertionError("admesh output lacks \"" + label + "\":\n" + out);
        }
        return Long.parseLong(m.group(1));
    }

    private static String run(String... cmd) throws IOException, InterruptedException {
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        p.waitFor();
        return out;
    }
}
