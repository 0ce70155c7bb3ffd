package org.shearstack.io.family;

import java.util.Objects;

/**
 * A key the family varies, as the table shows it.
 *
 * @param key   the spec key ("rotor.diameter")
 * @param unit  the unit its numbers are shown in ("mm", "bar(g)"), or "" when its values are words
 */
public record VariedKey(String key, String unit) {
    public VariedKey {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(unit, "unit");
    }

    /** True when the values are numbers that can stand on a plot axis. */
    public boolean numeric() {
        return !unit.isEmpty();
    }

    /** "rotor.diameter (mm)" or "filament". */
    public String axisLabel() {
        return numeric() ? key + " (" + unit + ")" : key;
    }
}
