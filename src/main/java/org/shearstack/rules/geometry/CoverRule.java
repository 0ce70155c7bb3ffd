package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;

import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/**
 * GEO-COVER: the end cover's thickness in whole layers: deep enough for the bearing pocket and its lip, the
 * inlet pilot below the seal groove, and the screw anchor, never under 3 mm.
 */
public final class CoverRule extends GeoRule {

    public CoverRule() {
        super("GEO-COVER", List.of(SEAT_DEPTH, LIP_THICKNESS, PORT_PILOT_DEPTH, GROOVE_DEPTH, BOLT_ANCHOR_DEPTH,
                LAYER_HEIGHT), List.of(COVER_THICKNESS));
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        double floor = STRUCTURAL_WALL_MM;
        double t = Math.max(in.get(SEAT_DEPTH) + in.get(LIP_THICKNESS),
                Math.max(in.get(PORT_PILOT_DEPTH) + in.get(GROOVE_DEPTH) + floor,
                        Math.max(in.get(BOLT_ANCHOR_DEPTH) + floor, 3.0)));
        out.put(COVER_THICKNESS, Quanta.up(t, in.get(LAYER_HEIGHT)),
                "max(seat depth + lip, inlet pilot + groove depth + 1.2 mm, anchor depth + 1.2 mm, 3 mm) in whole layers",
                PRINT_RULES);
    }
}
