package org.shearstack.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.assembly.Kit;
import org.shearstack.assembly.KitPart;
import org.shearstack.geom.Mesh;
import org.shearstack.io.kit.KitWriter;

/** The kit adapter and the kit-folder reader give the same scene; sections come from the layered solids. */
class KitScenesTest {

    private static Kit kit;
    private static ViewScene scene;

    @BeforeAll
    static void build() {
        kit = DemoKits.kit();
        scene = DemoKits.scene();
    }

    @Test
    void onePartPerCopyWithTheKitsPlacementsAndSpread() {
        int copies = kit.parts().stream().mapToInt(KitPart::count).sum();
        assertEquals(copies, scene.parts().size());
        KitPart many = kit.parts().stream().filter(p -> p.count() > 1).findFirst().orElseThrow();
        assertTrue(scene.part(many.name() + " #" + many.count()).isPresent(), "copies are numbered from 1");
        for (ViewPart p : scene.parts()) {
            assertEquals(0, p.explodedOffset().xMm());
            assertEquals(0, p.explodedOffset().yMm());
        }
        assertTrue(scene.parts().stream().anyMatch(p -> p.explodedOffset().zMm() != 0), "the kit spreads its parts");
        assertEquals(kit.findings(), scene.findings());
    }

    @Test
    void sectionOfEveryDistinctPartIsClosedAndAtMostTheWhole() {
        for (ViewPart p : scene.parts().stream().filter(p -> !p.name().contains(" #") || p.name().endsWith(" #1")).toList()) {
            Mesh half = p.section().orElseThrow().keptHalf();
            if (half.triangleCount() == 0) {
                continue;
            }
            assertTrue(MeshSection.isClosed(half), p.name() + ": section from the layered solid must be closed");
            double whole = MeshMeasure.signedVolume(p.placedMesh());
            double kept = MeshMeasure.signedVolume(half);
            assertTrue(kept > 0 && kept <= whole * (1 + 1e-9), p.name() + ": kept " + kept + " of " + whole);
        }
    }

    @Test
    void kitFolderReadsBackAsTheSameParts(@TempDir Path dir) throws Exception {
        KitWriter.write(kit, dir);
        ViewScene fromFiles = MeshFileSource.of(dir).load();
        assertEquals(scene.parts().size(), fromFiles.parts().size());
        for (int i = 0; i < scene.parts().size(); i++) {
            ViewPart a = scene.parts().get(i);
            ViewPart b = fromFiles.parts().get(i);
            assertEquals(a.name(), b.name());
            assertEquals(a.explodedOffset().zMm(), b.explodedOffset().zMm(), 1e-9, a.name());
            assertEquals(a.colour(), b.colour(), a.name());
            assertEquals(MeshMeasure.signedVolume(a.placedMesh()), MeshMeasure.signedVolume(b.placedMesh()),
                    1e-6 * Math.abs(MeshMeasure.signedVolume(a.placedMesh())), a.name());
        }
        ViewScene assemblyOnly = MeshFileSource.of(dir.resolve("assembly.3mf")).load();
        assertEquals(scene.parts().size(), assemblyOnly.parts().size());
    }
}
