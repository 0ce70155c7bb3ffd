package org.shearstack.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Offsets for parts that arrive without exploded placements. */
class ExplodePlannerTest {

    private static ViewPart box(String name, double z0, double z1) {
        return ViewPart.of(name, SampleShapes.box(-1, -1, z0, 1, 1, z1), Rgb.parse("#808080"), Placement.IDENTITY,
                OffsetMm.ZERO);
    }

    @Test
    void nestedStackIsPulledApartWithTheGapAndTheMiddlePartStays() {
        // three parts overlapping along z: a housing 0..30 holding a pack 5..20, a cover 28..34
        List<ViewPart> parts = List.of(box("cover", 28, 34), box("housing", 0, 30), box("pack", 5, 20));
        List<ViewPart> out = ExplodePlanner.alongAxis(parts, 10);
        double housing = out.get(1).explodedOffset().zMm();
        double pack = out.get(2).explodedOffset().zMm();
        double cover = out.get(0).explodedOffset().zMm();
        // order by centre: pack (12.5), housing (15), cover (31); the middle one (housing) stays
        assertEquals(0, housing);
        // the housing's bottom (0) is 20 mm below the pack's top (20): it moves 20 + 10 mm up relative to the pack
        assertEquals(30, housing - pack, 1e-12);
        // cover overlaps the housing by 2 mm: 2 + 10
        assertEquals(12, cover - housing, 1e-12);
        for (int k = 0; k < out.size(); k++) {
            assertEquals(0, out.get(k).explodedOffset().xMm());
        }
    }

    @Test
    void separatePartsStillGetTheGapAndBadGapIsRefused() {
        List<ViewPart> out = ExplodePlanner.alongAxis(List.of(box("a", 0, 1), box("b", 5, 6)), 3);
        assertEquals(3, out.get(1).explodedOffset().zMm() - out.get(0).explodedOffset().zMm(), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> ExplodePlanner.alongAxis(List.of(), -1));
        assertTrue(ExplodePlanner.alongAxis(List.of(), 0).isEmpty());
    }
}
