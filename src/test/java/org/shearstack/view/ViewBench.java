package org.shearstack.view;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.shearstack.profile.Profiles;

/**
 * Watch-mode update cost, measured (not asserted). Run under a display:
 * {@code xvfb-run -a mvn -q test -Dtest=ViewBench -Dsurefire.excludedGroups=none}.
 * The update after an edit is: re-read and resolve the spec, build the scene's nodes, show them.
 */
@Tag("bench")
class ViewBench {

    private static final int WARMUP = 5;
    private static final int RUNS = 15;

    @Test
    void watchModeUpdate() throws Exception {
        DisplayTests.assumeDisplay();
        SpecSceneSource spec = SpecSceneSource.of(Path.of("examples", "classroom-demo.yaml"), Profiles.shipped(),
                DesignScenes::withoutParts);
        report("spec read + resolve (classroom-demo)", () -> spec.load());
        org.shearstack.part.DesignValues demo = org.shearstack.rules.geometry.TestDesigns.demo();
        org.shearstack.geom.GeometryContext preview = org.shearstack.geom.GeometryContext.withChordTolerance(
                DesignScenes.PREVIEW_CHORD_TOLERANCE_MM);
        report("demo kit: build kit (parts helper's demo design)", () -> org.shearstack.assembly.Kit.build("demo", demo,
                preview));
        ViewScene kitScene = KitScenes.from(org.shearstack.assembly.Kit.build("demo", demo, preview), java.util.List.of(),
                java.util.List.of());
        report("demo kit: build nodes (" + kitScene.parts().size() + " parts, " + triangles(kitScene) + " triangles)",
                () -> ModelView.build(kitScene));
        report("demo kit: kit + nodes (the update after an edit, minus the spec)", () -> ModelView.build(KitScenes.from(
                org.shearstack.assembly.Kit.build("demo", demo, preview), java.util.List.of(), java.util.List.of())));
        ViewScene sample = SampleAssembly.scene();
        report("sample: build nodes (5 parts, " + triangles(sample) + " triangles)", () -> ModelView.build(sample));
        ViewSession session = ViewSession.open(SceneSource.fixed(sample), sample, false, line -> { });
        try {
            report("sample: build nodes + show in the open window", () -> {
                ModelView built = ModelView.build(sample);
                return FxToolkit.call(() -> {
                    session.window().apply(new Reload.Loaded(sample, 1), Optional.of(built));
                    return null;
                });
            });
            report("sample: section cut of all parts", () -> FxToolkit.call(() -> {
                ModelView m = ModelView.build(sample);
                return m.setSection(true);
            }));
        } finally {
            session.close();
        }
        report("snapshot 1200x800 of the sample", () -> Snapshots.render(sample, SnapshotOptions.defaults()));
    }

    private static int triangles(ViewScene s) {
        return s.parts().stream().mapToInt(p -> p.mesh().triangleCount()).sum();
    }

    private static void report(String what, Callable<?> task) throws Exception {
        for (int i = 0; i < WARMUP; i++) {
            task.call();
        }
        long[] nanos = new long[RUNS];
        for (int i = 0; i < RUNS; i++) {
            long t = System.nanoTime();
            task.call();
            nanos[i] = System.nanoTime() - t;
        }
        Arrays.sort(nanos);
        System.out.println(String.format(Locale.ROOT, "BENCH %-55s median %7.1f ms  min %7.1f ms  max %7.1f ms", what,
                nanos[RUNS / 2] / 1e6, nanos[0] / 1e6, nanos[RUNS - 1] / 1e6));
    }
}
