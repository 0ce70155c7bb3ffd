package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;

import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/**
 * GEO-AXIAL-STACK: printed disc and spacer thickness in whole layers, the disc-pack height, the end play
 * between the outer discs and the covers, and the chamber depth that holds them.
 */
public final class AxialStackRule extends GeoRule {

    /** Smallest end play on each side (common practice: room for a warped outer disc). */
    static final double MIN_END_PLAY_MM = 0.5;

    public AxialStackRule() {
        super("GEO-AXIAL-STACK",
                List.of(ROTOR_DISCS, ROTOR_DISC_THICKNESS, ROTOR_GAP, NOZZLE_DIAMETER, LAYER_HEIGHT),
                List.of(DISC_PRINTED_THICKNESS, SPACER_THICKNESS, PACK_HEIGHT, END_PLAY, CHAMBER_DEPTH));
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        double layer = in.get(LAYER_HEIGHT);
        int discs = (int) Math.round(in.get(ROTOR_DISCS));
        double t = Quanta.nearest(in.get(ROTOR_DISC_THICKNESS), layer);
        double g = Quanta.nearest(in.get(ROTOR_GAP), layer);
        out.put(DISC_PRINTED_THICKNESS, t, "disc thickness rounded to the nearest whole layer (at least one)",
                "printer quantisation: heights in whole layers (DESIGN.md §2)");
        out.put(SPACER_THICKNESS, g, "gap rounded to the nearest whole layer (at least one)",
                "printer quantisation: heights in whole layers (DESIGN.md §2)");
        double pack = discs * t + (discs - 1) * g;
        out.put(PACK_HEIGHT, pack, "discs × disc thickness + (discs − 1) × spacer thickness", "geometry");
        double e = Quanta.up(Math.max(Math.max(g, 2 * in.get(NOZZLE_DIAMETER)), MIN_END_PLAY_MM), layer);
        out.put(END_PLAY, e, "max(gap, 2 × nozzle diameter, 0.5 mm) raised to whole layers, each side",
                "common practice: end gaps about one disc gap, never less than a warped disc needs");
        out.put(CHAMBER_DEPTH, pack + 2 * e, "pack height + 2 × end play", "geometry");
    }
}
