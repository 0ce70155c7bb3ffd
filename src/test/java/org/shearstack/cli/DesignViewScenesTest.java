package org.shearstack.cli;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.shearstack.check.Finding;
import org.shearstack.profile.Profiles;
import org.shearstack.view.SceneSources;
import org.shearstack.view.ViewScene;

/** The demo spec through the design job into a view scene, as {@code view SPEC} shows it. */
class DesignViewScenesTest {

    @Test
    void demoSpecGivesPartsFindingsThatPointAtThemAndHeadlineFigures() throws Exception {
        ViewScene scene = SceneSources.forPath(Path.of("examples", "classroom-demo.yaml"), Profiles.shipped(),
                DesignViewScenes::of).load();
        assertFalse(scene.parts().isEmpty(), "the demo resolves every dimension, so the kit is drawn");
        assertTrue(scene.headlines().stream().anyMatch(h -> h.label().equals("runaway vs allowable")),
                scene.headlines().toString());
        boolean operating = scene.headlines().stream().anyMatch(h -> h.label().equals("operating point"));
        assertTrue(operating || scene.notes().stream().anyMatch(n -> n.startsWith("performance:")),
                "either the operating point or a note saying why it is missing: " + scene.notes());
        for (Finding f : scene.findings()) {
            boolean names = f.part().isEmpty() || scene.parts().stream().anyMatch(p -> p.isCopyOf(f.part()));
            // findings about several parts or the whole assembly name no single part; the rest must point at one
            if (!names) {
                assertTrue(f.part().equals("assembly") || f.part().contains(" and ") || f.part().contains(","),
                        f.code() + " names part '" + f.part() + "', which is not in the scene");
            }
        }
        assertTrue(scene.parts().stream().allMatch(p -> p.section().isPresent()), "kit parts cut their layered solids");
    }
}
