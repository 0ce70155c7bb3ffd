package org.shearstack.check.design;

import java.util.Map;

/** ISO 261 coarse pitches of the screw sizes the spec allows (standards.md §3.2 and §3.5). */
final class Screws {

    private static final Map<String, Double> PITCH = Map.of("M2", 0.4, "M2.5", 0.45, "M3", 0.5, "M4", 0.7, "M5", 0.8,
            "M6", 1.0, "M8", 1.25);

    private Screws() {
    }

    static double pitchMm(String size) {
        Double p = PITCH.get(size);
        return p == null ? Double.NaN : p;
    }

    static double diameterMm(String size) {
        try {
            return Double.parseDouble(size.substring(1));
        } catch (RuntimeException e) {
            return Double.NaN;
        }
    }
}
