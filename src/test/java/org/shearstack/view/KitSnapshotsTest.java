package org.shearstack.view;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashSet;
import java.util.Set;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** Pictures of the parts helper's demo kit: every saturated family colour shows, spread is wider, the cut opens it. */
@Tag("display")
class KitSnapshotsTest {

    @BeforeEach
    void needsDisplay() {
        DisplayTests.assumeDisplay();
    }

    @Test
    void demoKitPictures() throws Exception {
        ViewScene scene = DemoKits.scene();
        ImagePixels assembled = Snapshots.renderPixels(scene, new SnapshotOptions(640, 400, false, false));
        ImagePixels exploded = Snapshots.renderPixels(scene, new SnapshotOptions(640, 400, true, false));
        ImagePixels cut = Snapshots.renderPixels(scene, new SnapshotOptions(640, 400, false, true));
        ImagePixels both = Snapshots.renderPixels(scene, new SnapshotOptions(640, 400, true, true));
        Path dir = Path.of("target", "snapshots");
        Files.createDirectories(dir);
        Files.write(dir.resolve("kit-assembled.png"), assembled.toPng());
        Files.write(dir.resolve("kit-exploded.png"), exploded.toPng());
        Files.write(dir.resolve("kit-section.png"), cut.toPng());
        Files.write(dir.resolve("kit-exploded-section.png"), both.toPng());

        int[] a = PixelStats.drawnBox(assembled, Snapshots.BACKGROUND);
        int[] e = PixelStats.drawnBox(exploded, Snapshots.BACKGROUND);
        assertNotNull(a);
        assertNotNull(e);
        double aspectA = (a[2] - a[0] + 1.0) / (a[3] - a[1] + 1.0);
        double aspectE = (e[2] - e[0] + 1.0) / (e[3] - e[1] + 1.0);
        assertTrue(aspectE > 1.3 * aspectA, "spread picture is wider: " + aspectE + " vs " + aspectA);

        Set<Rgb> saturated = new LinkedHashSet<>();
        scene.parts().forEach(p -> {
            if (p.colour().saturation() > 0.4) {
                saturated.add(p.colour());
            }
        });
        for (Rgb c : saturated) {
            int n = PixelStats.countHue(exploded, c, 8) + PixelStats.countHue(cut, c, 8);
            assertTrue(n > 50, c.hex() + ": expected this family colour in the spread or cut picture, found " + n);
        }
    }
}
