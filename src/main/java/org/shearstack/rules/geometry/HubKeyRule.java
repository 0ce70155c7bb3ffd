package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;

import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/**
 * GEO-HUB-KEY: the hexagon that drives the discs (on the printed shaft or on a printed sleeve over a metal
 * shaft), the keyed disc bore with a sliding clearance, the hollow shaft's bore and the D-flat of the ends.
 */
public final class HubKeyRule extends GeoRule {

    public HubKeyRule() {
        super("GEO-HUB-KEY",
                List.of(BEARING_BORE, LINE_WIDTH, HOLE_COMPENSATION, ROTOR_SHAFT, ROTOR_SHAFT_DIAMETER),
                List.of(HEX_ACROSS_FLATS, DISC_BORE_ACROSS_FLATS, SHAFT_BORE, HUB_SLEEVE_BORE, SHAFT_FLAT_DEPTH));
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        double d = in.get(BEARING_BORE);
        double lw = in.get(LINE_WIDTH);
        double hc = in.get(HOLE_COMPENSATION);
        double wall = Quanta.up(STRUCTURAL_WALL_MM, lw);
        double hex;
        if (BearingRule.isMetal(in)) {
            double sleeveBore = d + hc - LIGHT_PRESS_MM;
            out.put(HUB_SLEEVE_BORE, sleeveBore, "shaft diameter + hole compensation − 0.05 mm light press",
                    "printer profile; light press: common practice (standards.md §7)");
            hex = Quanta.upToMultiple(sleeveBore + 2 * wall, 0.1);
            out.put(HEX_ACROSS_FLATS, hex,
                    "sleeve bore + 2 × structural wall (whole line widths), up to 0.1 mm", PRINT_RULES);
            out.put(SHAFT_BORE, 0, "a metal shaft is solid", "spec");
        } else {
            out.put(HUB_SLEEVE_BORE, 0, "no sleeve: the printed shaft carries the hexagon", "spec");
            hex = Quanta.upToMultiple(d + 2 * Math.max(1.0, 2 * lw), 0.1);
            out.put(HEX_ACROSS_FLATS, hex,
                    "journal + 2 × max(1 mm, 2 line widths), up to 0.1 mm: the hexagon's ends are shoulders",
                    PRINT_RULES);
            double shaftWall = Quanta.up(Math.max(STRUCTURAL_WALL_MM, d / 4), lw);
            double bore = d - 2 * shaftWall;
            out.put(SHAFT_BORE, bore >= 2 ? bore : 0,
                    "journal − 2 × max(1.2 mm, d/4) in whole line widths; solid when under 2 mm",
                    "common practice: hollow printed shafts; holes under 2 mm do not print (standards.md §7)");
        }
        double across = hex + hc + SLIDE_CLEARANCE_MM;
        out.put(DISC_BORE_ACROSS_FLATS, across, "hexagon across flats + hole compensation + 0.2 mm slide",
                "printer profile; sliding fit 0.15–0.3 mm: common practice (standards.md §7)");
        out.put(SHAFT_FLAT_DEPTH, Quanta.upToMultiple(0.1 * d, 0.05), "10 % of the journal, up to 0.05 mm",
                PRACTICE + ": D-flat for set screws and keyed hubs");
    }
}
