package org.shearstack.rules;

import static org.shearstack.spec.Dimension.LENGTH;

import java.util.List;

/**
 * PRN- rules: what the chosen printer means for every part. The effective hole and outer compensations
 * (profile value unless the spec's printer-adjust measures it), and the thinnest wall and floor worth
 * printing, quantised to whole line widths and layers.
 */
public final class PrinterRules {

    /** Effective diametral hole compensation: add this to a modelled hole's diameter. */
    public static final Key HOLE_COMPENSATION = Key.of("print.hole-compensation", LENGTH);
    /** Effective outer compensation: subtract this from a modelled outer diameter or width. */
    public static final Key OUTER_COMPENSATION = Key.of("print.outer-compensation", LENGTH);
    /** Thinnest wall, whole line widths. */
    public static final Key MIN_WALL = Key.of("print.min-wall", LENGTH);
    /** Thinnest floor or lid, whole layers. */
    public static final Key MIN_FLOOR = Key.of("print.min-floor", LENGTH);

    /** Walls need at least two perimeters (standards.md §7: "2 perimeters = 2 × line width absolute minimum"). */
    static final int MIN_WALL_LINES = 2;
    /** Floors need at least four layers to close over infill (common practice). */
    static final int MIN_FLOOR_LAYERS = 4;
    /** ... and at least 0.8 mm (common practice). */
    static final double MIN_FLOOR_MM = 0.8;

    private PrinterRules() {
    }

    public static List<Rule> rules() {
        return List.of(compensation("PRN-HOLE-COMPENSATION", ProfileKeys.HOLE_COMPENSATION,
                        SpecKeys.PRINTER_ADJUST_HOLE_COMPENSATION, HOLE_COMPENSATION, "holes"),
                compensation("PRN-OUTER-COMPENSATION", ProfileKeys.OUTER_COMPENSATION,
                        SpecKeys.PRINTER_ADJUST_OUTER_COMPENSATION, OUTER_COMPENSATION, "outer dimensions"),
                minWall(), minFloor());
    }

    private static Rule compensation(String id, Key profile, Key adjust, Key out, String what) {
        return FunctionRule.of(id, List.of(profile, adjust), List.of(out), (in, o) -> {
            if (in.has(adjust)) {
                o.put(out, in.get(adjust), "measured on the user's printer (printer-adjust) for " + what
                        + ", replaces the profile's " + in.get(profile) + " mm", "spec printer-adjust");
            } else {
                o.put(out, in.get(profile), "the printer profile's compensation for " + what,
                        "printer profile (measured or stated by its author)");
            }
        });
    }

    private static Rule minWall() {
        return FunctionRule.of("PRN-MIN-WALL", List.of(ProfileKeys.MIN_WALL, ProfileKeys.LINE_WIDTH), List.of(MIN_WALL),
                (in, o) -> {
                    Quantised q = Quantised.toLineWidths(in.get(ProfileKeys.MIN_WALL), in.get(ProfileKeys.LINE_WIDTH),
                            MIN_WALL_LINES);
                    o.put(MIN_WALL, q.valueMm(), "profile minimum wall " + q.words() + " (at least "
                            + MIN_WALL_LINES + " perimeters)", "standards.md §7: two perimeters minimum (common practice)");
                });
    }

    private static Rule minFloor() {
        return FunctionRule.of("PRN-MIN-FLOOR", List.of(ProfileKeys.LAYER_HEIGHT), List.of(MIN_FLOOR), (in, o) -> {
            Quantised q = Quantised.toLayers(MIN_FLOOR_MM, in.get(ProfileKeys.LAYER_HEIGHT), MIN_FLOOR_LAYERS);
            o.put(MIN_FLOOR, q.valueMm(), "at least " + MIN_FLOOR_MM + " mm and " + MIN_FLOOR_LAYERS + " layers: "
                    + q.words(), "common practice");
        });
    }
}
