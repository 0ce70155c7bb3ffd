package org.shearstack.rules.geometry;

import java.util.List;
import java.util.Optional;

/**
 * Face (axial) O-ring grooves by cross-section: groove depth h and width b in mm, from the metric
 * axial-installation table of orings.co.uk "O-ring housing" as restated in standards.md §4.2
 * (depth tolerance +0.1, width +0.2).
 */
public final class GlandCatalog {

    /** One row: cord cross-section, groove depth and groove width (mm). */
    public record Gland(double crossSectionMm, double depthMm, double widthMm) {

        /** Nominal squeeze (CS − h) / CS. */
        public double squeeze() {
            return (crossSectionMm - depthMm) / crossSectionMm;
        }

        /** Nominal gland fill: cord area / groove area. */
        public double fill() {
            return Math.PI / 4 * crossSectionMm * crossSectionMm / (depthMm * widthMm);
        }
    }

    private static final List<Gland> ALL = List.of(
            new Gland(1.00, 0.70, 1.40),
            new Gland(1.50, 1.10, 2.10),
            new Gland(1.78, 1.30, 2.60),
            new Gland(1.80, 1.30, 2.60),
            new Gland(2.00, 1.50, 2.80),
            new Gland(2.50, 1.90, 3.40),
            new Gland(2.62, 2.00, 3.80),
            new Gland(2.65, 2.00, 3.80),
            new Gland(3.00, 2.30, 4.00),
            new Gland(3.53, 2.70, 5.00),
            new Gland(3.55, 2.70, 5.00),
            new Gland(5.33, 4.30, 7.30));

    private GlandCatalog() {
    }

    public static List<Gland> all() {
        return ALL;
    }

    /** The row for this cross-section (within 0.005 mm), if listed. */
    public static Optional<Gland> forCrossSection(double crossSectionMm) {
        return ALL.stream().filter(g -> Math.abs(g.crossSectionMm() - crossSectionMm) <= 0.005).findFirst();
    }
}
