package org.shearstack.io.report;

import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.Locale;
import org.shearstack.check.Finding;
import org.shearstack.check.safety.SafetySummary;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.physics.rotor.OperatingPoint;
import org.shearstack.physics.rotor.PerformanceCurve;
import org.shearstack.rules.Derivation;
import org.shearstack.rules.Key;
import org.shearstack.spec.Dimension;

/**
 * report.json: the report's content for scripts. The shape is versioned ({@link #FORMAT_VERSION}) and described
 * by the JSON Schema in {@code /schema/report-1.schema.json}; numbers that could not be computed are null.
 */
public final class ReportJson {

    public static final String FORMAT = "shearstack-report";
    public static final int FORMAT_VERSION = 1;
    /** Classpath location of the schema of this version. */
    public static final String SCHEMA_RESOURCE = "/schema/report-1.schema.json";

    private static final JsonNodeFactory F = JsonNodeFactory.instance;

    private ReportJson() {
    }

    /** The JSON text, UTF-8, two-space indent, "\n" line ends, fixed key order. */
    public static String text(ReportData r) {
        try {
            DefaultPrettyPrinter pp = new DefaultPrettyPrinter()
                    .withObjectIndenter(new DefaultIndenter("  ", "\n"))
                    .withArrayIndenter(new DefaultIndenter("  ", "\n"));
            return new ObjectMapper().writer(pp).writeValueAsString(tree(r)) + "\n";
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException("could not write report.json", e);
        }
    }

    /** The JSON tree. */
    public static ObjectNode tree(ReportData r) {
        ObjectNode root = F.objectNode();
        root.put("format", FORMAT);
        root.put("formatVersion", FORMAT_VERSION);
        ObjectNode design = root.putObject("design");
        design.put("name", r.design().name());
        design.put("sourceFile", r.design().sourceFile());
        root.put("verdict", r.verdictWord());
        ArrayNode headline = root.putArray("headline");
        for (Headline.Figure f : Headline.figures(r)) {
            ObjectNode o = headline.addObject();
            o.put("path", f.jsonPath());
            o.put("label", f.label());
            num(o, "value", f.value());
            o.put("unit", f.unit());
            o.put("text", f.text());
        }
        ArrayNode dims = root.putArray("keyDimensions");
        for (KeyDimension k : Headline.keyDimensions(r.design())) {
            dims.add(keyDimension(k));
        }
        ArrayNode cautions = root.putArray("cautions");
        Cautions.lines(r.safety()).forEach(cautions::add);
        root.set("safety", r.safety().map(ReportJson::safety).orElse(null));
        root.set("supply", r.supply().map(ReportJson::supply).orElse(null));
        root.set("performance", r.performance().map(ReportJson::performance).orElse(null));
        ArrayNode parts = root.putArray("parts");
        for (PartData p : r.parts()) {
            ObjectNode o = parts.addObject();
            o.put("name", p.name());
            o.put("count", p.count());
            o.put("material", p.material());
            num(o, "massG", p.massG());
            num(o, "volumeMm3", p.volumeMm3());
            o.put("printOrientation", p.printOrientation());
            ArrayNode kd = o.putArray("keyDimensions");
            p.keyDimensions().forEach(k -> kd.add(keyDimension(k)));
        }
        root.set("derivations", derivations(r.design()));
        ArrayNode fits = root.putArray("fits");
        for (Finding f : FitsSection.fitFindings(r.findings())) {
            fits.add(finding(f));
        }
        ArrayNode findings = root.putArray("findings");
        r.findings().forEach(f -> findings.add(finding(f)));
        ArrayNode bom = root.putArray("bom");
        for (BomLine b : r.bom()) {
            ObjectNode o = bom.addObject();
            o.put("item", b.item());
            o.put("kind", b.kind());
            o.put("count", b.count());
            o.put("detail", b.detail());
            num(o, "massG", b.massG());
            num(o, "printTimeMin", b.printTimeMin());
        }
        ArrayNode plates = root.putArray("plates");
        for (PlateData p : r.plates()) {
            ObjectNode o = plates.addObject();
            o.put("file", p.file());
            ArrayNode names = o.putArray("parts");
            p.parts().forEach(names::add);
        }
        ObjectNode preview = root.putObject("preview");
        preview.put("rendered", r.preview().png().isPresent());
        preview.put("note", r.preview().note());
        ArrayNode omissions = root.putArray("omissions");
        for (Omission o : r.omissions()) {
            ObjectNode n = omissions.addObject();
            n.put("section", o.section());
            n.put("reason", o.reason());
        }
        return root;
    }

    /** The value at a dotted path ("safety.runawaySpeedRpm"), or a missing node. */
    public static JsonNode at(JsonNode root, String dottedPath) {
        return root.at("/" + dottedPath.replace('.', '/'));
    }

    private static ObjectNode safety(SafetySummary s) {
        ObjectNode o = F.objectNode();
        num(o, "maxSafeSupplyPressureBarG", s.maxSafeSupplyPressureBarG());
        num(o, "runawaySpeedRpm", s.runawaySpeedRpm());
        num(o, "allowableSpeedRpm", s.allowableSpeedRpm());
        o.put("governingPart", s.governingPart());
        o.put("ceilingReached", s.ceilingReached());
        return o;
    }

    private static ObjectNode supply(SupplyData s) {
        ObjectNode o = F.objectNode();
        num(o, "pressureBarG", s.supplyPressureBarG());
        num(o, "ambientPressureBarA", s.ambientPressurePa() / 1e5);
        num(o, "conductanceDm3PerSBar", s.conductanceDm3PerSBar());
        num(o, "criticalPressureRatio", s.criticalPressureRatio());
        return o;
    }

    private static ObjectNode performance(PerformanceData p) {
        ObjectNode o = F.objectNode();
        o.set("map", curve(p.map().estimate()));
        ObjectNode band = o.putObject("band");
        band.set("optimistic", bandCurve(p.map().optimistic()));
        band.set("pessimistic", bandCurve(p.map().pessimistic()));
        num(o, "runawaySpeedRpm", Num.rpm(p.map().runawaySpeedRadPerS()));
        num(o, "runawayUpperBoundRpm", Num.rpm(p.map().runawayUpperBoundRadPerS()));
        num(o, "stallTorqueNm", p.map().stallTorqueNm());
        num(o, "fractionOutOfRange", p.map().fractionOutOfRange());
        ObjectNode op = point(p.operatingPoint());
        op.put("basis", p.operatingBasis());
        o.set("operatingPoint", op);
        o.set("generator", p.generator().map(g -> {
            ObjectNode n = F.objectNode();
            num(n, "loadResistanceOhm", g.loadResistanceOhm());
            num(n, "electricalPowerW", g.electricalPowerW());
            num(n, "terminalVoltageV", g.terminalVoltageV());
            ArrayNode c = n.putArray("curve");
            for (PerformanceData.GeneratorSample s : g.points()) {
                ObjectNode q = c.addObject();
                num(q, "speedRpm", Num.rpm(s.speedRadPerS()));
                num(q, "torqueNm", s.torqueNm());
                num(q, "electricalPowerW", s.electricalPowerW());
            }
            return (JsonNode) n;
        }).orElse(null));
        return o;
    }

    private static ObjectNode bandCurve(PerformanceCurve c) {
        ObjectNode o = F.objectNode();
        o.put("calibration", c.calibration().name());
        num(o, "runawaySpeedRpm", Num.rpm(c.runawaySpeedRadPerS()));
        num(o, "stallTorqueNm", c.stallTorqueNm());
        o.set("map", curve(c));
        return o;
    }

    private static ArrayNode curve(PerformanceCurve c) {
        ArrayNode a = F.arrayNode();
        c.points().forEach(p -> a.add(point(p)));
        return a;
    }

    private static ObjectNode point(OperatingPoint p) {
        ObjectNode o = F.objectNode();
        num(o, "speedRpm", p.speedRpm());
        num(o, "torqueNm", p.shaftTorqueNm());
        num(o, "powerW", p.shaftPowerW());
        num(o, "massFlowKgPerS", p.massFlowKgPerS());
        num(o, "efficiency", p.efficiency());
        o.put("inRange", p.validity().inRange());
        return o;
    }

    private static ArrayNode derivations(ResolvedDesign d) {
        ArrayNode a = F.arrayNode();
        for (Key k : d.keys()) {
            Derivation der = d.derivation(k);
            ObjectNode o = a.addObject();
            o.put("key", k.name());
            boolean text = d.findText(k).isPresent();
            if (text) {
                o.putNull("value");
            } else {
                num(o, "value", d.get(k));
            }
            o.put("unit", text || k.dimension() == Dimension.TEXT ? "" : k.dimension().canonicalUnit());
            o.put("display", d.display(k));
            o.put("origin", der.origin().name().toLowerCase(Locale.ROOT));
            o.put("ruleId", der.ruleId());
            ArrayNode in = o.putArray("inputs");
            for (Derivation.Input i : der.inputs()) {
                ObjectNode n = in.addObject();
                n.put("key", i.key().name());
                n.put("value", i.value());
            }
            o.put("formula", der.formula() == null ? "" : der.formula());
            o.put("source", der.source() == null ? "" : der.source());
        }
        return a;
    }

    static ObjectNode finding(Finding f) {
        ObjectNode o = F.objectNode();
        o.put("code", f.code());
        o.put("severity", f.severity().name().toLowerCase(Locale.ROOT));
        o.put("message", f.message());
        num(o, "measured", f.measured());
        num(o, "limit", f.limit());
        o.put("unit", f.unit());
        num(o, "margin", f.margin());
        o.put("part", f.part());
        o.put("feature", f.feature());
        o.put("ruleId", f.ruleId());
        o.put("remedy", f.remedy());
        if (f.where().isKnown()) {
            ObjectNode w = o.putObject("where");
            num(w, "xMm", f.where().xMm());
            num(w, "yMm", f.where().yMm());
            num(w, "zMm", f.where().zMm());
        } else {
            o.putNull("where");
        }
        return o;
    }

    private static ObjectNode keyDimension(KeyDimension k) {
        ObjectNode o = F.objectNode();
        o.put("key", k.key());
        o.put("label", k.label());
        num(o, "value", k.value());
        o.put("unit", k.unit());
        o.put("display", k.display());
        return o;
    }

    /** Finite numbers as numbers, NaN and infinities as null (JSON has neither). */
    static void num(ObjectNode o, String field, double v) {
        if (Double.isFinite(v)) {
            o.put(field, v);
        } else {
            o.putNull(field);
        }
    }

    static List<String> severities() {
        return List.of("ok", "caution", "fail");
    }
}
