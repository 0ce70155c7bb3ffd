package org.shearstack.io.dyno;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Map;
import org.shearstack.check.Finding;
import org.shearstack.physics.dyno.DynoResult;
import org.shearstack.physics.dyno.DynoSummary;
import org.shearstack.physics.dyno.LossFit;
import org.shearstack.physics.dyno.Segment;
import org.shearstack.physics.dyno.WindowChoice;

/** dyno.json: the summary of one bench run (SI values, unit in every key; unknown values are null). */
public final class DynoJson {
    /** Format identifier written as "format". */
    public static final String FORMAT = "shearstack-dyno/1";

    private DynoJson() {
    }

    public static String render(DynoReport rep) {
        ObjectMapper om = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        DynoResult r = rep.result();
        ObjectNode root = om.createObjectNode();
        root.put("format", FORMAT);
        root.put("log", rep.logSource());
        root.put("logColumns", rep.logColumns());
        root.put("samples", r.log().size());
        put(root, "inertiaKgM2", r.inertiaKgM2());
        root.put("inertiaSource", rep.inertiaSource());
        ArrayNode segs = root.putArray("segments");
        for (Segment s : r.segments().all()) {
            ObjectNode o = segs.addObject();
            o.put("kind", s.kind().label());
            put(o, "startS", r.log().timeS(s.from()));
            put(o, "endS", r.log().timeS(s.to() - 1));
            o.put("samples", s.length());
            o.put("origin", s.origin());
        }
        ObjectNode win = root.putObject("smoothing");
        for (Map.Entry<Segment.Kind, WindowChoice> e : new java.util.TreeMap<>(r.windows()).entrySet()) {
            ObjectNode o = win.putObject(e.getKey().label());
            o.put("method", "Savitzky-Golay");
            o.put("points", e.getValue().points());
            o.put("maxPoints", e.getValue().maxPoints());
            o.put("order", e.getValue().order());
            put(o, "durationS", e.getValue().durationS());
            o.put("reason", e.getValue().reason());
        }
        if (r.loss().isPresent()) {
            LossFit.Result l = r.loss().get();
            ObjectNode o = root.putObject("loss");
            put(o, "constantNm", l.law().constantNm());
            put(o, "viscousNmPerRadPerS", l.law().viscousNmPerRadPerS());
            put(o, "quadraticNmPerRadPerSSquared", l.law().quadraticNmPerRadPerSSquared());
            o.put("terms", l.terms());
            put(o, "rmsResidualNm", l.rmsNm());
            o.put("samples", l.samples());
        } else {
            root.putNull("loss");
        }
        DynoSummary s = r.summary();
        ObjectNode o = root.putObject("summary");
        put(o, "peakShaftPowerW", s.peakShaftPowerW());
        putSpeed(o, "speedAtPeakShaftPower", s.speedAtPeakShaftPowerRadPerS());
        put(o, "peakRotorPowerW", s.peakRotorPowerW());
        putSpeed(o, "speedAtPeakRotorPower", s.speedAtPeakRotorPowerRadPerS());
        put(o, "stallRotorTorqueNm", s.stallRotorTorqueNm());
        put(o, "stallShaftTorqueNm", s.stallShaftTorqueNm());
        putSpeed(o, "noLoadSpeed", s.noLoadSpeedRadPerS());
        o.put("noLoadSource", s.noLoadSource());
        put(o, "backEmfConstantVsPerRad", s.backEmfConstantVsPerRad());
        put(o, "coastDownStopTimeS", s.coastDownStopTimeS());
        if (r.comparison().isPresent()) {
            var c = r.comparison().get();
            ObjectNode p = root.putObject("comparison");
            p.put("prediction", c.label());
            p.put("measuredTorque", c.basis() == org.shearstack.physics.dyno.Prediction.Basis.ROTOR ? "rotor" : "shaft");
            p.put("speedRange", "20-80 % of the no-load speed");
            put(p, "meanMeasuredOverPredicted", c.meanRatio());
            put(p, "rmsDifferenceNm", c.rmsDifferenceNm());
            p.put("samples", c.samples());
        } else {
            root.putNull("comparison");
        }
        ArrayNode fs = root.putArray("findings");
        for (Finding f : r.findings()) {
            ObjectNode n = fs.addObject();
            n.put("code", f.code());
            n.put("severity", f.severity().name());
            n.put("message", f.message());
            n.put("remedy", f.remedy());
        }
        try {
            return om.writeValueAsString(root) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("JSON tree could not be written", e);
        }
    }

    private static void put(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }

    private static void putSpeed(ObjectNode o, String key, double radPerS) {
        put(o, key + "RadPerS", radPerS);
        put(o, key + "Rpm", radPerS * DynoReport.RPM_PER_RAD_S);
    }
}
