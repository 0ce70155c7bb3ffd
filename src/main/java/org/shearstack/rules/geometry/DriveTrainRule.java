package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;

import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;
import org.shearstack.profile.Fastener;
import org.shearstack.profile.FastenerTable;

/**
 * GEO-DRIVE-TRAIN: the Oldham coupling (three pieces: two hubs with tongues and a centre disc with crossed
 * slots, a published mechanism), the generator bracket (a cup for the motor body on a windowed stand-off
 * whose flange takes the housing screws), the speed-sensor target and the shaft ends that carry them.
 * Without a generator in the spec the coupling and bracket dimensions are zero and the drive end is a stub.
 */
public final class DriveTrainRule extends GeoRule {

    /** Axial running gap between coupling pieces and to fixed parts (common practice). */
    static final double AXIAL_GAP_MM = 0.5;

    private final FastenerTable table;

    public DriveTrainRule(FastenerTable table) {
        super("GEO-DRIVE-TRAIN", List.of(JOURNAL_DIAMETER, HOLE_COMPENSATION, LINE_WIDTH, LAYER_HEIGHT,
                        COVER_EXHAUST_INNER, GENERATOR_BODY_DIAMETER, GENERATOR_BODY_LENGTH, GENERATOR_SHAFT_DIAMETER,
                        GENERATOR_MOUNT_SCREWS, GENERATOR_MOUNT_SPACING),
                List.of(COUPLING_DIAMETER, COUPLING_HUB_THICKNESS, COUPLING_TONGUE_HEIGHT, COUPLING_TONGUE_WIDTH,
                        COUPLING_DISC_THICKNESS, COUPLING_TURBINE_BORE, COUPLING_GENERATOR_BORE, COUPLING_CLEARANCE,
                        BRACKET_STANDOFF, BRACKET_SEAT_DIAMETER, BRACKET_WALL, BRACKET_PLATE, BRACKET_CUP_HEIGHT,
                        BRACKET_SCREW_HOLE, BRACKET_CENTRE_HOLE, BRACKET_SCREW_LENGTH, BRACKET_COUNTERSINK,
                        COUPLING_GENERATOR_HUB_DIAMETER, TARGET_DIAMETER,
                        TARGET_THICKNESS, STUB_LENGTH, DRIVE_LENGTH));
        this.table = table;
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        double d = in.get(JOURNAL_DIAMETER);
        double hc = in.get(HOLE_COMPENSATION);
        double lw = in.get(LINE_WIDTH);
        double layer = in.get(LAYER_HEIGHT);
        double wall = Quanta.up(STRUCTURAL_WALL_MM, lw);

        double targetT = Quanta.up(1.6, layer);
        out.put(TARGET_DIAMETER, Math.min(Math.max(20, 2.5 * d), in.get(COVER_EXHAUST_INNER)),
                "max(20 mm, 2.5 × journal), inside the cover's exhaust openings", PRACTICE);
        out.put(TARGET_THICKNESS, targetT, "1.6 mm raised to whole layers", PRACTICE);
        out.put(STUB_LENGTH, 2 * AXIAL_GAP_MM + targetT, "running gap + target thickness + 0.5 mm", "geometry");

        boolean generator = in.has(GENERATOR_BODY_DIAMETER);
        if (!generator) {
            String none = "no generator in the spec";
            for (var k : List.of(COUPLING_DIAMETER, COUPLING_HUB_THICKNESS, COUPLING_TONGUE_HEIGHT,
                    COUPLING_TONGUE_WIDTH, COUPLING_DISC_THICKNESS, COUPLING_TURBINE_BORE, COUPLING_GENERATOR_BORE,
                    COUPLING_CLEARANCE, BRACKET_STANDOFF, BRACKET_SEAT_DIAMETER, BRACKET_WALL, BRACKET_PLATE,
                    BRACKET_CUP_HEIGHT, BRACKET_SCREW_HOLE, BRACKET_CENTRE_HOLE, BRACKET_SCREW_LENGTH, BRACKET_COUNTERSINK,
                    COUPLING_GENERATOR_HUB_DIAMETER)) {
                out.put(k, 0, none, "spec");
            }
            out.put(DRIVE_LENGTH, Quanta.up(2 * d, layer), "2 × journal: a bare drive stub", PRACTICE);
            return;
        }
        double genShaft = in.get(GENERATOR_SHAFT_DIAMETER);
        double od = Quanta.upToMultiple(Math.max(Math.max(2.5 * d, 4 * genShaft), d + 4 * wall + 4), 1.0);
        double hub = Quanta.up(Math.max(6.0, d), layer);
        double tongue = Quanta.up(Math.max(2.0, 0.15 * od), layer);
        double web = Quanta.up(2.0, layer);
        double slotDepth = tongue + AXIAL_GAP_MM;
        double disc = 2 * slotDepth + web;
        String src = "Oldham coupling proportions: " + PRACTICE;
        out.put(COUPLING_DIAMETER, od, "max(2.5 × journal, 4 × motor shaft, journal + 4 walls + 4 mm), up to 1 mm", src);
        out.put(COUPLING_HUB_THICKNESS, hub, "max(6 mm, journal) in whole layers", src);
        out.put(COUPLING_TONGUE_HEIGHT, tongue, "max(2 mm, 15 % of diameter) in whole layers", src);
        out.put(COUPLING_TONGUE_WIDTH, Quanta.up(0.3 * od, lw), "30 % of diameter in whole line widths", src);
        out.put(COUPLING_DISC_THICKNESS, disc, "2 × (tongue + 0.5 mm gap) + 2 mm web", src);
        out.put(COUPLING_CLEARANCE, SLIDE_CLEARANCE_MM + hc, "0.2 mm slide + hole compensation on slot width",
                PRINT_RULES);
        out.put(COUPLING_TURBINE_BORE, d + hc + 0.1, "journal + hole compensation + 0.1 mm", PRINT_RULES);
        out.put(COUPLING_GENERATOR_BORE, genShaft + hc - LIGHT_PRESS_MM,
                "motor shaft + hole compensation − 0.05 mm light press", PRINT_RULES);
        out.put(DRIVE_LENGTH, AXIAL_GAP_MM * 2 + hub, "gap + coupling hub thickness + 0.5 mm", "geometry");

        double bracketWall = Quanta.up(Math.max(1.6, 4 * lw), lw);
        double plate = Quanta.up(3.0, layer);
        Fastener screw = FastenerRule.size(table, in, GENERATOR_MOUNT_SCREWS, "M2.5");
        double screwHole = screw.clearanceMediumMm() + hc;
        double spacing = in.get(GENERATOR_MOUNT_SPACING);
        double body = in.get(GENERATOR_BODY_DIAMETER);
        out.put(BRACKET_STANDOFF, 2 * hub + disc + 4 * AXIAL_GAP_MM,
                "two coupling hubs + centre disc + four 0.5 mm running gaps", "geometry");
        out.put(BRACKET_SEAT_DIAMETER, body + hc + 0.3, "motor body + hole compensation + 0.3 mm", PRINT_RULES);
        out.put(BRACKET_WALL, bracketWall, "max(1.6 mm, 4 line widths) in whole lines", PRINT_RULES);
        out.put(BRACKET_PLATE, plate, "3 mm in whole layers (also the flange)", PRACTICE);
        out.put(BRACKET_CUP_HEIGHT, Quanta.up(0.4 * in.get(GENERATOR_BODY_LENGTH), layer),
                "40 % of the motor body length in whole layers", PRACTICE);
        out.put(BRACKET_SCREW_HOLE, screwHole, "ISO 273 medium clearance of the motor screws + hole compensation",
                "ISO 273 (standards.md §3.1)");
        double centre = Math.max(Math.min(Math.max(genShaft + 3, 0.25 * body), spacing - screwHole - 2 * bracketWall) + hc,
                genShaft + hc + 1.0);
        out.put(BRACKET_CENTRE_HOLE, centre,
                "max(motor shaft + 3 mm, 25 % of body) within the screw spacing, + hole compensation", PRACTICE);
        // The plate's underside is a 45° cone down to the centre hole (the bracket prints flange down, so the
        // plate would otherwise bridge the stand-off tube). The motor screws come up through the cone with
        // countersunk heads in 45° seats, and the generator's coupling hub turns inside those heads.
        double sink = COUNTERSUNK_HEAD_PER_DIAMETER * screw.nominalMm() + hc;
        out.put(BRACKET_COUNTERSINK, sink, "2 × screw diameter (countersunk head, 90°) + hole compensation",
                "from memory: ISO 7046-1 / ISO 10642 countersunk heads are about twice the thread diameter");
        double coneEnd = centre / 2 + layer;
        double headTop = Math.max(spacing / 2 + sink / 2 - coneEnd, (sink - screwHole) / 2 + layer);
        out.put(BRACKET_SCREW_LENGTH, FastenerRule.standardLengthAtMost(table, headTop + plate + 2 * screw.nominalMm()),
                "longest standard length ≤ countersink depth below the plate + plate + 2 × screw diameter",
                table.lengthsSource() + "; " + PRACTICE);
        double hubMax = Math.min(spacing / 2 - sink / 2 - AXIAL_GAP_MM, coneEnd);
        double hubDia = Math.min(od, Math.max(2 * hubMax, genShaft + hc + 4 * lw));
        out.put(COUPLING_GENERATOR_HUB_DIAMETER, hubDia,
                "2 × min(screw circle radius − countersink radius − 0.5 mm, cone end), at least bore + 4 lines",
                "geometry; " + PRACTICE);
    }

    /** Countersunk head diameter per thread diameter (from memory: ISO 7046-1, ISO 10642, about 2). */
    static final double COUNTERSUNK_HEAD_PER_DIAMETER = 2.0;
}
