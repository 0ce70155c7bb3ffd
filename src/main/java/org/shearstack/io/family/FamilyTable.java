package org.shearstack.io.family;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * The comparison table of a family: what was varied and one row per variant, sorted by the variant's position in
 * the family (never by completion order), every variant present, failed or not.
 *
 * @param name        the family's (base spec's) name
 * @param sourceFile  the base spec as the user named it
 * @param keys        the varied keys in the order given
 * @param zip         true when the lists were zipped, false for their product
 * @param checkOnly   true when no meshes were made
 * @param rows        one row per variant
 */
public record FamilyTable(String name, String sourceFile, List<VariedKey> keys, boolean zip, boolean checkOnly,
        List<FamilyRow> rows) {

    public FamilyTable {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(sourceFile, "sourceFile");
        keys = List.copyOf(keys);
        List<FamilyRow> sorted = new ArrayList<>(rows);
        sorted.sort(Comparator.comparingInt(FamilyRow::index));
        rows = List.copyOf(sorted);
        for (FamilyRow r : rows) {
            if (r.values().size() != keys.size()) {
                throw new IllegalArgumentException("row " + r.name() + " has " + r.values().size() + " values for "
                        + keys.size() + " keys");
            }
        }
    }

    /** Rows with this status. */
    public long count(Status s) {
        return rows.stream().filter(r -> r.status() == s).count();
    }

    /** Rows that failed (a FAIL check, bad input or an error). */
    public long failures() {
        return rows.stream().filter(r -> r.status().failed()).count();
    }
}
