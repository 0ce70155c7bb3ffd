package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;

import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/**
 * GEO-SPACERS: keyed spacers between discs reach the port circle, so the ports notch their rim and line up
 * with the disc spokes; end spacers sit on the journal between the outer discs and the bearing inner rings,
 * with a narrow land that touches only the inner ring.
 */
public final class SpacerRule extends GeoRule {

    public SpacerRule() {
        super("GEO-SPACERS", List.of(PORT_CIRCLE_DIAMETER, JOURNAL_DIAMETER, HOLE_COMPENSATION, BEARING_INNER_LAND,
                        LAYER_HEIGHT),
                List.of(SPACER_OUTSIDE, END_SPACER_BORE, END_SPACER_LAND, END_SPACER_LAND_HEIGHT));
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        double layer = in.get(LAYER_HEIGHT);
        out.put(SPACER_OUTSIDE, in.get(PORT_CIRCLE_DIAMETER),
                "port circle diameter: ports notch the spacer rim, spacer webs back the disc spokes", "geometry");
        out.put(END_SPACER_BORE, in.get(JOURNAL_DIAMETER) + in.get(HOLE_COMPENSATION) + SLIDE_CLEARANCE_MM,
                "journal + hole compensation + 0.2 mm slide", "printer profile; sliding fit: " + PRINT_RULES);
        out.put(END_SPACER_LAND, in.get(BEARING_INNER_LAND),
                "bearing inner-ring land: the spacer must not rub the shield or outer ring", "geometry");
        out.put(END_SPACER_LAND_HEIGHT, Quanta.up(0.3, layer), "0.3 mm raised to whole layers", PRACTICE);
    }
}
