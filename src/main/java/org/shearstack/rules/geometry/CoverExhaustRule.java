package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;

import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/**
 * GEO-COVER-EXHAUST: arc-shaped exhaust openings in each cover, as close to the axis as the bearing seat's
 * wall allows and out to the discs' port ring, separated by webs.
 */
public final class CoverExhaustRule extends GeoRule {

    static final int OPENINGS = 6;

    public CoverExhaustRule() {
        super("GEO-COVER-EXHAUST", List.of(SEAT_LEAD_IN_DIAMETER, PORT_CIRCLE_DIAMETER, PORT_DIAMETER, LINE_WIDTH,
                        CHAMBER_DIAMETER),
                List.of(COVER_EXHAUST_INNER, COVER_EXHAUST_OUTER, COVER_EXHAUST_COUNT, COVER_EXHAUST_WEB));
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        double lw = in.get(LINE_WIDTH);
        double wall = Quanta.up(STRUCTURAL_WALL_MM, lw);
        double inner = in.get(SEAT_LEAD_IN_DIAMETER) + 2 * wall;
        double outer = Math.max(in.get(PORT_CIRCLE_DIAMETER) + in.get(PORT_DIAMETER), inner + 4.0);
        outer = Math.min(outer, in.get(CHAMBER_DIAMETER) - 4 * wall);
        out.put(COVER_EXHAUST_INNER, inner, "seat lead-in diameter + 2 × structural wall", PRINT_RULES);
        out.put(COVER_EXHAUST_OUTER, outer, "max(outer edge of the disc ports, inner + 4 mm)", "geometry");
        out.put(COVER_EXHAUST_COUNT, OPENINGS, "six arcs", PRACTICE);
        out.put(COVER_EXHAUST_WEB, Quanta.up(Math.max(2.0, 4 * lw), lw), "max(2 mm, 4 line widths) in whole lines",
                PRINT_RULES);
    }
}
