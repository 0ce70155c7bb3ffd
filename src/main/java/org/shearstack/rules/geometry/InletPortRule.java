package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;

import org.shearstack.profile.Port;
import org.shearstack.profile.PortTable;
import org.shearstack.rules.InputRejectedException;
import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/**
 * GEO-INLET-PORT: the vertical inlet in the free cover, from the profile's port table: for a threaded port a
 * tap-drill pilot as deep as the table's port depth; for a push-in fitting (or a glued tube) a plain pilot of
 * tube OD + the table's clearance, as deep as its depth factor × tube OD (common practice). Then a feed hole
 * into the plenum with several times the nozzle throat's area.
 */
public final class InletPortRule extends GeoRule {

    private final PortTable table;

    public InletPortRule(PortTable table) {
        super("GEO-INLET-PORT", List.of(INLET_PORT, INLET_PORT_SIZE, HOLE_COMPENSATION, LAYER_HEIGHT,
                        NOZZLE_THROAT_AREA),
                List.of(PORT_THREAD, PORT_PILOT_DIAMETER, PORT_PILOT_DEPTH, PORT_FEED_DIAMETER));
        this.table = table;
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        String kind = in.has(INLET_PORT) ? in.text(INLET_PORT).trim() : "push-in";
        double hc = in.get(HOLE_COMPENSATION);
        double layer = in.get(LAYER_HEIGHT);
        double pilot;
        String src = table.standard() + " (" + table.source() + ")";
        if (kind.toLowerCase(Locale.ROOT).startsWith("push-in")) {
            double tube = in.has(INLET_PORT_SIZE) ? in.get(INLET_PORT_SIZE) : 6;
            pilot = table.pushInPilotMm(tube);
            String name = "push-in " + num(tube) + " mm";
            out.putText(PORT_THREAD, name, "plain pilot for a push-in fitting or a glued tube of " + mm(tube), src);
            out.put(PORT_PILOT_DIAMETER, pilot + hc, "tube OD + push-in clearance + hole compensation",
                    "common practice (port table); printer profile");
            out.put(PORT_PILOT_DEPTH, Quanta.up(table.pushInDepthMm(tube), layer),
                    "push-in depth factor × tube OD, raised to whole layers", "common practice (port table)");
        } else {
            Port p = table.ports().stream().filter(x -> x.port().equalsIgnoreCase(kind)).findFirst()
                    .orElseThrow(() -> new InputRejectedException(INLET_PORT, "push-in <tube> or one of "
                            + table.ports().stream().map(Port::port).collect(Collectors.joining(", ")),
                            "'" + kind + "'"));
            pilot = p.pilotMm();
            out.putText(PORT_THREAD, p.port(), p.port() + " port", p.source() + " (" + table.source() + ")");
            out.put(PORT_PILOT_DIAMETER, pilot + hc, "tap drill of " + p.port() + " + hole compensation",
                    p.source() + " tap drill (standards.md §5); printer profile");
            out.put(PORT_PILOT_DEPTH, Quanta.up(p.depthMm(), layer), "port depth raised to whole layers",
                    "common practice (standards.md §5.3, port table)");
        }
        double throat = in.get(NOZZLE_THROAT_AREA);
        double feed = Math.min(pilot - 1.0, Math.max(0.6 * pilot, Math.sqrt(16 * throat / Math.PI)));
        out.put(PORT_FEED_DIAMETER, feed + hc,
                "min(pilot − 1, max(0.6 × pilot, diameter of 4 × throat area)) + hole compensation",
                "common practice: feed passages several times the throat keep the plenum at supply pressure");
    }

    static String num(double v) {
        return HousingLayoutRule.num(v);
    }
}
