package org.shearstack.rules.geometry;

import java.util.List;

import org.shearstack.rules.Key;
import org.shearstack.rules.Rule;

/** Common shape of the geometry rules: a fixed id and fixed lists of keys read and written. */
abstract class GeoRule implements Rule {

    /** Minimum structural wall, three perimeters (standards.md §7, RULES: 1.2 mm recommended). */
    static final double STRUCTURAL_WALL_MM = 1.2;
    /** Sliding fit on diameter between printed parts, the middle of 0.15–0.3 mm (standards.md §7, RULES). */
    static final double SLIDE_CLEARANCE_MM = 0.2;
    /** Light press of a bearing ring into or onto a printed part, within 0–0.1 mm (standards.md §7). */
    static final double LIGHT_PRESS_MM = 0.05;
    static final String PRACTICE = "common practice";
    static final String PRINT_RULES = "common practice (FFF design rules, standards.md §7)";

    private final String id;
    private final List<Key> reads;
    private final List<Key> writes;

    GeoRule(String id, List<Key> reads, List<Key> writes) {
        this.id = id;
        this.reads = List.copyOf(reads);
        this.writes = List.copyOf(writes);
    }

    @Override
    public final String id() {
        return id;
    }

    @Override
    public final List<Key> reads() {
        return reads;
    }

    @Override
    public final List<Key> writes() {
        return writes;
    }

    static String mm(double valueMm) {
        return String.format(java.util.Locale.ROOT, "%.3f mm", valueMm);
    }
}
