package org.shearstack.rules.geometry;

import java.util.List;
import java.util.Optional;

/**
 * Inlet ports: thread, tap-drill pilot, usable thread depth and the flat spot face a fitting's sealing
 * washer needs. Tap drills from standards.md §5 (ISO 228-1 G via MEPB/BSP/EH228; M5 = D − P).
 * Thread depths and spot faces are common practice (judgement in standards.md §5.3), not a standard.
 */
public final class PortCatalog {

    /** One port thread (mm). */
    public record Port(String thread, double majorMm, double tapDrillMm, double threadDepthMm, double spotFaceMm) {
    }

    private static final List<Port> ALL = List.of(
            new Port("M5", 5.0, 4.2, 5.0, 10.0),
            new Port("G1/8", 9.728, 8.8, 7.0, 14.0),
            new Port("G1/4", 13.157, 11.8, 9.0, 18.0));

    private PortCatalog() {
    }

    public static Optional<Port> byThread(String thread) {
        return ALL.stream().filter(p -> p.thread().equalsIgnoreCase(thread.trim())).findFirst();
    }

    /**
     * The thread of a push-in fitting for a tube of this outside diameter: M5 up to 4 mm, G1/8 up to 6 mm,
     * G1/4 above (common practice for pneumatic push-in fittings).
     */
    public static Port forPushInTube(double tubeOutsideMm) {
        String t = tubeOutsideMm <= 4 ? "M5" : tubeOutsideMm <= 6 ? "G1/8" : "G1/4";
        return byThread(t).orElseThrow();
    }
}
