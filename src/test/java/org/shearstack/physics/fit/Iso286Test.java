package org.shearstack.physics.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * ISO 286 check values T1–T12, T15 of standards.md §8 and the representative classes of §2.3. Sources: IT
 * values ISO 286-1 Table 1 as reproduced by RFT and BIG Daishowa; deviations as named per row.
 */
class Iso286Test {

    @Test
    void standardTolerances_T1_T3() {
        assertEquals(21, Iso286.standardToleranceMicrometres(7, 22)); // T1: RFT, BIG
        assertEquals(9, Iso286.standardToleranceMicrometres(6, 8)); // T2: RFT, BIG
        assertEquals(160, Iso286.standardToleranceMicrometres(11, 40)); // T3: RFT
    }

    @Test
    void rangeBoundariesAreUpToAndIncluding() {
        // ISO 286-1: ranges are "over ... up to and including"
        assertEquals(18, Iso286.standardToleranceMicrometres(7, 18));
        assertEquals(21, Iso286.standardToleranceMicrometres(7, 18.001));
        assertEquals(10, Iso286.standardToleranceMicrometres(7, 3));
    }

    @Test
    void h7At22_T4() {
        // T4 / standards.md §2.4: 22 H7 = 22.000 / 22.021 (ISO 286-2 table value; RFT test case 45 H7 = 0/+25)
        ToleranceZone z = Iso286.zone(22, "H7");
        assertEquals(22.000, z.minMm(), 5e-4);
        assertEquals(22.021, z.maxMm(), 5e-4);
        assertTrue(z.hole());
        ToleranceZone z45 = Iso286.zone(45, "H7");
        assertEquals(25, z45.upperMicrometres(), 0);
        assertEquals(0, z45.lowerMicrometres(), 0);
    }

    @ParameterizedTest(name = "{0} {1} = {2}/{3} µm ({4})")
    @CsvSource({
        "8, k5, 7, 1, T5 computed from RFT k ei + IT",
        "22, J7, 12, -9, T6 RFT J7 table",
        "40, K7, 7, -18, T7 Delta rule (RFT wrong here)",
        "25, g6, -7, -20, T8 COBAN + IT",
        "15, js6, 5.5, -5.5, T9 ±IT/2",
        "40, M6, -4, -20, T10 Delta rule",
        "5, G7, 16, 4, T11 mirror rule (RFT +14/+2 wrong)",
        "22, p6, 35, 22, T12 MD p ei + IT",
        "5, G6, 12, 4, standards.md §2.6 corrected RFT G6 3-6",
        "25, N7, -7, -28, standards.md §2.3 N7 18-30 (RFT lacks Delta)",
        "35, K6, 3, -13, standards.md §2.6 corrected K6 30-50",
        "2, K7, 0, -10, standards.md §2.3 K7 up to 3 mm (no Delta)",
        "60, P7, -21, -51, standards.md §2.3 P7 50-80",
        "12, f7, -16, -34, standards.md §2.3 f7 10-18",
        "22, j6, 9, -4, standards.md §2.3 j6 18-30",
        "22, JS7, 10.5, -10.5, standards.md §2.3 JS7 18-30",
        "40, m6, 25, 9, standards.md §2.3 m6 30-50",
        "8, n5, 16, 10, standards.md §2.3 n5 6-10",
        "70, H11, 190, 0, standards.md §2.3 H11 50-80 (SKF8 confirms H7-H10)",
        "17, M7, 0, -18, standards.md §2.3 M7 10-18",
        "12, k6, 12, 1, standards.md §2.3 k6 10-18",
        "20, k8, 33, 0, k above IT7: ei 0 (RFT TypeData)",
    })
    void limitDeviations(double nominal, String cls, double upper, double lower, String source) {
        ToleranceZone z = Iso286.zone(nominal, cls);
        assertEquals(upper, z.upperMicrometres(), 1e-9, source);
        assertEquals(lower, z.lowerMicrometres(), 1e-9, source);
    }

    @Test
    void bearingFitCrossCheck_T15() {
        // T15 (GBB table): 18–30 mm g6 against a class-0 bore 0/−10: max clearance 20, max interference 3 µm
        ToleranceZone bore = new ToleranceZone(25, "bore", true, 0, -10);
        Fit f = Fit.between(bore, Iso286.zone(25, "g6"));
        assertEquals(0.020, f.maxClearanceMm(), 1e-9);
        assertEquals(0.003, f.maxInterferenceMm(), 1e-9);
        assertEquals(Fit.Kind.TRANSITION, f.kind());
        // GBB j6 → 4 / 19; js6 → 6.5 / 16.5 (standards.md §2.3 cross-checks)
        Fit j6 = Fit.between(bore, Iso286.zone(25, "j6"));
        assertEquals(0.004, j6.maxClearanceMm(), 1e-9);
        assertEquals(0.019, j6.maxInterferenceMm(), 1e-9);
        Fit js6 = Fit.between(bore, Iso286.zone(25, "js6"));
        assertEquals(0.0065, js6.maxClearanceMm(), 1e-9);
        assertEquals(0.0165, js6.maxInterferenceMm(), 1e-9);
    }

    @Test
    void unsupportedClassesAreRefusedClearly() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Iso286.zone(22, "D9"));
        assertTrue(e.getMessage().contains("'D'"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Iso286.zone(22, "P8"));
        assertThrows(IllegalArgumentException.class, () -> Iso286.zone(120, "H7"));
        assertThrows(IllegalArgumentException.class, () -> Iso286.zone(22, "7H"));
        assertThrows(IllegalArgumentException.class, () -> Iso286.zone(22, "Js6"));
    }
}
