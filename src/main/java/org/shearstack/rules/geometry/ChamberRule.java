package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;

import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/** GEO-HOUSING-CHAMBER: radial clearance around the discs and the chamber diameter. */
public final class ChamberRule extends GeoRule {

    public ChamberRule() {
        super("GEO-HOUSING-CHAMBER", List.of(ROTOR_DIAMETER, LINE_WIDTH), List.of(RADIAL_CLEARANCE, CHAMBER_DIAMETER));
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        double d = in.get(ROTOR_DIAMETER);
        double c = Quanta.upToMultiple(Math.max(Math.max(0.5, 0.01 * d), 2 * in.get(LINE_WIDTH)), 0.05);
        out.put(RADIAL_CLEARANCE, c, "max(0.5 mm, 1 % of disc diameter, 2 line widths), up to 0.05 mm",
                "common practice: printed discs run out and grow; ±0.2 mm FFF tolerance (standards.md §7)");
        out.put(CHAMBER_DIAMETER, d + 2 * c, "disc diameter + 2 × radial clearance", "geometry");
    }
}
