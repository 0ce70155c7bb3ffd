package org.shearstack.io.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.shearstack.job.DesignResult;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.InputSource;

class ReportHtmlTest {

    static DesignResult result;
    static String html;
    static Document doc;
    static JsonNode json;

    @BeforeAll
    static void build() throws Exception {
        result = PinnedDemo.run(21);
        html = ReportHtml.page(result.report());
        doc = parseStrict(html);
        json = new ObjectMapper().readTree(ReportJson.text(result.report()));
    }

    /** A strict XML parser: no external DTDs or entities, secure processing on. */
    static Document parseStrict(String text) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        f.setFeature("http://xml.org/sax/features/external-general-entities", false);
        f.setFeature("http://xml.org/sax/features/external-parameter-entities", false);
        f.setExpandEntityReferences(false);
        DocumentBuilder b = f.newDocumentBuilder();
        b.setErrorHandler(new org.xml.sax.helpers.DefaultHandler() {
            @Override
            public void error(org.xml.sax.SAXParseException e) throws org.xml.sax.SAXParseException {
                throw e;
            }
        });
        return b.parse(new InputSource(new StringReader(text)));
    }

    @Test
    void pageIsWellFormedXmlWithEverySection() {
        assertEquals("html", doc.getDocumentElement().getTagName());
        for (String id : List.of("headline", "figures", "cautions", "performance", "parts", "derivations", "fits",
                "findings", "bom")) {
            assertNotNull(byId(id), "section " + id);
        }
    }

    @Test
    void pageIsSelfContained() {
        assertFalse(html.contains("http:"), "no http URL anywhere");
        assertFalse(html.contains("https:"), "no https URL anywhere");
        assertFalse(html.contains("url("), "no CSS url()");
        assertFalse(html.contains("@import"), "no CSS import");
        for (String tag : List.of("script", "link", "iframe", "object", "embed")) {
            assertEquals(0, doc.getElementsByTagName(tag).getLength(), tag);
        }
        for (Element e : all("*")) {
            String src = e.getAttribute("src");
            assertTrue(src.isEmpty() || src.startsWith("data:"), "src " + src);
            assertTrue(e.getAttribute("href").isEmpty(), "href on " + e.getTagName());
        }
    }

    @Test
    void maximumSafePressureIsTheFirstHeadlineFigure() {
        List<Element> figs = byClass("span", "fig");
        assertEquals("safety.maxSafeSupplyPressureBarG", figs.get(0).getAttribute("data-path"));
        assertEquals("safety.maxSafeSupplyPressureBarG", json.get("headline").get(0).get("path").asText());
    }

    @Test
    void everyHeadlineNumberEqualsTheJson() {
        List<Element> figs = byClass("span", "fig");
        assertTrue(figs.size() >= 8, "safety, supply, operating point and generator figures: " + figs.size());
        for (Element fig : figs) {
            String path = fig.getAttribute("data-path");
            String text = fig.getTextContent();
            JsonNode v = ReportJson.at(json, path);
            assertTrue(v.isNumber(), path + " is a number in report.json");
            double shown = Double.parseDouble(text);
            int decimals = text.contains(".") ? text.length() - text.indexOf('.') - 1 : 0;
            double ulp = Math.pow(10, -decimals);
            if (path.equals("safety.maxSafeSupplyPressureBarG")) {
                // a safe limit is shown truncated, never above the computed value
                assertTrue(shown <= v.asDouble() && v.asDouble() < shown + ulp, path + ": " + text + " vs " + v);
            } else {
                assertEquals(v.asDouble(), shown, ulp / 2 + 1e-12, path + ": " + text + " vs " + v);
            }
        }
    }

    @Test
    void cautionsNameTheSafePressureAsTheHeadlineShowsIt() {
        String cautions = byId("cautions").getTextContent();
        String pressure = byClass("span", "fig").get(0).getTextContent();
        assertTrue(cautions.contains("at or below " + pressure + " bar(g)"), cautions);
        for (String must : List.of("eye protection", "guard", "relief valve", "never above", "Keep hands",
                "Local codes and licensed practice")) {
            assertTrue(cautions.contains(must), must);
        }
    }

    @Test
    void plotsHaveAxesWithUnitsAndMarksWhereTheJsonSays() {
        List<Element> plots = byClass("svg", "plot");
        assertEquals(4, plots.size());
        JsonNode perf = json.get("performance");
        JsonNode op = perf.get("operatingPoint");
        double[] opY = {op.get("torqueNm").asDouble() * 1000, op.get("powerW").asDouble(),
            op.get("efficiency").asDouble() * 100, op.get("massFlowKgPerS").asDouble() * 1000};
        String[] yUnits = {"(mN\u00b7m)", "(W)", "(%)", "(g/s)"};
        for (int i = 0; i < 4; i++) {
            Element svg = plots.get(i);
            assertEquals("speed (rpm)", textOf(svg, "xlabel"));
            assertTrue(textOf(svg, "ylabel").endsWith(yUnits[i]), textOf(svg, "ylabel"));
            assertTrue(childrenByClass(svg, "text", "tick").size() >= 6, "tick labels");
            double x0 = Double.parseDouble(svg.getAttribute("data-x-min"));
            double x1 = Double.parseDouble(svg.getAttribute("data-x-max"));
            double y0 = Double.parseDouble(svg.getAttribute("data-y-min"));
            double y1 = Double.parseDouble(svg.getAttribute("data-y-max"));
            double plotW = SvgPlot.WIDTH - SvgPlot.LEFT - SvgPlot.RIGHT;
            double plotH = SvgPlot.HEIGHT - SvgPlot.TOP - SvgPlot.BOTTOM;

            Element opMark = mark(svg, "operating point");
            double expX = SvgPlot.LEFT + (op.get("speedRpm").asDouble() - x0) / (x1 - x0) * plotW;
            double expY = SvgPlot.HEIGHT - SvgPlot.BOTTOM - (opY[i] - y0) / (y1 - y0) * plotH;
            Element c = (Element) opMark.getElementsByTagName("circle").item(0);
            // coordinates are written to 0.1 px
            assertEquals(expX, Double.parseDouble(c.getAttribute("cx")), 0.051, "operating point x, plot " + i);
            assertEquals(expY, Double.parseDouble(c.getAttribute("cy")), 0.051, "operating point y, plot " + i);

            Element run = mark(svg, "runaway");
            Element rc = (Element) run.getElementsByTagName("circle").item(0);
            double runX = SvgPlot.LEFT + (perf.get("runawaySpeedRpm").asDouble() - x0) / (x1 - x0) * plotW;
            assertEquals(runX, Double.parseDouble(rc.getAttribute("cx")), 0.051, "runaway x, plot " + i);
        }
        // on the torque and power plots the runaway sits on the zero line
        for (int i = 0; i < 2; i++) {
            Element rc = (Element) mark(plots.get(i), "runaway").getElementsByTagName("circle").item(0);
            double y0 = Double.parseDouble(plots.get(i).getAttribute("data-y-min"));
            double y1 = Double.parseDouble(plots.get(i).getAttribute("data-y-max"));
            double zero = SvgPlot.HEIGHT - SvgPlot.BOTTOM - (0 - y0) / (y1 - y0) * (SvgPlot.HEIGHT - SvgPlot.TOP
                    - SvgPlot.BOTTOM);
            assertEquals(zero, Double.parseDouble(rc.getAttribute("cy")), 0.3, "runaway on zero torque/power");
        }
    }

    @Test
    void torquePlotShowsTheBandAndTheGeneratorCurve() {
        Element torque = byClass("svg", "plot").get(0);
        assertEquals(1, childrenByClass(torque, "polygon", "band").size());
        assertTrue(childrenByClass(torque, "polyline", "gen").size() == 1, "generator load torque line");
    }

    @Test
    void everyDerivationIsListedAndExpandable() {
        NodeList details = doc.getElementsByTagName("details");
        assertEquals(result.design().keys().size(), details.getLength());
        assertEquals(result.design().keys().size(), json.get("derivations").size());
    }

    @Test
    void findingsAreSortedBySeverity() {
        List<String> seen = new ArrayList<>();
        for (Element tr : all("tr")) {
            String cls = tr.getAttribute("class");
            if (cls.startsWith("s-") && isInside(tr, "findings")) {
                seen.add(cls);
            }
        }
        assertFalse(seen.isEmpty());
        List<String> order = List.of("s-fail", "s-caution", "s-ok");
        for (int i = 1; i < seen.size(); i++) {
            assertTrue(order.indexOf(seen.get(i - 1)) <= order.indexOf(seen.get(i)), seen.toString());
        }
    }

    @Test
    void summaryMarkdownLeadsWithTheVerdictAndTheSafePressure() {
        String md = SummaryMarkdown.text(result.report());
        List<String> lines = md.lines().toList();
        assertEquals("# pinned-demo: " + json.get("verdict").asText().toUpperCase(Locale.ROOT), lines.get(0));
        String pressure = byClass("span", "fig").get(0).getTextContent();
        assertEquals("- Maximum safe supply pressure: **" + pressure + " bar(g)**", lines.get(2));
        assertTrue(md.contains("## Cautions"));
    }

    @Test
    void outputDoesNotDependOnTheMachineLocale() {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY);
            String german = ReportHtml.page(result.report()) + ReportJson.text(result.report())
                    + SummaryMarkdown.text(result.report());
            Locale.setDefault(Locale.US);
            String us = ReportHtml.page(result.report()) + ReportJson.text(result.report())
                    + SummaryMarkdown.text(result.report());
            assertEquals(us, german);
        } finally {
            Locale.setDefault(before);
        }
    }

    // ---------------------------------------------------------------- DOM helpers

    static Element byId(String id) {
        for (Element e : all("*")) {
            if (id.equals(e.getAttribute("id"))) {
                return e;
            }
        }
        return null;
    }

    static List<Element> all(String tag) {
        NodeList n = doc.getElementsByTagName(tag);
        List<Element> out = new ArrayList<>();
        for (int i = 0; i < n.getLength(); i++) {
            out.add((Element) n.item(i));
        }
        return out;
    }

    static List<Element> byClass(String tag, String cls) {
        return all(tag).stream().filter(e -> List.of(e.getAttribute("class").split(" ")).contains(cls)).toList();
    }

    static List<Element> childrenByClass(Element root, String tag, String cls) {
        NodeList n = root.getElementsByTagName(tag);
        List<Element> out = new ArrayList<>();
        for (int i = 0; i < n.getLength(); i++) {
            Element e = (Element) n.item(i);
            if (List.of(e.getAttribute("class").split(" ")).contains(cls)) {
                out.add(e);
            }
        }
        return out;
    }

    static String textOf(Element svg, String cls) {
        return childrenByClass(svg, "text", cls).get(0).getTextContent();
    }

    static Element mark(Element svg, String name) {
        return childrenByClass(svg, "g", "mark").stream().filter(g -> g.getAttribute("data-name").equals(name))
                .findFirst().orElseThrow(() -> new AssertionError("no mark " + name));
    }

    static boolean isInside(Element e, String sectionId) {
        for (org.w3c.dom.Node n = e; n != null; n = n.getParentNode()) {
            if (n instanceof Element el && sectionId.equals(el.getAttribute("id"))) {
                return true;
            }
        }
        return false;
    }
}
