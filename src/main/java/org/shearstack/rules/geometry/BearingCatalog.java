package org.shearstack.rules.geometry;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Deep-groove ball bearings the geometry rules may choose from: ISO 15 boundary dimensions
 * (bore d, outside diameter D, width B, smallest ring chamfer r_s min), restated from the reference sheet
 * standards.md §1 (sources there: NTN CAT. 3015/E, the SKF data in cq_warehouse, DIN 625-1 via BOLTS).
 * Listed in order of preference for a given bore: the common 60/62/6xx series before the thin series.
 */
public final class BearingCatalog {

    /** One bearing's boundary dimensions in mm. */
    public record Bearing(String designation, double boreMm, double outsideMm, double widthMm, double chamferMm) {

        /** Mean diameter (d + D) / 2, used in the speed factor n·d_m. */
        public double meanDiameterMm() {
            return (boreMm + outsideMm) / 2;
        }
    }

    private static final List<Bearing> ALL = List.of(
            // miniature and small metric, standards.md §1.2
            new Bearing("623", 3, 10, 4, 0.15),
            new Bearing("624", 4, 13, 5, 0.2),
            new Bearing("625", 5, 16, 5, 0.3),
            new Bearing("695", 5, 13, 4, 0.2),
            new Bearing("626", 6, 19, 6, 0.3),
            new Bearing("696", 6, 15, 5, 0.2),
            new Bearing("627", 7, 22, 7, 0.3),
            new Bearing("697", 7, 17, 5, 0.3),
            new Bearing("608", 8, 22, 7, 0.3),
            new Bearing("628", 8, 24, 8, 0.3),
            new Bearing("698", 8, 19, 6, 0.3),
            new Bearing("688", 8, 16, 4, 0.2),
            new Bearing("609", 9, 24, 7, 0.3),
            new Bearing("629", 9, 26, 8, 0.3),
            new Bearing("689", 9, 17, 4, 0.2),
            // series 60, 62, 69, 68, standards.md §1.1
            new Bearing("6000", 10, 26, 8, 0.3),
            new Bearing("6200", 10, 30, 9, 0.6),
            new Bearing("6900", 10, 22, 6, 0.3),
            new Bearing("6800", 10, 19, 5, 0.3),
            new Bearing("6001", 12, 28, 8, 0.3),
            new Bearing("6201", 12, 32, 10, 0.6),
            new Bearing("6901", 12, 24, 6, 0.3),
            new Bearing("6801", 12, 21, 5, 0.3),
            new Bearing("6002", 15, 32, 9, 0.3),
            new Bearing("6202", 15, 35, 11, 0.6),
            new Bearing("6902", 15, 28, 7, 0.3),
            new Bearing("6802", 15, 24, 5, 0.3),
            new Bearing("6003", 17, 35, 10, 0.3),
            new Bearing("6203", 17, 40, 12, 0.6),
            new Bearing("6903", 17, 30, 7, 0.3),
            new Bearing("6803", 17, 26, 5, 0.3),
            new Bearing("6004", 20, 42, 12, 0.6),
            new Bearing("6204", 20, 47, 14, 1.0),
            new Bearing("6904", 20, 37, 9, 0.3),
            new Bearing("6804", 20, 32, 7, 0.3),
            new Bearing("6005", 25, 47, 12, 0.6),
            new Bearing("6205", 25, 52, 15, 1.0),
            new Bearing("6905", 25, 42, 9, 0.3),
            new Bearing("6805", 25, 37, 7, 0.3));

    private BearingCatalog() {
    }

    public static List<Bearing> all() {
        return ALL;
    }

    /** The bearing with this designation (case-insensitive; a 2RS/ZZ suffix is ignored), if listed. */
    public static Optional<Bearing> byDesignation(String designation) {
        String base = designation.trim().toUpperCase(Locale.ROOT).replaceAll("(-?2RS|-?2Z|-?ZZ|-?RS|-?Z)$", "");
        return ALL.stream().filter(b -> b.designation().equals(base)).findFirst();
    }

    /**
     * The preferred bearing for a journal of at least {@code minBoreMm}: the smallest listed bore that is
     * large enough, and among those the first in preference order whose speed factor n·d_m stays within
     * {@code speedFactorLimit} at {@code speedRpm} (or the one with the smallest d_m when none does; a
     * check rule then reports it). {@code speedRpm} ≤ 0 means the speed is unknown.
     */
    public static Optional<Bearing> choose(double minBoreMm, double speedRpm, double speedFactorLimit) {
        Optional<Double> bore = ALL.stream().map(Bearing::boreMm).filter(d -> d >= minBoreMm - 1e-9)
                .min(Double::compare);
        if (bore.isEmpty()) {
            return Optional.empty();
        }
        List<Bearing> same = ALL.stream().filter(b -> b.boreMm() == bore.get()).toList();
        if (speedRpm <= 0) {
            return Optional.of(same.get(0));
        }
        return same.stream().filter(b -> speedRpm * b.meanDiameterMm() <= speedFactorLimit).findFirst()
                .or(() -> same.stream().min((a, b) -> Double.compare(a.meanDiameterMm(), b.meanDiameterMm())));
    }
}
