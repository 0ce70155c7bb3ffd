package org.shearstack.profile;

/**
 * One metric screw size with its holes, head, nut and insert, in mm. Sources: ISO 273 (clearance),
 * ISO 4762 (head: knurled dk max, k max, key), ISO 4032 (nut: s max, e min, m max), heat-set pilots common practice.
 */
public record Fastener(String size, double pitchMm, double clearanceFineMm, double clearanceMediumMm,
                       double clearanceCoarseMm, double headDiameterMm, double headHeightMm, double keyMm,
                       double nutFlatsMm, double nutCornersMm, double nutThicknessMm, double insertPilotMm,
                       double insertDepthMm, double tapDrillMm) {

    /** Nominal diameter from the size name ("M2.5" → 2.5). */
    public double nominalMm() {
        return Double.parseDouble(size.substring(1));
    }
}
