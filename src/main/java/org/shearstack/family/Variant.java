package org.shearstack.family;

import java.util.List;
import java.util.Objects;
import org.shearstack.io.family.VariedValue;
import org.shearstack.spec.SpecOverride;

/**
 * One member of a family.
 *
 * @param index        position in the family (0-based; product order: the first key varies slowest)
 * @param name         readable and deterministic ("rotor.diameter=60mm,filament=pla"), also the folder name
 * @param values       its value of each varied key, in the family's key order
 * @param assignments  the spec keys it sets, with where each value was written
 */
public record Variant(int index, String name, List<VariedValue> values, List<SpecOverride.Assignment> assignments) {
    public Variant {
        Objects.requireNonNull(name, "name");
        values = List.copyOf(values);
        assignments = List.copyOf(assignments);
    }
}
