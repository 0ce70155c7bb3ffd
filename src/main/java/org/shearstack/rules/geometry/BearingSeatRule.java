package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;

import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/**
 * GEO-BEARING-SEAT: the pocket in each cover (diameter with the printer's hole compensation and a light
 * press, depth in whole layers, a 45° lead-in) and the lip behind it, and the printed journal.
 */
public final class BearingSeatRule extends GeoRule {

    public BearingSeatRule() {
        super("GEO-BEARING-SEAT",
                List.of(BEARING_BORE, BEARING_OUTSIDE, BEARING_WIDTH, HOLE_COMPENSATION, OUTER_COMPENSATION,
                        LAYER_HEIGHT, ROTOR_SHAFT),
                List.of(SEAT_DIAMETER, SEAT_DEPTH, SEAT_LEAD_IN_DIAMETER, SEAT_LEAD_IN_DEPTH, LIP_HOLE_DIAMETER,
                        LIP_THICKNESS, JOURNAL_DIAMETER));
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        double d = in.get(BEARING_BORE);
        double outside = in.get(BEARING_OUTSIDE);
        double layer = in.get(LAYER_HEIGHT);
        double hc = in.get(HOLE_COMPENSATION);
        double seat = outside + hc - LIGHT_PRESS_MM;
        out.put(SEAT_DIAMETER, seat, "D + hole compensation − 0.05 mm light press",
                "printer profile (hole compensation); light press 0–0.1 mm: common practice (standards.md §7)");
        out.put(SEAT_DEPTH, Quanta.up(in.get(BEARING_WIDTH), layer), "bearing width B raised to whole layers",
                "printer quantisation");
        double leadDepth = Quanta.up(0.4, layer);
        out.put(SEAT_LEAD_IN_DEPTH, leadDepth, "0.4 mm raised to whole layers", PRACTICE + ": lead-in chamfer");
        out.put(SEAT_LEAD_IN_DIAMETER, seat + 2 * leadDepth, "seat diameter + 2 × lead-in depth (45°)",
                PRACTICE + ": 45° lead-in so the ring enters square");
        out.put(LIP_HOLE_DIAMETER, (d + outside) / 2 + hc,
                "(d + D) / 2 + hole compensation: the lip bears on the outer ring and clears the inner ring",
                "from memory: catalogue abutment diameters lie between the ring lands");
        out.put(LIP_THICKNESS, Quanta.up(STRUCTURAL_WALL_MM, layer), "1.2 mm raised to whole layers", PRINT_RULES);
        if (BearingRule.isMetal(in)) {
            out.put(JOURNAL_DIAMETER, d, "the metal shaft fits the bearing bore", "spec");
        } else {
            out.put(JOURNAL_DIAMETER, d - in.get(OUTER_COMPENSATION),
                    "bearing bore − outer compensation: line-to-line on the printed journal",
                    "printer profile (outer compensation); printed surfaces seat as a light press (common practice)");
        }
    }
}
