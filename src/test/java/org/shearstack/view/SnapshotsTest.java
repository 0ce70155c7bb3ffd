package org.shearstack.view;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** Off-screen pictures of the sample assembly. Needs a display with 3D (Xvfb + Mesa with prism.forceGPU). */
@Tag("display")
class SnapshotsTest {

    private static final double HUE_TOLERANCE_DEGREES = 10;
    private final ViewScene sample = SampleAssembly.scene();

    @BeforeEach
    void needsDisplay() {
        DisplayTests.assumeDisplay();
    }

    @Test
    void assembledSnapshotIsNotBlankAndShowsEveryVisiblePartColour() throws IOException {
        ImagePixels img = Snapshots.renderPixels(sample, new SnapshotOptions(600, 400, false, false));
        keep(img, "assembled");
        int drawn = PixelStats.drawnCount(img, Snapshots.BACKGROUND);
        assertTrue(drawn > 600 * 400 / 10, "expected at least a tenth of the picture drawn, found " + drawn + " pixels");
        // the disc pack and shaft sit inside the housing: the exploded picture must show them
        ImagePixels exploded = Snapshots.renderPixels(sample, new SnapshotOptions(600, 400, true, false));
        keep(exploded, "exploded");
        for (ViewPart p : sample.parts()) {
            int n = PixelStats.countHue(exploded, p.colour(), HUE_TOLERANCE_DEGREES);
            assertTrue(n > 200, "part '" + p.name() + "' (" + p.colour().hex() + "): expected its colour in the "
                    + "exploded picture, found " + n + " pixels");
        }
    }

    @Test
    void explodedSnapshotIsWiderThanAssembled() {
        ImagePixels assembled = Snapshots.renderPixels(sample, new SnapshotOptions(600, 400, false, false));
        ImagePixels exploded = Snapshots.renderPixels(sample, new SnapshotOptions(600, 400, true, false));
        int[] a = PixelStats.drawnBox(assembled, Snapshots.BACKGROUND);
        int[] e = PixelStats.drawnBox(exploded, Snapshots.BACKGROUND);
        assertNotNull(a);
        assertNotNull(e);
        double aspectAssembled = (a[2] - a[0] + 1.0) / (a[3] - a[1] + 1.0);
        double aspectExploded = (e[2] - e[0] + 1.0) / (e[3] - e[1] + 1.0);
        assertTrue(aspectExploded > 1.5 * aspectAssembled, "exploded width/height " + aspectExploded
                + " should clearly exceed assembled " + aspectAssembled);
    }

    @Test
    void sectionSnapshotShowsTheCut() throws IOException {
        ImagePixels whole = Snapshots.renderPixels(sample, new SnapshotOptions(600, 400, false, false));
        ImagePixels cut = Snapshots.renderPixels(sample, new SnapshotOptions(600, 400, false, true));
        keep(cut, "section");
        Rgb discs = sample.part("disc pack").orElseThrow().colour();
        int hiddenBefore = PixelStats.countHue(whole, discs, HUE_TOLERANCE_DEGREES);
        int shownAfter = PixelStats.countHue(cut, discs, HUE_TOLERANCE_DEGREES);
        // uncut, the discs show only through the outlet cover's bore
        assertTrue(shownAfter > 1000 && shownAfter > 5 * hiddenBefore, "the cut should open the housing and show "
                + "the discs: found " + shownAfter + " disc pixels cut, " + hiddenBefore + " uncut");
        // the cut faces are drawn in a lighter tint of the part colour: the housing's cut face must appear
        Rgb housing = sample.part("housing ring").orElseThrow().colour();
        Rgb housingCut = housing.mix(Rgb.parse("#f4efe2"), 0.45);
        assertTrue(countNear(cut, housingCut, 40) > 300, "expected the housing's lighter cut face in the picture");
        assertTrue(countNear(whole, housingCut, 40) < countNear(cut, housingCut, 40) / 4,
                "the uncut picture should not show the cut tint");
    }

    @Test
    void brokenPartsAreNamedOrSkipped() {
        ViewPart box = ViewPart.of("box", SampleShapes.box(0, 0, 0, 10, 10, 10), Rgb.parse("#2f6db5"),
                Placement.IDENTITY, OffsetMm.ZERO);
        ViewPart empty = ViewPart.of("nothing", org.shearstack.geom.Mesh.of(new double[0], new int[0]),
                Rgb.parse("#c8412f"), Placement.IDENTITY, OffsetMm.ZERO);
        ImagePixels img = Snapshots.renderPixels(ViewScene.ofParts("with an empty part", java.util.List.of(box, empty)),
                new SnapshotOptions(200, 150, true, true));
        assertTrue(PixelStats.countHue(img, box.colour(), HUE_TOLERANCE_DEGREES) > 500, "the box is drawn");
        ViewPart far = ViewPart.of("far", org.shearstack.geom.Mesh.of(new double[] {0, 0, 0, 1, 0, 0, 0, 1e12, 0},
                new int[] {0, 1, 2}), Rgb.parse("#3f9e5a"), Placement.IDENTITY, OffsetMm.ZERO);
        IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> Snapshots.render(ViewScene.ofParts("too big", java.util.List.of(box, far)),
                        new SnapshotOptions(200, 150, false, false)));
        assertTrue(e.getMessage().startsWith("part 'far': vertex 2 coordinate y"), e.getMessage());
    }

    /** Pixels within {@code tolerance} of the colour in each channel (brightness may vary with light). */
    private static int countNear(ImagePixels img, Rgb colour, int tolerance) {
        int n = 0;
        for (int p : img.argb()) {
            if (Math.abs(((p >> 16) & 0xff) - colour.red()) <= tolerance
                    && Math.abs(((p >> 8) & 0xff) - colour.green()) <= tolerance
                    && Math.abs((p & 0xff) - colour.blue()) <= tolerance) {
                n++;
            }
        }
        return n;
    }

    private static void keep(ImagePixels img, String name) throws IOException {
        Path dir = Path.of("target", "snapshots");
        Files.createDirectories(dir);
        Files.write(dir.resolve(name + ".png"), img.toPng());
    }
}
