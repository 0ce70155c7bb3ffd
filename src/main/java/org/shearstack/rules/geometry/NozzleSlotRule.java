package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;

import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/**
 * GEO-NOZZLE-SLOT: the nozzle is a slot across the disc-pack height from the plenum to the rotor rim;
 * its in-plane throat width follows from the throat area, its exit from the exit area when the sizing asks
 * for a converging–diverging nozzle.
 */
public final class NozzleSlotRule extends GeoRule {

    /** Jet angle to the rotor tangent when the spec and the sizing leave it open (common practice: 10–20°). */
    static final double DEFAULT_ANGLE_DEG = 15;

    public NozzleSlotRule() {
        super("GEO-NOZZLE-SLOT", List.of(NOZZLE_THROAT_AREA, NOZZLE_EXIT_AREA, NOZZLE_KIND, NOZZLE_JET_ANGLE,
                        PACK_HEIGHT, PLENUM_DIAMETER, HOLE_COMPENSATION),
                List.of(NOZZLE_HEIGHT, NOZZLE_THROAT_WIDTH, NOZZLE_EXIT_WIDTH, NOZZLE_INLET_WIDTH, NOZZLE_ANGLE,
                        NOZZLE_INSERT_FIT));
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        double h = in.get(PACK_HEIGHT);
        double throat = in.get(NOZZLE_THROAT_AREA) / h;
        out.put(NOZZLE_HEIGHT, h, "the disc-pack height: the jet covers every disc and gap", "geometry");
        out.put(NOZZLE_THROAT_WIDTH, throat, "throat area / slot height", "geometry");
        // converging–diverging whenever the flow sizing (SIZE-NOZZLE-EXIT) asks for an exit larger than the throat
        boolean cd = in.has(NOZZLE_EXIT_AREA) && in.get(NOZZLE_EXIT_AREA) > in.get(NOZZLE_THROAT_AREA) * (1 + 1e-9);
        if (cd) {
            out.put(NOZZLE_EXIT_WIDTH, Math.max(throat, in.get(NOZZLE_EXIT_AREA) / h), "exit area / slot height",
                    "geometry (exit area from the flow sizing)");
        } else {
            out.put(NOZZLE_EXIT_WIDTH, throat, "converging nozzle: the exit is the throat", "geometry");
        }
        double plenum = in.get(PLENUM_DIAMETER);
        out.put(NOZZLE_INLET_WIDTH, Math.min(plenum, Math.max(3 * throat, 2.0)),
                "min(plenum diameter, max(3 × throat width, 2 mm))", PRACTICE + ": a gently converging entry");
        if (in.has(NOZZLE_JET_ANGLE)) {
            out.put(NOZZLE_ANGLE, in.get(NOZZLE_JET_ANGLE), "the jet angle from the spec or the sizing", "spec");
        } else {
            out.put(NOZZLE_ANGLE, DEFAULT_ANGLE_DEG, "15° to the rotor tangent", PRACTICE + " (10–20°)");
        }
        out.put(NOZZLE_INSERT_FIT, (SLIDE_CLEARANCE_MM + in.get(HOLE_COMPENSATION)) / 2,
                "(0.2 mm slide + hole compensation) / 2, per side of the insert pocket", PRINT_RULES);
    }
}
