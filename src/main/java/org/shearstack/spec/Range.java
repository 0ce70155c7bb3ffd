package org.shearstack.spec;

/**
 * An allowed interval for a canonical value, with the words a message uses for it.
 *
 * @param gauge when true the bounds apply to the value minus the ambient pressure
 * @param words e.g. "above 0 and at most 16 bar(g)"
 */
public record Range(double min, boolean minInclusive, double max, boolean maxInclusive, boolean gauge, String words) {

    public static Range any() {
        return new Range(Double.NEGATIVE_INFINITY, true, Double.POSITIVE_INFINITY, true, false, "any value");
    }

    /** (min, max] — above min and at most max. */
    public static Range aboveUpTo(double min, double max, String words) {
        return new Range(min, false, max, true, false, words);
    }

    /** [min, max]. */
    public static Range between(double min, double max, String words) {
        return new Range(min, true, max, true, false, words);
    }

    /** (0, max] of a gauge pressure. */
    public static Range gaugeAboveUpTo(double minPa, double maxPa, String words) {
        return new Range(minPa, false, maxPa, true, true, words);
    }

    public boolean contains(double canonical, double ambientPa) {
        double v = gauge ? canonical - ambientPa : canonical;
        boolean lowOk = minInclusive ? v >= min : v > min;
        boolean highOk = maxInclusive ? v <= max : v < max;
        return lowOk && highOk;
    }
}
