package org.shearstack.view;

import org.junit.jupiter.api.Assumptions;

/** Shared guard for tests that need an X display (CI runs them under xvfb-run). */
final class DisplayTests {

    private DisplayTests() {
    }

    static void assumeDisplay() {
        Assumptions.assumeTrue(Snapshots.displayAvailable(),
                "skipped: no DISPLAY set; run the display tests under Xvfb: xvfb-run -a mvn -B verify");
    }
}
