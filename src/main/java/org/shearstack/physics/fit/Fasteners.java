package org.shearstack.physics.fit;

import java.util.Map;

/**
 * Holes and pockets for ISO metric screws (standards.md §3): ISO 273 clearance holes, ISO 4032 nut sizes for
 * captive-nut pockets, and heat-set insert pilots (no standard: vendor charts, common practice).
 */
public final class Fasteners {

    /** ISO 273 clearance-hole series: fine (H12), medium (H13), coarse (H14). */
    public enum Series { FINE, MEDIUM, COARSE }

    // ISO 273 fine / medium / coarse, mm. Sources: engineeringhardware.com ISO 273 table (EH273),
    // cq_warehouse clearance_hole_sizes.csv (CQW).
    private static final Map<String, double[]> ISO_273 = Map.of(
            "M2", new double[] {2.2, 2.4, 2.6},
            "M2.5", new double[] {2.7, 2.9, 3.1},
            "M3", new double[] {3.2, 3.4, 3.6},
            "M4", new double[] {4.3, 4.5, 4.8},
            "M5", new double[] {5.3, 5.5, 5.8},
            "M6", new double[] {6.4, 6.6, 7.0},
            "M8", new double[] {8.4, 9.0, 10.0});

    // ISO 4032 style-1 hex nuts: s max (across flats), e min (across corners), m max (height), mm.
    // Source: omdl iso_4032.scad (OMDL); s and m also cq_warehouse hex_nut_parameters.csv (CQW).
    private static final Map<String, double[]> ISO_4032 = Map.of(
            "M2", new double[] {4.0, 4.32, 1.6},
            "M2.5", new double[] {5.0, 5.45, 2.0},
            "M3", new double[] {5.5, 6.01, 2.4},
            "M4", new double[] {7.0, 7.66, 3.2},
            "M5", new double[] {8.0, 8.79, 4.7},
            "M6", new double[] {10.0, 11.05, 5.2},
            "M8", new double[] {13.0, 14.38, 6.8});

    // Heat-set insert pilot hole, mm: creative3dp chart and accu.co.uk pilot chart (HSI), common practice.
    private static final Map<String, Double> INSERT_PILOT = Map.of(
            "M2", 3.2, "M2.5", 3.6, "M3", 4.0, "M4", 5.6, "M5", 6.4);

    private Fasteners() {
    }

    /** ISO 273 clearance-hole diameter. */
    public static double clearanceHoleMm(String thread, Series series) {
        return row(ISO_273, thread, "ISO 273 clearance hole")[series.ordinal()];
    }

    /** ISO 4032 nut width across flats, maximum. */
    public static double nutAcrossFlatsMaxMm(String thread) {
        return row(ISO_4032, thread, "ISO 4032 nut")[0];
    }

    /** ISO 4032 nut width across corners, minimum. */
    public static double nutAcrossCornersMinMm(String thread) {
        return row(ISO_4032, thread, "ISO 4032 nut")[1];
    }

    /** ISO 4032 nut height, maximum. */
    public static double nutHeightMaxMm(String thread) {
        return row(ISO_4032, thread, "ISO 4032 nut")[2];
    }

    /** Heat-set insert pilot-hole diameter (vendor charts; common practice). */
    public static double insertPilotMm(String thread) {
        Double v = INSERT_PILOT.get(thread);
        if (v == null) {
            throw new IllegalArgumentException("heat-set insert pilot: no value for '" + thread + "'; known "
                    + new java.util.TreeSet<>(INSERT_PILOT.keySet()));
        }
        return v;
    }

    /**
     * A hexagonal captive-nut pocket: the across-flats size to model so that a nut of maximum size drops in
     * with the given printed clearance after the printer's hole compensation.
     */
    public static double nutPocketAcrossFlatsCadMm(String thread, double clearanceMm, PrintProcess process) {
        return process.cadHoleMm(nutAcrossFlatsMaxMm(thread) + clearanceMm);
    }

    private static double[] row(Map<String, double[]> table, String thread, String what) {
        double[] r = table.get(thread);
        if (r == null) {
            throw new IllegalArgumentException(what + ": no value for '" + thread + "'; known "
                    + new java.util.TreeSet<>(table.keySet()));
        }
        return r;
    }
}
