package org.shearstack.spec;

/**
 * A stated default used when the spec leaves a key out and no rule derives it.
 *
 * @param path   key path
 * @param value  canonical value, or NaN for a text default
 * @param text   text default, or "" for a number
 * @param reason why this default, with its source
 */
public record SpecDefault(String path, Dimension dimension, double value, String text, String reason) {

    static SpecDefault number(String path, Dimension d, double value, String reason) {
        return new SpecDefault(path, d, value, "", reason);
    }

    static SpecDefault text(String path, String text, String reason) {
        return new SpecDefault(path, Dimension.TEXT, Double.NaN, text, reason);
    }

    public boolean isText() {
        return dimension == Dimension.TEXT;
    }
}
