package org.shearstack.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The shipped hardware tables against the published tables they copy. */
class HardwareTest {

    private static final Hardware H = Profiles.shipped().hardware();

    @Test
    void bearingsFollowIso15() {
        Bearing b608 = H.bearings().find("608").orElseThrow();
        // ISO 15 dimension plan, 608: d 8, D 22, B 7, r_s min 0.3 (standards.md §1.2)
        assertEquals(8, b608.boreMm());
        assertEquals(22, b608.outerMm());
        assertEquals(7, b608.widthMm());
        assertEquals(0.3, b608.chamferMinMm());
        assertEquals(15, b608.meanDiameterMm()); // physics.md §7 check value: d_m = 15 mm (derived)
        Bearing b6204 = H.bearings().find("6204").orElseThrow(); // ISO 15: 20 × 47 × 14, r 1.0
        assertEquals(47, b6204.outerMm());
        assertEquals(14, b6204.widthMm());
        assertEquals(39, H.bearings().bearings().size());
    }

    @Test
    void ringTolerancesAreNormalClass() {
        // ISO 492 Normal class via NTN handbook table 5.1: bore over 18 to 30 mm: 0 / -10 µm
        BearingTolerance t = H.bearings().forBore(20).orElseThrow();
        assertEquals(-0.010, t.boreLowerMm(), 1e-12);
        // outside diameter over 30 to 50 mm: 0 / -11 µm (SKF "Tolerances and resultant fits", table 8)
        assertEquals(-0.011, H.bearings().forOuter(47).orElseThrow().outerLowerMm(), 1e-12);
        assertEquals(-0.008, H.bearings().forBore(8).orElseThrow().boreLowerMm(), 1e-12);
    }

    @Test
    void fastenersFollowIso273Iso4762Iso4032() {
        Fastener m3 = H.fasteners().find("M3").orElseThrow();
        assertEquals(3.2, m3.clearanceFineMm());   // ISO 273 fine series
        assertEquals(3.4, m3.clearanceMediumMm()); // ISO 273 medium series
        assertEquals(3.6, m3.clearanceCoarseMm()); // ISO 273 coarse series
        assertEquals(5.68, m3.headDiameterMm());   // ISO 4762 dk max (knurled head)
        assertEquals(3, m3.headHeightMm());        // ISO 4762 k max = d
        assertEquals(5.5, m3.nutFlatsMm());        // ISO 4032 s max
        assertEquals(2.4, m3.nutThicknessMm());    // ISO 4032 m max
        assertEquals(4.0, m3.insertPilotMm());     // heat-set pilot, common practice (vendor charts)
        assertEquals(0.5, m3.pitchMm());           // ISO 261 coarse pitch
        assertEquals(12, H.fasteners().lengthAtLeast(11.2).orElseThrow());
    }

    @Test
    void glandsGiveTheTablesSqueezeAndFill() {
        // orings.co.uk face groove for 2.62 mm: depth 2.00, width 3.80; standards.md §4.3 computes
        // squeeze 23.7 % and fill 70.9 % (derived, standards.md §4.3)
        Gland g = H.seals().find(2.62, 0.005).orElseThrow();
        assertEquals(0.237, g.squeeze(), 5e-4);
        assertEquals(0.709, g.fill(), 5e-4);
        for (Gland each : H.seals().glands()) {
            assertTrue(each.fill() < H.seals().fillMax(), "fill below the 90 % limit (Parker gland overfill)");
        }
    }

    @Test
    void portsFollowIso228() {
        Port g18 = H.ports().find("G1/8").orElseThrow();
        assertEquals(9.728, g18.threadMajorMm()); // ISO 228-1 G1/8 major diameter
        assertEquals(25.4 / 28, g18.pitchMm(), 5e-4); // 28 threads per inch
        assertEquals(6.1, H.ports().pushInPilotMm(6), 1e-12);
    }
}
