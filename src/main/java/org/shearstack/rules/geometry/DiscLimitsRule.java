package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;

import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/**
 * GEO-DISC-LIMITS: printer-dependent limits for disc and gap thickness. Printed discs of about 0.25 mm are
 * flimsy and rough; about 0.75 mm discs with 0.75 mm gaps print stiff and smooth on a 0.4 mm nozzle
 * (common practice). Expressed relative to the nozzle so another printer gets its own limits.
 */
public final class DiscLimitsRule extends GeoRule {

    public DiscLimitsRule() {
        super("GEO-DISC-LIMITS", List.of(NOZZLE_DIAMETER, LAYER_HEIGHT),
                List.of(DISC_THICKNESS_MIN, DISC_THICKNESS_PREFERRED, GAP_MIN, GAP_PREFERRED));
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        double nozzle = in.get(NOZZLE_DIAMETER);
        double layer = in.get(LAYER_HEIGHT);
        out.put(DISC_THICKNESS_MIN, Quanta.up(Math.max(1.5 * nozzle, 3 * layer), layer),
                "max(1.5 × nozzle diameter, 3 layers), raised to whole layers",
                "common practice: 0.25 mm printed discs are too flimsy; at least three layers and 1.5 nozzle widths");
        out.put(DISC_THICKNESS_PREFERRED, Quanta.up(1.875 * nozzle, layer),
                "1.875 × nozzle diameter (0.75 mm on a 0.4 mm nozzle), raised to whole layers",
                "common practice: 0.75 mm discs print stiff and smooth on a 0.4 mm nozzle");
        out.put(GAP_MIN, Quanta.up(Math.max(nozzle, 2 * layer), layer),
                "max(nozzle diameter, 2 layers), raised to whole layers",
                "common practice: printed disc flatness is of the order of a nozzle width");
        out.put(GAP_PREFERRED, Quanta.up(1.875 * nozzle, layer),
                "1.875 × nozzle diameter (0.75 mm on a 0.4 mm nozzle), raised to whole layers",
                "common practice: 0.75 mm gaps with 0.75 mm discs on a 0.4 mm nozzle");
    }
}
