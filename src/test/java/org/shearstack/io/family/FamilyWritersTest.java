package org.shearstack.io.family;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.family.FamilyFiles;
import org.xml.sax.InputSource;

/** The table writers on a small hand-made table (writer mechanics; real values come from the pipeline elsewhere). */
class FamilyWritersTest {

    @TempDir
    Path dir;

    private static FamilyRow ran(int i, double d, String verdict, double powerW) {
        ObjectNode r = new ObjectMapper().createObjectNode();
        r.put("verdict", verdict);
        r.putArray("keyDimensions").addObject().put("key", "rotor.diameter").put("value", d).put("display", d + " mm");
        r.putObject("performance").putObject("operatingPoint").put("powerW", powerW).put("efficiency", 0.1 * i);
        ObjectNode s = r.putObject("safety");
        s.put("runawaySpeedRpm", 40000.0);
        s.put("allowableSpeedRpm", 30000.0 + 10000 * i);
        if (verdict.equals("fail")) {
            r.putArray("findings").addObject().put("code", "X-1").put("severity", "fail").put("part", "disc")
                    .put("message", "a \"quoted\", comma\nand a line break");
        }
        return FamilyRow.fromReport(i, "rotor.diameter=" + (int) d + "mm",
                List.of(new VariedValue((int) d + "mm", d)), r);
    }

    private static FamilyTable table() {
        List<FamilyRow> rows = List.of(
                ran(2, 100, "pass", 3.5),
                ran(0, 60, "fail", 1.25),
                FamilyRow.without(1, "rotor.diameter=80mm", List.of(new VariedValue("80mm", 80)), Status.BAD_INPUT,
                        "s.yaml:3:4: rotor.diameter: expected <less>, found \"80 mm\""),
                FamilyRow.without(3, "rotor.diameter=120mm", List.of(new VariedValue("120mm", 120)),
                        Status.NOT_RUN, "not run: the family was stopped"));
        return new FamilyTable("demo & co", "s.yaml", List.of(new VariedKey("rotor.diameter", "mm")), false, true,
                rows);
    }

    @Test
    void csvRoundTripsQuotesCommasAndLineBreaksAndKeepsFamilyOrder() {
        FamilyTable t = table();
        String text = FamilyCsv.text(t);
        assertTrue(text.endsWith("\r\n"));
        List<List<String>> back = FamilyFiles.csv(text);
        assertEquals(5, back.size());
        assertEquals(FamilyCsv.header(t), back.get(0));
        for (int i = 0; i < 4; i++) {
            assertEquals(FamilyCsv.cells(t.rows().get(i)), back.get(i + 1));
            assertEquals(Integer.toString(i + 1), back.get(i + 1).get(0));
        }
        int status = back.get(0).indexOf("status");
        assertEquals("X-1 (disc): a \"quoted\", comma\nand a line break", back.get(1).get(status + 1));
        assertEquals("bad input", back.get(2).get(status));
        assertEquals("not run", back.get(4).get(status));
        int power = back.get(0).indexOf("shaft power (W)");
        assertEquals("1.25", back.get(1).get(power));
        assertEquals("", back.get(2).get(power), "not computed is empty, never 0");
        int margin = back.get(0).indexOf("speed margin (allowable / runaway) (1)");
        assertEquals(Double.toString(50000.0 / 40000.0), back.get(3).get(margin));
    }

    @Test
    void htmlIsWellFormedSelfContainedAndMarksFailures() throws Exception {
        String html = FamilyHtml.page(table());
        // well-formed as XML once the doctype is removed: every tag closed, every text escaped
        var db = DocumentBuilderFactory.newInstance();
        db.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        db.newDocumentBuilder().parse(new InputSource(new StringReader(html.replace("<!DOCTYPE html>", "")
                .replace("<meta charset=\"utf-8\">", "<meta charset=\"utf-8\"/>"))));
        assertTrue(html.contains("<title>demo &amp; co family</title>"));
        assertTrue(html.contains("<tr class=\"fail\">"));
        assertTrue(html.contains("<tr class=\"bad-input\">"));
        assertTrue(html.contains("<tr class=\"not-run\">"));
        assertTrue(html.contains("expected &lt;less&gt;, found &quot;80 mm&quot;"));
        assertTrue(html.contains("<a href=\"rotor.diameter=100mm/report.html\">"));
        assertFalse(html.contains("<a href=\"rotor.diameter=80mm/report.html\">"), "no link to a report never written");
        assertFalse(html.replace("http://www.w3.org/2000/svg", "").contains("http"), "no outside resource");
        assertFalse(html.contains("<script"));
        assertEquals(3, html.split("<svg ", -1).length - 1);
        assertTrue(html.contains(">rotor.diameter (mm)</text>"), "x axis labelled with its unit");
        assertTrue(html.contains(">shaft power (W)</text>"));
        assertTrue(html.contains(">1 = runaway reaches the allowable speed</text>"));
    }

    @Test
    void writingTwiceGivesTheSameBytesAndNoTemporaryFilesRemain() throws Exception {
        FamilyWriter.write(table(), dir);
        byte[] csv = Files.readAllBytes(dir.resolve(FamilyCsv.FILE));
        byte[] html = Files.readAllBytes(dir.resolve(FamilyHtml.FILE));
        FamilyWriter.write(table(), dir);
        assertArrayEquals(csv, Files.readAllBytes(dir.resolve(FamilyCsv.FILE)));
        assertArrayEquals(html, Files.readAllBytes(dir.resolve(FamilyHtml.FILE)));
        try (var list = Files.list(dir)) {
            assertEquals(2, list.count());
        }
    }

    @Test
    void roundTicksAndShownFiguresNeverRoundASafeLimitUp() {
        FamilyChart.Axis a = FamilyChart.Axis.of(0, 3.7, true);
        assertEquals(List.of(0.0, 1.0, 2.0, 3.0, 4.0), a.ticks());
        assertEquals("0.5", FamilyChart.Axis.label(0.5, 0.5));
        // 4.999 bar(g) shown with two decimals rounds down to 4.99, never up to 5.00
        assertEquals("4.99", FamilyHtml.format(4.999, 2, true));
        assertEquals("5.00", FamilyHtml.format(4.999, 2, false));
        assertEquals("0.0123", FamilyHtml.format(0.012345, -3, false));
        assertEquals("-", FamilyHtml.format(Double.NaN, 2, false));
        assertEquals("60", FamilyHtml.trim("60.00"));
        assertEquals("0.8", FamilyHtml.trim("0.8000"));
    }
}
