package org.shearstack.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class QuantisedTest {

    @Test
    void thicknessRoundsUpToWholeLayers() {
        // DESIGN.md §2: a 0.75 mm disc on 0.25 mm layers is exactly three layers (exact arithmetic)
        Quantised q = Quantised.toLayers(0.75, 0.25, 1);
        assertEquals(3, q.count());
        assertEquals(0.75, q.valueMm(), 1e-12);
        Quantised up = Quantised.toLayers(0.7, 0.2, 1);
        assertEquals(4, up.count());
        assertEquals("0.7 mm rounded up to 4 layers of 0.2 mm = 0.8 mm", up.words());
    }

    @Test
    void wallRoundsUpToWholeLineWidthsWithAMinimum() {
        assertEquals(2, Quantised.toLineWidths(0.5, 0.45, 2).count());
        assertEquals(3, Quantised.toLineWidths(0.91, 0.45, 2).count());
        assertEquals(1.35, Quantised.toLineWidths(0.91, 0.45, 2).valueMm(), 1e-12);
    }
}
