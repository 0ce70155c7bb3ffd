package org.shearstack.rules;

import java.util.Locale;
import org.shearstack.spec.QuantityFormat;

/**
 * A length rounded to whole printer steps (layers or line widths), with the words a derivation uses.
 *
 * @param valueMm   the rounded length
 * @param count     how many steps
 * @param stepMm    one step
 * @param requestedMm what was asked for before rounding
 * @param words     e.g. "0.7 mm rounded up to 3 layers of 0.25 mm = 0.75 mm"
 */
public record Quantised(double valueMm, int count, double stepMm, double requestedMm, String words) {

    /**
     * Rounds a thickness up to whole layers (never below {@code minLayers}).
     * The first layer is not treated specially: parts here rarely start at the bed with a critical height.
     */
    public static Quantised toLayers(double thicknessMm, double layerHeightMm, int minLayers) {
        return up(thicknessMm, layerHeightMm, minLayers, "layer", "layers");
    }

    /** Rounds a wall up to whole line widths (never below {@code minLines}). */
    public static Quantised toLineWidths(double wallMm, double lineWidthMm, int minLines) {
        return up(wallMm, lineWidthMm, minLines, "line width", "line widths");
    }

    /** Rounds to the nearest whole number of steps (at least minSteps), for values that may go either way. */
    public static Quantised nearestLayers(double thicknessMm, double layerHeightMm, int minLayers) {
        int n = Math.max(minLayers, (int) Math.round(thicknessMm / layerHeightMm));
        return make(thicknessMm, layerHeightMm, n, "rounded to", "layer", "layers");
    }

    private static Quantised up(double requested, double step, int min, String one, String many) {
        if (!(step > 0) || !Double.isFinite(requested)) {
            throw new IllegalArgumentException("step must be positive and the value finite, found step " + step
                    + " for " + requested);
        }
        // a tolerance of 1e-9 steps keeps 0.75 / 0.25 at exactly 3 despite binary fractions
        int n = Math.max(min, (int) Math.ceil(requested / step - 1e-9));
        return make(requested, step, n, "rounded up to", one, many);
    }

    private static Quantised make(double requested, double step, int n, String verb, String one, String many) {
        double value = n * step;
        String words = String.format(Locale.ROOT, "%s mm %s %d %s of %s mm = %s mm", QuantityFormat.number(requested),
                verb, n, n == 1 ? one : many, QuantityFormat.number(step), QuantityFormat.number(value));
        return new Quantised(value, n, step, requested, words);
    }
}
