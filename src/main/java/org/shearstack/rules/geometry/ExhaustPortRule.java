package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;

import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/**
 * GEO-EXHAUST-PORTS: round exhaust ports on one circle near the hub, in a count that is a multiple of six
 * so the ports of every disc line up whichever way a disc is slid onto the hexagon; the spokes between
 * ports are at least {@link #SPOKE_LINES} line widths wide.
 */
public final class ExhaustPortRule extends GeoRule {

    /** Narrowest spoke in line widths: three perimeters of structural wall plus one for the torque (common practice). */
    static final int SPOKE_LINES = 4;

    public ExhaustPortRule() {
        super("GEO-EXHAUST-PORTS", List.of(ROTOR_EXHAUST_DIAMETER, ROTOR_DIAMETER, DISC_BORE_ACROSS_FLATS, LINE_WIDTH),
                List.of(PORT_COUNT, PORT_DIAMETER, PORT_CIRCLE_DIAMETER, DISC_EXHAUST_AREA, SPOKE_WIDTH));
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        double lw = in.get(LINE_WIDTH);
        double wall = Quanta.up(STRUCTURAL_WALL_MM, lw);
        double spokeMin = SPOKE_LINES * lw;
        double hexCorner = in.get(DISC_BORE_ACROSS_FLATS) / Math.sqrt(3);
        double inner = hexCorner + wall;
        double outer = Math.min(Math.max(in.get(ROTOR_EXHAUST_DIAMETER) / 2, inner + 2.0),
                in.get(ROTOR_DIAMETER) / 2 - 2 * wall);
        double dp = outer - inner;
        double rc = (inner + outer) / 2;
        int fit = maxPorts(dp, spokeMin, rc);
        int count;
        String how;
        if (fit >= 12) {
            count = 12;
            how = "12 ports fill the ring between hub wall and exhaust diameter";
        } else if (fit >= 6) {
            count = 6;
            how = "6 ports fill the ring between hub wall and exhaust diameter";
        } else {
            count = 6;
            dp = 2 * rc * Math.sin(Math.PI / 6) - spokeMin;
            how = "6 ports, shrunk so the spokes keep their width";
        }
        if (dp < 2 * lw) {
            throw new IllegalArgumentException("rotor.diameter: " + mm(in.get(ROTOR_DIAMETER))
                    + " leaves no room for exhaust ports around a hexagon of " + mm(in.get(DISC_BORE_ACROSS_FLATS))
                    + "; expected a larger rotor or a smaller shaft");
        }
        out.put(PORT_COUNT, count, how + "; a multiple of 6 so ports align on the hexagon in any of its positions",
                "geometry; spokes ≥ " + SPOKE_LINES + " line widths: common practice");
        out.put(PORT_DIAMETER, dp, "exhaust radius − (hex corner + structural wall), limited by the spokes",
                "geometry");
        out.put(PORT_CIRCLE_DIAMETER, 2 * rc, "mid-radius of the port ring × 2", "geometry");
        out.put(DISC_EXHAUST_AREA, count * Math.PI / 4 * dp * dp, "ports × π/4 × port diameter²", "geometry");
        out.put(SPOKE_WIDTH, 2 * rc * Math.sin(Math.PI / count) - dp,
                "chord between neighbouring port centres − port diameter", "geometry");
    }

    /** How many round ports of diameter dp fit on radius rc with spokes at least spokeMin wide. */
    static int maxPorts(double dp, double spokeMin, double rc) {
        double s = (dp + spokeMin) / (2 * rc);
        if (s >= 1) {
            return 0;
        }
        return (int) Math.floor(Math.PI / Math.asin(s) + 1e-9);
    }
}
