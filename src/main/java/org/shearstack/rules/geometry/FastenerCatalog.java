package org.shearstack.rules.geometry;

import java.util.List;
import java.util.Optional;

/**
 * Metric screws, nuts and heat-set inserts, restated from the reference sheet standards.md §3:
 * ISO 273 clearance holes (fine / medium / coarse), ISO 4762 socket head cap screws (knurled head dk max,
 * head height k), ISO 4032 hex nuts (s max, m max), tap drills (D − P, 75 % thread; cq_warehouse and the
 * NightShade chart) and heat-set insert pilots (vendor charts, common practice).
 * Insert lengths are from memory (pocket depth ≈ insert length + 0.5 mm, standards.md §3.4).
 */
public final class FastenerCatalog {

    /** One metric size; all lengths in mm. */
    public record Fastener(String size, double nominalMm, double pitchMm, double clearanceFineMm,
            double clearanceMediumMm, double clearanceCoarseMm, double headDiameterMm, double headHeightMm,
            double nutAcrossFlatsMm, double nutThicknessMm, double tapDrillMm, double insertPilotMm,
            double insertLengthMm) {
    }

    private static final List<Fastener> ALL = List.of(
            new Fastener("M2", 2, 0.4, 2.2, 2.4, 2.6, 3.98, 2, 4.0, 1.6, 1.6, 3.2, 3.0),
            new Fastener("M2.5", 2.5, 0.45, 2.7, 2.9, 3.1, 4.68, 2.5, 5.0, 2.0, 2.05, 3.6, 4.0),
            new Fastener("M3", 3, 0.5, 3.2, 3.4, 3.6, 5.68, 3, 5.5, 2.4, 2.5, 4.0, 4.0),
            new Fastener("M4", 4, 0.7, 4.3, 4.5, 4.8, 7.22, 4, 7.0, 3.2, 3.3, 5.6, 5.5),
            new Fastener("M5", 5, 0.8, 5.3, 5.5, 5.8, 8.72, 5, 8.0, 4.7, 4.2, 6.4, 6.5),
            new Fastener("M6", 6, 1.0, 6.4, 6.6, 7.0, 10.22, 6, 10.0, 5.2, 5.0, 7.5, 7.5),
            new Fastener("M8", 8, 1.25, 8.4, 9.0, 10.0, 13.27, 8, 13.0, 6.8, 6.8, 10.0, 9.5));

    /**
     * Preferred lengths of ISO 4762 socket head cap screws in mm (from memory: the length column of the
     * ISO 4762 table; not every length exists for every diameter).
     */
    public static final List<Double> STANDARD_LENGTHS_MM = List.of(3.0, 4.0, 5.0, 6.0, 8.0, 10.0, 12.0, 16.0,
            20.0, 25.0, 30.0, 35.0, 40.0, 45.0, 50.0, 55.0, 60.0, 65.0, 70.0, 80.0, 90.0, 100.0, 110.0, 120.0,
            130.0, 140.0, 150.0, 160.0, 180.0, 200.0);

    private FastenerCatalog() {
    }

    public static List<Fastener> all() {
        return ALL;
    }

    public static Optional<Fastener> bySize(String size) {
        return ALL.stream().filter(f -> f.size().equalsIgnoreCase(size.trim())).findFirst();
    }

    /** The longest standard length not above {@code maxMm}, if any. */
    public static Optional<Double> standardLengthAtMost(double maxMm) {
        return STANDARD_LENGTHS_MM.stream().filter(l -> l <= maxMm + 1e-9).reduce((a, b) -> b);
    }
}
