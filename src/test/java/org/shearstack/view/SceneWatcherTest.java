package org.shearstack.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.BooleanSupplier;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Watch mode: a changed file is picked up and reloaded; a broken edit reports where it failed. The
 * source is a tiny test format ("washer OUTER_MM"), standing in for a spec until the design pipeline is
 * wired in. Only a generous wait-until, no timing assertions.
 */
class SceneWatcherTest {

    private static final Duration GENEROUS = Duration.ofSeconds(20);

    @TempDir
    Path dir;

    @Test
    void savedChangeIsReloadedAndABrokenEditIsReportedWithItsPlace() throws Exception {
        Path spec = dir.resolve("demo.txt");
        Files.writeString(spec, "washer 20\n", StandardCharsets.UTF_8);
        WasherSource source = new WasherSource(spec);
        List<Reload> seen = new CopyOnWriteArrayList<>();
        try (SceneWatcher watcher = SceneWatcher.start(source, SceneWatcher.DEFAULT_DEBOUNCE, seen::add)) {
            assertEquals(List.of(spec.toAbsolutePath().normalize()), watcher.files());

            Files.writeString(spec, "washer 35\n", StandardCharsets.UTF_8);
            waitUntil(() -> seen.stream().anyMatch(r -> r instanceof Reload.Loaded l
                    && l.scene().title().equals("washer 35 mm")));

            Files.writeString(spec, "washer thirty\n", StandardCharsets.UTF_8);
            waitUntil(() -> seen.stream().anyMatch(r -> r instanceof Reload.Failed));
            Reload.Failed failed = (Reload.Failed) seen.stream().filter(r -> r instanceof Reload.Failed).findFirst().get();
            assertTrue(failed.message().contains("demo.txt:1:8"), failed.message());

            Files.writeString(spec, "washer 40\n", StandardCharsets.UTF_8);
            waitUntil(() -> seen.stream().anyMatch(r -> r instanceof Reload.Loaded l
                    && l.scene().title().equals("washer 40 mm")));
        }
    }

    @Test
    void otherFilesInTheFolderDoNotTriggerReloads() throws Exception {
        Path spec = dir.resolve("demo.txt");
        Files.writeString(spec, "washer 20\n", StandardCharsets.UTF_8);
        List<Reload> seen = new CopyOnWriteArrayList<>();
        try (SceneWatcher watcher = SceneWatcher.start(new WasherSource(spec), SceneWatcher.DEFAULT_DEBOUNCE, seen::add)) {
            Files.writeString(dir.resolve("notes.txt"), "unrelated", StandardCharsets.UTF_8);
            Files.writeString(spec, "washer 22\n", StandardCharsets.UTF_8);
            waitUntil(() -> !seen.isEmpty());
            // the first reload seen is the spec's, and it carries the new content
            assertTrue(seen.get(0) instanceof Reload.Loaded l && l.scene().title().equals("washer 22 mm"), seen.toString());
        }
    }

    private static void waitUntil(BooleanSupplier condition) throws InterruptedException {
        long deadline = System.nanoTime() + GENEROUS.toNanos();
        while (!condition.getAsBoolean()) {
            if (System.nanoTime() > deadline) {
                throw new AssertionError("condition not met within " + GENEROUS);
            }
            Thread.sleep(20);
        }
    }

    /** "washer OUTER_MM" on line 1 makes a washer scene; anything else fails with file:line:column. */
    private record WasherSource(Path file) implements SceneSource {
        @Override
        public ViewScene load() throws SceneLoadException {
            String text;
            try {
                text = Files.readString(file, StandardCharsets.UTF_8).strip();
            } catch (IOException e) {
                throw new SceneLoadException(file.getFileName() + ": cannot read: " + e.getMessage(), e);
            }
            String number = text.startsWith("washer ") ? text.substring(7) : "";
            try {
                double outer = Double.parseDouble(number);
                return ViewScene.ofParts("washer " + number + " mm", List.of(ViewPart.of("washer",
                        SampleShapes.ring(5, outer, 0, 2, 32), Rgb.parse("#3366aa"), Placement.IDENTITY, OffsetMm.ZERO)));
            } catch (NumberFormatException e) {
                throw new SceneLoadException(file.getFileName() + ":1:8: expected an outer diameter in mm, found '"
                        + number + "'");
            }
        }

        @Override
        public List<Path> watchedFiles() {
            return List.of(file);
        }

        @Override
        public String describe() {
            return file.getFileName().toString();
        }
    }
}
