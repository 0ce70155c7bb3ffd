package org.shearstack.io.dyno;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.physics.dyno.DynoAnalyzer;
import org.shearstack.physics.dyno.DynoInputs;
import org.shearstack.physics.dyno.DynoResult;
import org.shearstack.physics.dyno.LossLaw;
import org.shearstack.physics.dyno.Prediction;
import org.shearstack.physics.dyno.SpeedLog;
import org.w3c.dom.Document;
import org.xml.sax.InputSource;

class DynoReportWriterTest {

    /** A simulated run: air torque 40 mN·m (1 − ω/3000), loss 1e-3 + 2e-6 ω N·m, I = 1e-4 kg·m² (invented). */
    private static DynoResult result() {
        LossLaw loss = new LossLaw(1e-3, 2e-6, 0);
        List<double[]> rows = new ArrayList<>();
        double w = 0;
        double dt = 1e-3;
        for (int k = 0; k <= 60000; k++) {
            double t = k * dt;
            if (k % 50 == 0) {
                rows.add(new double[] {t, w});
            }
            double drive = t >= 1 && t < 25 ? 0.040 * (1 - w / 3000) : 0;
            w = Math.max(0, w + dt * (drive - (w > 0 ? loss.torqueNm(w) : 0)) / 1e-4);
        }
        double[] ts = rows.stream().mapToDouble(r -> r[0]).toArray();
        double[] ws = rows.stream().mapToDouble(r -> r[1]).toArray();
        return DynoAnalyzer.analyze(SpeedLog.of(ts, ws), DynoInputs.of(1e-4).withPrediction(
                new Prediction(x -> 0.040 * (1 - x / 3000), Prediction.Basis.ROTOR, "the simulated curve")));
    }

    @Test
    void writesThreeFilesWhoseContentsReadBack(@TempDir Path dir) throws Exception {
        DynoResult r = result();
        List<Path> written = DynoReportWriter.write(new DynoReport(r, "sim.csv", "time, speed", "given"), dir);
        assertEquals(List.of(dir.resolve("dyno.csv"), dir.resolve("dyno.json"), dir.resolve("dyno.html")), written);
        try (var s = Files.list(dir)) {
            assertEquals(3, s.count(), "no temporary files left");
        }
        List<String> csv = Files.readAllLines(dir.resolve("dyno.csv"));
        assertEquals(DynoCsv.HEADER, csv.get(0));
        assertEquals(1 + r.runUp().size() + r.coastDown().size(), csv.size());
        String[] first = csv.get(1).split(",", -1);
        assertEquals(15, first.length);
        assertEquals(r.runUp().get(0).shaftTorqueNm(), Double.parseDouble(first[8]), 1e-6 * Math.abs(r.runUp().get(0).shaftTorqueNm()) + 1e-12);

        JsonNode j = new ObjectMapper().readTree(dir.resolve("dyno.json").toFile());
        assertEquals(r.summary().noLoadSpeedRadPerS(), j.at("/summary/noLoadSpeedRadPerS").asDouble(), 0);
        assertEquals(r.loss().orElseThrow().law().viscousNmPerRadPerS(), j.at("/loss/viscousNmPerRadPerS").asDouble(), 0);
        assertEquals("rotor", j.at("/comparison/measuredTorque").asText());
        assertEquals(1.0, j.at("/comparison/meanMeasuredOverPredicted").asDouble(), 0.03);
        assertTrue(j.at("/summary/stallShaftTorqueNm").isNumber());
    }

    /** Every chart is well-formed SVG (parsed as XML with external entities refused) with labelled axes. */
    @Test
    void chartsAreWellFormedSvgWithUnits() throws Exception {
        Map<String, String> files = DynoReportWriter.render(new DynoReport(result(), "sim.csv", "", ""));
        String html = files.get(DynoReportWriter.HTML);
        Matcher m = Pattern.compile("<svg .*?</svg>", Pattern.DOTALL).matcher(html);
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        List<String> xLabels = new ArrayList<>();
        while (m.find()) {
            Document d = f.newDocumentBuilder().parse(new InputSource(new StringReader(m.group())));
            assertEquals("svg", d.getDocumentElement().getNodeName());
            var texts = d.getElementsByTagName("text");
            boolean hasUnit = false;
            for (int i = 0; i < texts.getLength(); i++) {
                String t = texts.item(i).getTextContent();
                hasUnit |= t.matches(".*\\[(s|rpm|mN·m|W)\\]");
                if (t.equals("time [s]") || t.equals("speed [rpm]")) {
                    xLabels.add(t);
                }
            }
            assertTrue(hasUnit, "axis label with unit");
            assertTrue(d.getElementsByTagName("polyline").getLength() >= 1);
        }
        // speed against time (x time, y speed), then torque, power and loss against speed
        assertEquals(List.of("time [s]", "speed [rpm]", "speed [rpm]", "speed [rpm]", "speed [rpm]"), xLabels);
        assertTrue(html.contains(">predicted<"), "predicted curve in the legend");
        assertTrue(html.contains("run-up") && html.contains("coast-down"), "segments marked");
    }
}
