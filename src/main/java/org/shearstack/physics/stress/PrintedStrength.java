package org.shearstack.physics.stress;

/**
 * Design strength of a printed part from the filament's tensile strengths (physics.md §4.3).
 *
 * <p>In plane (loads along the layers, for example hoop and radial stress of a disc printed flat): the lower
 * bound of the printed-flat (XY) strength times {@link #IN_PLANE_PRINT_FACTOR}. Across layers (hub clamping,
 * bosses, anything pulling layers apart): the upright (Z) strength; when a profile has none, XY times
 * {@link #ACROSS_LAYER_FALLBACK_FACTOR}.
 */
public final class PrintedStrength {

    /**
     * Knock-down on the printed-flat strength for voids, seams and print-to-print scatter. Engineering judgement
     * suggested in physics.md §4.3 ("lower XY bound × 0.7 for discs"), from memory, not a published value.
     */
    public static final double IN_PLANE_PRINT_FACTOR = 0.7;

    /**
     * Z/XY ratio used when a filament gives no across-layer strength: the low end of the 50–70 % quoted for PLA
     * (kapycad layer-adhesion article, cited in physics.md §4.3); pages quoting 20–50 % exist.
     */
    public static final double ACROSS_LAYER_FALLBACK_FACTOR = 0.5;

    private PrintedStrength() {
    }

    /** Design strength for stress in the layer plane. */
    public static double inPlanePa(double tensileXyPa) {
        requirePositive(tensileXyPa);
        return tensileXyPa * IN_PLANE_PRINT_FACTOR;
    }

    /** Design strength for stress across layers; NaN or non-positive Z strength falls back to a fraction of XY. */
    public static double acrossLayersPa(double tensileXyPa, double tensileZPa) {
        requirePositive(tensileXyPa);
        if (tensileZPa > 0) {
            return Math.min(tensileZPa, tensileXyPa);
        }
        return tensileXyPa * ACROSS_LAYER_FALLBACK_FACTOR;
    }

    private static void requirePositive(double pa) {
        if (!(pa > 0)) {
            throw new IllegalArgumentException("tensile strength must be positive, found " + pa + " Pa");
        }
    }
}
