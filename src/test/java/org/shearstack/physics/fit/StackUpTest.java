package org.shearstack.physics.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Worst-case and RSS stacks, checked against hand arithmetic (common practice in tolerance analysis). */
class StackUpTest {

    @Test
    void axialPackStack() {
        // chamber depth 20 ± 0.1; 8 discs 1.0 ± 0.05; 7 spacers 1.2 ± 0.05 → nominal end play 20 − 8 − 8.4 = 3.6
        StackUp s = StackUp.of(List.of(
                StackUp.Link.opens("chamber depth", 20, 0.1),
                StackUp.Link.closes("disc thickness", 8, 1.0, 0.05),
                StackUp.Link.closes("spacer thickness", 7, 1.2, 0.05)));
        StackUp.Result r = s.evaluate();
        assertEquals(3.6, r.meanMm(), 1e-12);
        double worst = 0.1 + 8 * 0.05 + 7 * 0.05;
        assertEquals(3.6 - worst, r.worstMinMm(), 1e-12);
        assertEquals(3.6 + worst, r.worstMaxMm(), 1e-12);
        double rss = Math.sqrt(0.1 * 0.1 + 15 * 0.05 * 0.05);
        assertEquals(3.6 - rss, r.rssMinMm(), 1e-12);
        assertEquals(3.6 + rss, r.rssMaxMm(), 1e-12);
    }

    @Test
    void oneSidedLinkShiftsTheMean() {
        // a cover that can only bulge outwards by up to 0.4 mm opens the gap by 0 … 0.4
        StackUp s = StackUp.of(List.of(StackUp.Link.opens("gap", 1.0, 0.0),
                new StackUp.Link("cover bulge", 1, 1, 0, 0, 0.4)));
        StackUp.Result r = s.evaluate();
        assertEquals(1.2, r.meanMm(), 1e-12);
        assertEquals(1.0, r.worstMinMm(), 1e-12);
        assertEquals(1.4, r.worstMaxMm(), 1e-12);
    }
}
