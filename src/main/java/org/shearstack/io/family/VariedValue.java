package org.shearstack.io.family;

import java.util.Objects;

/**
 * One variant's value of one varied key.
 *
 * @param written  as the user wrote it, spaces removed ("60mm", "pla")
 * @param number   the value in its key's shown unit; NaN for words and "auto"
 */
public record VariedValue(String written, double number) {
    public VariedValue {
        Objects.requireNonNull(written, "written");
    }
}
