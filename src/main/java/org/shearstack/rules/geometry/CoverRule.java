package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.ArrayList;
import java.util.List;

import org.shearstack.rules.Key;
import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/**
 * GEO-COVER: the end cover's thickness in whole layers: deep enough for the bearing pocket and its lip, the
 * inlet pilot below the seal groove, and the screw anchor, never under 3 mm; and thick enough to hold the full
 * supply pressure as a plate spanning the bolt circle ({@link ContainmentSizing#coverThicknessMm}).
 */
public final class CoverRule extends GeoRule {

    public CoverRule() {
        super("GEO-COVER", inputs(), List.of(COVER_THICKNESS));
    }

    private static List<Key> inputs() {
        List<Key> r = new ArrayList<>(List.of(SEAT_DEPTH, LIP_THICKNESS, PORT_PILOT_DEPTH, GROOVE_DEPTH,
                BOLT_ANCHOR_DEPTH, LAYER_HEIGHT, BOLT_CIRCLE, END_PLAY));
        r.addAll(ContainmentSizing.LOAD_KEYS);
        return r;
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        double floor = STRUCTURAL_WALL_MM;
        double t = Math.max(in.get(SEAT_DEPTH) + in.get(LIP_THICKNESS),
                Math.max(in.get(PORT_PILOT_DEPTH) + in.get(GROOVE_DEPTH) + floor,
                        Math.max(in.get(BOLT_ANCHOR_DEPTH) + floor, 3.0)));
        String formula = "max(seat depth + lip, inlet pilot + groove depth + 1.2 mm, anchor depth + 1.2 mm, 3 mm";
        String source = PRINT_RULES;
        if (ContainmentSizing.applies(in) && in.has(BOLT_CIRCLE)) {
            double plate = ContainmentSizing.coverThicknessMm(in, in.get(BOLT_CIRCLE),
                    in.has(END_PLAY) ? in.get(END_PLAY) : Double.NaN);
            t = Math.max(t, plate);
            formula += ", plate thickness " + mm(plate) + " for the full supply pressure: a simply supported plate"
                    + " spanning the bolt circle with bending stress 3(3 + ν) q a²/(8 t²) × safety factor within the"
                    + " printed in-plane strength, centre deflection (5 + ν) q a⁴/(64 (1 + ν) D) within the end play"
                    + " and within t/2";
            source += "; " + ContainmentSizing.PLATE_SOURCE;
        }
        out.put(COVER_THICKNESS, Quanta.up(t, in.get(LAYER_HEIGHT)), formula + ") in whole layers", source);
    }
}
