package org.shearstack.view;

import java.util.List;

/** Colours for parts that arrive without one: well apart in hue, readable on the light background. */
final class Palette {

    private static final List<Rgb> COLOURS = List.of(
            Rgb.parse("#2f6db5"), Rgb.parse("#e0a526"), Rgb.parse("#c8412f"), Rgb.parse("#3f9e5a"),
            Rgb.parse("#8a4fb8"), Rgb.parse("#1f9fa8"), Rgb.parse("#d0668f"), Rgb.parse("#7a8a2e"));

    private Palette() {
    }

    static Rgb colour(int index) {
        return COLOURS.get(Math.floorMod(index, COLOURS.size()));
    }

    /** Parses #RRGGBB or #RRGGBBAA (alpha ignored); the palette colour when absent or unreadable. */
    static Rgb parseOr(String hex, int index) {
        if (hex == null || (hex.length() != 7 && hex.length() != 9)) {
            return colour(index);
        }
        try {
            return Rgb.parse(hex.substring(0, 7));
        } catch (IllegalArgumentException e) {
            return colour(index);
        }
    }
}
