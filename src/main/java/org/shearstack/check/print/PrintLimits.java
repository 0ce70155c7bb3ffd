package org.shearstack.check.print;

import org.shearstack.check.DesignValues;

/**
 * What a printer can make, for the printability checks (mm, degrees). Defaults follow standards.md §7
 * (common practice): minimum wall two line widths, overhang 45° from vertical, bridges 10 mm.
 *
 * @param nozzleMm              nozzle diameter: features narrower than this cannot print
 * @param lineWidthMm           extrusion width: walls under two of these are weak
 * @param layerHeightMm         layer height
 * @param minGapMm              narrowest gap that stays open
 * @param maxOverhangDeg        steepest overhang from vertical printed without support
 * @param maxBridgeMm           longest unsupported span
 * @param minFirstLayerAreaMm2  smallest bed contact that holds a part (engineering judgement)
 */
public record PrintLimits(double nozzleMm, double lineWidthMm, double layerHeightMm, double minGapMm,
        double maxOverhangDeg, double maxBridgeMm, double minFirstLayerAreaMm2) {

    /** 25 mm² of bed contact: engineering judgement, about a 5 × 5 mm footprint. */
    public static final double DEFAULT_MIN_FIRST_LAYER_AREA_MM2 = 25;

    public PrintLimits {
        if (!(nozzleMm > 0 && lineWidthMm > 0 && layerHeightMm > 0 && minGapMm >= 0 && maxOverhangDeg > 0
                && maxOverhangDeg < 90 && maxBridgeMm > 0 && minFirstLayerAreaMm2 >= 0)) {
            throw new IllegalArgumentException("print limits out of range: " + this);
        }
    }

    /** A 0.4 mm nozzle printer (standards.md §8 R2–R5: line width 0.45, layer 0.2, overhang 45°, bridge 10 mm). */
    public static PrintLimits generic04() {
        return new PrintLimits(0.4, 0.45, 0.2, 0.3, 45, 10, DEFAULT_MIN_FIRST_LAYER_AREA_MM2);
    }

    /** From a design's printer keys, falling back to {@link #generic04()} value by value. */
    public static PrintLimits of(DesignValues v) {
        PrintLimits d = generic04();
        return new PrintLimits(or(v.optional("printer.nozzle-diameter"), d.nozzleMm()),
                or(v.optional("printer.line-width"), d.lineWidthMm()),
                or(v.optional("printer.layer-height"), d.layerHeightMm()),
                or(v.optional("printer.min-clearance"), d.minGapMm()),
                or(v.optional("printer.max-overhang"), d.maxOverhangDeg()),
                or(v.optional("printer.max-bridge"), d.maxBridgeMm()), DEFAULT_MIN_FIRST_LAYER_AREA_MM2);
    }

    private static double or(double v, double fallback) {
        return Double.isNaN(v) ? fallback : v;
    }

    /** Two line widths: the thinnest wall worth printing. */
    public double minWallMm() {
        return 2 * lineWidthMm;
    }

    /** Sideways step one layer may take over the layer below and still be carried. */
    public double carriedStepMm() {
        return layerHeightMm * Math.tan(Math.toRadians(maxOverhangDeg)) + lineWidthMm / 2;
    }
}
