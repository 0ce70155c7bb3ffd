package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;
import java.util.Locale;

import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;
import org.shearstack.rules.geometry.PortCatalog.Port;

/**
 * GEO-INLET-PORT: the vertical inlet in the free cover: a tap-drill pilot for the fitting's thread and a
 * feed hole into the plenum with several times the nozzle throat's area.
 */
public final class InletPortRule extends GeoRule {

    public InletPortRule() {
        super("GEO-INLET-PORT", List.of(INLET_PORT, INLET_PORT_SIZE, HOLE_COMPENSATION, LAYER_HEIGHT,
                        NOZZLE_THROAT_AREA),
                List.of(PORT_THREAD, PORT_PILOT_DIAMETER, PORT_PILOT_DEPTH, PORT_FEED_DIAMETER));
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        String kind = in.has(INLET_PORT) ? in.text(INLET_PORT).trim() : "push-in";
        Port p;
        String why;
        if (kind.toLowerCase(Locale.ROOT).startsWith("push-in")) {
            double tube = in.has(INLET_PORT_SIZE) ? in.get(INLET_PORT_SIZE) : 6;
            p = PortCatalog.forPushInTube(tube);
            why = "push-in fitting for a " + mm(tube) + " tube, threaded " + p.thread();
        } else {
            p = PortCatalog.byThread(kind).orElseThrow(() -> new IllegalArgumentException(
                    "inlet-port: expected push-in <tube>, G1/8, G1/4 or M5, found '" + kind + "'"));
            why = p.thread() + " port";
        }
        double hc = in.get(HOLE_COMPENSATION);
        out.putText(PORT_THREAD, p.thread(), why, "common practice for pneumatic fittings (standards.md §5.3)");
        out.put(PORT_PILOT_DIAMETER, p.tapDrillMm() + hc, "tap drill of " + p.thread() + " + hole compensation",
                "ISO 228-1 / ISO 261 tap drills (standards.md §5)");
        out.put(PORT_PILOT_DEPTH, Quanta.up(p.threadDepthMm(), in.get(LAYER_HEIGHT)),
                "usable thread depth raised to whole layers", PRACTICE);
        double throat = in.get(NOZZLE_THROAT_AREA);
        double feed = Math.min(p.tapDrillMm() - 1.0, Math.max(0.6 * p.tapDrillMm(), Math.sqrt(16 * throat / Math.PI)));
        out.put(PORT_FEED_DIAMETER, feed + hc,
                "min(tap drill − 1, max(0.6 × tap drill, diameter of 4 × throat area)) + hole compensation",
                "common practice: feed passages several times the throat keep the plenum at supply pressure");
    }
}
