package org.shearstack.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
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
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.family.FamilyFiles;
import org.shearstack.io.family.FamilyColumns;

/** The family command end to end, as a user runs it, on the shipped demo spec. */
class FamilyCommandTest {

    private static final String DEMO = "examples/classroom-demo.yaml";
    private static final ObjectMapper JSON = new ObjectMapper();

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
    void threeVariantsMakeThreeCompleteKitsAndTheTableRowsEqualTheirReports() throws IOException {
        Path dir = tmp.resolve("fam");
        // the README's first family command, into a temporary folder
        Run r = run("family", DEMO, "--vary", "rotor.diameter=60mm,80mm,100mm", "-o", dir.toString());
        List<List<String>> csv = FamilyFiles.csv(dir.resolve("family.csv"));
        assertEquals(4, csv.size(), "header and three rows");
        boolean anyFail = false;
        String[] names = {"rotor.diameter=60mm", "rotor.diameter=80mm", "rotor.diameter=100mm"};
        double[] diameters = {60, 80, 100};
        for (int i = 0; i < 3; i++) {
            Path v = dir.resolve(names[i]);
            JsonNode report = JSON.readTree(v.resolve("report.json").toFile());
            for (String f : List.of("report.html", "summary.md")) {
                assertTrue(Files.size(v.resolve(f)) > 0, names[i] + "/" + f);
            }
            // a complete kit: every part the report lists has its mesh, every plate its file
            assertTrue(report.path("parts").size() > 0, "the kit has parts");
            for (JsonNode p : report.path("parts")) {
                assertTrue(Files.size(v.resolve("parts").resolve(p.path("name").asText() + ".stl")) > 84,
                        p.path("name").asText());
            }
            assertTrue(report.path("plates").size() > 0, "the kit has plates");
            for (JsonNode p : report.path("plates")) {
                assertTrue(Files.size(v.resolve(p.path("file").asText())) > 0, p.path("file").asText());
            }
            // the variant really has its value: the report's derivation shows the pin
            JsonNode d = derivation(report, "rotor.diameter");
            assertEquals(diameters[i], d.path("value").asDouble(), 0);
            assertEquals(names[i], csv.get(i + 1).get(1));
            assertRowEqualsReport(csv.get(0), csv.get(i + 1), report);
            anyFail |= report.path("verdict").asText().equals("fail");
        }
        assertEquals(anyFail ? 3 : 0, r.code(), r.out() + r.err());
        assertTrue(r.err().contains("family: 3/3 done"), r.err());
        String html = Files.readString(dir.resolve("family.html"));
        assertEquals(3 + 1, html.split("<svg ", -1).length, "three charts");
        assertFalse(html.contains("src=\"http") || html.contains("href=\"http") || html.contains("<script"),
                "self-contained");
    }

    /** Every table cell equals the value its report.json holds (figures by path, dimensions by key). */
    static void assertRowEqualsReport(List<String> header, List<String> row, JsonNode report) {
        String verdict = report.path("verdict").asText();
        assertEquals(verdict, row.get(header.indexOf("status")));
        int first = header.indexOf("first failure") + 1;
        for (int k = 0; k < FamilyColumns.DIMENSIONS.size(); k++) {
            FamilyColumns.Dimension dim = FamilyColumns.DIMENSIONS.get(k);
            JsonNode kd = null;
            for (JsonNode n : report.path("keyDimensions")) {
                if (n.path("key").asText().equals(dim.key())) {
                    kd = n;
                }
            }
            String cell = row.get(first + k);
            if (kd == null) {
                assertEquals("", cell, dim.key());
            } else if (dim.text()) {
                assertEquals(kd.path("display").asText(), cell, dim.key());
            } else {
                assertEquals(kd.path("value").doubleValue(), Double.parseDouble(cell), 0, dim.key());
            }
        }
        int figures = first + FamilyColumns.DIMENSIONS.size();
        for (int k = 0; k < FamilyColumns.FIGURES.size(); k++) {
            FamilyColumns.Figure f = FamilyColumns.FIGURES.get(k);
            String cell = row.get(figures + k);
            if (f.reportPath().isEmpty()) {
                continue; // derived columns: checked below from their inputs
            }
            JsonNode n = report.at("/" + f.reportPath().replace('.', '/'));
            if (n.isNumber()) {
                assertEquals(n.doubleValue(), Double.parseDouble(cell), 0, f.reportPath());
            } else {
                assertEquals("", cell, f.reportPath());
            }
        }
        double allowable = report.at("/safety/allowableSpeedRpm").asDouble(Double.NaN);
        double runaway = report.at("/safety/runawaySpeedRpm").asDouble(Double.NaN);
        String margin = row.get(figures + FamilyColumns.indexOf(FamilyColumns.SPEED_MARGIN));
        if (Double.isFinite(allowable / runaway)) {
            assertEquals(allowable / runaway, Double.parseDouble(margin), 0);
        }
        double mass = 0;
        for (JsonNode p : report.path("parts")) {
            mass += p.path("massG").asDouble() * p.path("count").asInt();
        }
        String massCell = row.get(figures + FamilyColumns.indexOf("printed-mass"));
        if (report.path("parts").size() > 0) {
            assertEquals(mass, Double.parseDouble(massCell), 1e-9 * mass);
        }
        if (verdict.equals("fail")) {
            String failure = row.get(header.indexOf("first failure"));
            assertTrue(failure.startsWith(report.at("/findings/0/code").asText()), failure);
        }
    }

    private static JsonNode derivation(JsonNode report, String key) {
        for (JsonNode d : report.path("derivations")) {
            if (d.path("key").asText().equals(key)) {
                return d;
            }
        }
        throw new AssertionError("no derivation of " + key);
    }

    @Test
    void anImpossibleVariantIsMarkedAndTheOthersFinish() throws IOException {
        Path dir = tmp.resolve("fam");
        // the second pair pins an exhaust (90 mm) larger than its disc (80 mm): no such turbine
        Run r = run("family", DEMO, "--check-only", "--zip", "--vary", "rotor.diameter=60mm,80mm,100mm",
                "--vary", "rotor.exhaust-diameter=20mm,90mm,30mm", "-o", dir.toString());
        assertEquals(3, r.code(), r.out() + r.err());
        List<List<String>> csv = FamilyFiles.csv(dir.resolve("family.csv"));
        assertEquals(4, csv.size());
        List<String> bad = csv.get(2);
        int status = csv.get(0).indexOf("status");
        assertEquals("bad input", bad.get(status));
        assertTrue(bad.get(status + 1).startsWith("--vary rotor.diameter=60mm,80mm,100mm:1:29: "
                + "rotor.exhaust-diameter: expected less than the disc diameter")
                || bad.get(status + 1).contains("rotor.exhaust-diameter: expected less than the disc diameter"),
                bad.get(status + 1));
        assertFalse(Files.exists(dir.resolve("rotor.diameter=80mm,rotor.exhaust-diameter=90mm")));
        for (int i : new int[] {1, 3}) {
            List<String> row = csv.get(i);
            assertFalse(row.get(status).equals("bad input"), row.toString());
            JsonNode report = JSON.readTree(dir.resolve(row.get(1)).resolve("report.json").toFile());
            assertRowEqualsReport(csv.get(0), row, report);
        }
        assertTrue(r.out().contains("BAD INPUT rotor.diameter=80mm,rotor.exhaust-diameter=90mm"), r.out());
        String html = Files.readString(dir.resolve("family.html"));
        assertTrue(html.contains("<tr class=\"bad-input\">"), "the failing variant is marked in the page");
    }

    @Test
    void anUnknownProfileInOneVariantIsMarkedWithTheNearestName() throws IOException {
        Path dir = tmp.resolve("fam");
        Run r = run("family", DEMO, "--check-only", "--vary", "filament=petg,plaa", "-o", dir.toString());
        assertEquals(3, r.code(), r.out() + r.err());
        List<List<String>> csv = FamilyFiles.csv(dir.resolve("family.csv"));
        int status = csv.get(0).indexOf("status");
        assertEquals("bad input", csv.get(2).get(status));
        assertTrue(csv.get(2).get(status + 1).contains("did you mean pla?"), csv.get(2).get(status + 1));
        assertTrue(Files.exists(dir.resolve("filament=petg").resolve("report.json")));
    }

    @Test
    void rerunningGivesByteIdenticalFilesWhateverTheFinishingOrder() throws IOException {
        String[] vary = {"--vary", "rotor.diameter=60mm,80mm", "--vary", "filament=petg,pla"};
        Path a = tmp.resolve("a");
        Run first = run(concat(new String[] {"family", DEMO, "--check-only", "--jobs", "1", "-o", a.toString()}, vary));
        Map<String, byte[]> before = FamilyFiles.snapshot(a);
        assertEquals(4 + 2, before.size(), "four report.json, family.csv, family.html: " + before.keySet());
        // again into the same folder, with the variants finishing in another order
        Run again = run(concat(new String[] {"family", DEMO, "--check-only", "--jobs", "3", "-o", a.toString()}, vary));
        assertEquals(first.code(), again.code());
        Map<String, byte[]> after = FamilyFiles.snapshot(a);
        assertEquals(before.keySet(), after.keySet());
        for (String k : before.keySet()) {
            assertArrayEquals(before.get(k), after.get(k), k);
        }
    }

    @Test
    void badVaryOptionsExitTwoAndWriteNothing() {
        Path dir = tmp.resolve("never");
        Run unknown = run("family", DEMO, "--vary", "rotor.diamter=60mm,80mm", "-o", dir.toString());
        assertEquals(2, unknown.code());
        assertTrue(unknown.err().startsWith("--vary rotor.diamter=60mm,80mm:1:1: rotor.diamter: expected a spec key "
                + "such as rotor.diameter, found unknown key rotor.diamter; did you mean rotor.diameter?"),
                unknown.err());
        Run unit = run("family", DEMO, "--vary", "rotor.diameter=60mm,4bar", "-o", dir.toString());
        assertEquals(2, unit.code());
        assertTrue(unit.err().contains(":1:21: rotor.diameter: expected a length with a unit"), unit.err());
        Run zip = run("family", DEMO, "--zip", "--vary", "rotor.diameter=60mm,80mm", "--vary", "filament=pla",
                "-o", dir.toString());
        assertEquals(2, zip.code());
        assertTrue(zip.err().contains("expected 2 values (as many as rotor.diameter) to zip the lists, found 1"),
                zip.err());
        assertEquals(2, run("family", DEMO, "-o", dir.toString()).code(), "nothing to vary");
        assertEquals(2, run("family", DEMO, "--vary", "rotor.discs=5", "--jobs", "0", "-o", dir.toString()).code());
        assertFalse(Files.exists(dir));
    }

    @Test
    void theSpecsFamilySectionIsUsedWithoutVary() throws IOException {
        Path spec = tmp.resolve("fam.yaml");
        Files.writeString(spec, Files.readString(Path.of(DEMO)).replace("filament: petg", "filament: petg\n"
                + "family:\n  combine: zip\n  vary:\n    rotor.diameter: 70 mm, 90 mm\n    rotor.discs: [6, 8]\n"));
        Path dir = tmp.resolve("fam");
        run("family", spec.toString(), "--check-only", "-o", dir.toString());
        List<List<String>> csv = FamilyFiles.csv(dir.resolve("family.csv"));
        assertEquals(List.of("rotor.diameter=70mm,rotor.discs=6", "rotor.diameter=90mm,rotor.discs=8"),
                List.of(csv.get(1).get(1), csv.get(2).get(1)));
    }

    private static String[] concat(String[] a, String[] b) {
        String[] c = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, c, a.length, b.length);
        return c;
    }
}
