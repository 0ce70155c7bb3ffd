package org.shearstack.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.IntBuffer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Optional;
import java.util.function.BooleanSupplier;
import javafx.scene.image.PixelFormat;
import javafx.scene.image.WritableImage;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.check.Finding;
import org.shearstack.profile.Profiles;

/** The window under a display: findings highlight their part, and watch mode on a real spec file. */
@Tag("display")
class ViewerWindowTest {

    private static final Duration GENEROUS = Duration.ofSeconds(30);

    @TempDir
    Path dir;

    @BeforeEach
    void needsDisplay() {
        DisplayTests.assumeDisplay();
    }

    @Test
    void selectingAFindingDimsOtherPartsAndMarksItsPlace() throws Exception {
        ViewScene sample = SampleAssembly.scene();
        ViewSession session = ViewSession.open(SceneSource.fixed(sample), sample, false, line -> { });
        try {
            Finding wall = sample.findings().stream().filter(f -> f.code().equals("SAMPLE-WALL")).findFirst().get();
            String details = FxToolkit.call(() -> {
                session.window().selectFinding(wall);
                return session.window().detailsText();
            });
            assertTrue(details.contains("remedy: Widen the boss"), details);
            assertTrue(FxToolkit.call(() -> markerVisible(session.window().model().orElseThrow())),
                    "a finding with a location shows the marker");
            assertEquals(wall.part(), FxToolkit.call(() -> undimmedParts(session.window().model().orElseThrow())));
            // the marker sits at the finding's place in the assembly (the housing is not moved by its placement)
            double[] at = FxToolkit.call(() -> session.window().model().orElseThrow().markerPosition(wall).orElseThrow());
            double[] origin = FxToolkit.call(() -> session.window().model().orElseThrow().originMm());
            assertEquals(-58, at[1] + origin[1], 1e-9);
            assertEquals(15, at[2] + origin[2], 1e-9);
            keepWindow(session, "window-highlight");
            FxToolkit.call(() -> {
                session.window().selectFinding(null);
                return null;
            });
            assertFalse(FxToolkit.call(() -> markerVisible(session.window().model().orElseThrow())));
        } finally {
            session.close();
        }
    }

    private static String undimmedParts(ModelView model) {
        return String.join(",", model.partNodes().stream().filter(p -> !p.dimmed()).map(p -> p.part().name()).toList());
    }

    @Test
    void savingTheSpecUpdatesTheWindowAndABrokenEditKeepsTheLastGoodModel() throws Exception {
        Path spec = dir.resolve("demo.yaml");
        String good = Files.readString(Path.of("examples", "classroom-demo.yaml"), StandardCharsets.UTF_8);
        Files.writeString(spec, good, StandardCharsets.UTF_8);
        SpecSceneSource source = SpecSceneSource.of(spec, Profiles.shipped(), DesignScenes::withoutParts);
        ViewSession session = ViewSession.open(source, source.load(), true, line -> { });
        try {
            assertEquals("classroom-demo", title(session));

            Files.writeString(spec, good.replace("name: classroom-demo", "name: classroom-demo-two"), StandardCharsets.UTF_8);
            waitUntil(() -> title(session).equals("classroom-demo-two"));

            String broken = good.replace("name: classroom-demo", "name: classroom-demo-two")
                    .replaceFirst("(?m)^(\\s+pressure:) [^#\\n]*", "$1 4 parsec ");
            assertFalse(broken.equals(good.replace("name: classroom-demo", "name: classroom-demo-two")), "the edit must break the spec");
            Files.writeString(spec, broken, StandardCharsets.UTF_8);
            waitUntil(() -> FxToolkit.call(() -> session.window().bannerShown()));
            String banner = FxToolkit.call(() -> session.window().bannerText());
            assertTrue(banner.contains("demo.yaml:") && banner.contains("supply.pressure"), banner);
            assertTrue(banner.contains("last good model"), banner);
            assertEquals("classroom-demo-two", title(session), "the last good model stays");
            keepWindow(session, "window-error");

            Files.writeString(spec, good, StandardCharsets.UTF_8);
            waitUntil(() -> title(session).equals("classroom-demo"));
            assertFalse(FxToolkit.call(() -> session.window().bannerShown()));
        } finally {
            session.close();
        }
    }

    private static String title(ViewSession session) {
        return FxToolkit.call(() -> session.window().model().orElseThrow().scene().title());
    }

    private static boolean markerVisible(ModelView model) {
        return model.root().lookupAll("*").stream()
                .anyMatch(n -> n instanceof javafx.scene.shape.Sphere && n.isVisible());
    }

    private static void waitUntil(BooleanSupplier condition) throws InterruptedException {
        long deadline = System.nanoTime() + GENEROUS.toNanos();
        while (!condition.getAsBoolean()) {
            if (System.nanoTime() > deadline) {
                throw new AssertionError("condition not met within " + GENEROUS);
            }
            Thread.sleep(25);
        }
    }

    /** Saves a picture of the whole window to target/snapshots for a human to look at. */
    private static void keepWindow(ViewSession session, String name) throws Exception {
        ImagePixels img = FxToolkit.call(() -> {
            WritableImage shot = session.window().stage().getScene().snapshot(null);
            int w = (int) shot.getWidth();
            int h = (int) shot.getHeight();
            int[] argb = new int[w * h];
            shot.getPixelReader().getPixels(0, 0, w, h, PixelFormat.getIntArgbInstance(), IntBuffer.wrap(argb), w);
            return new ImagePixels(w, h, argb);
        });
        Path out = Path.of("target", "snapshots");
        Files.createDirectories(out);
        Files.write(out.resolve(name + ".png"), img.toPng());
    }
}
