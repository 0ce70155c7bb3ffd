package org.shearstack.view;

import java.util.List;
import org.shearstack.assembly.Kit;
import org.shearstack.geom.GeometryContext;
import org.shearstack.rules.geometry.TestDesigns;

/** The parts helper's demo kit at preview faceting, built once per test run (building it takes seconds). */
final class DemoKits {

    private static final class Holder {
        static final Kit KIT = Kit.build("demo", TestDesigns.demo(),
                GeometryContext.withChordTolerance(DesignScenes.PREVIEW_CHORD_TOLERANCE_MM));
        static final ViewScene SCENE = KitScenes.from(KIT, List.of(), List.of());
    }

    private DemoKits() {
    }

    static Kit kit() {
        return Holder.KIT;
    }

    static ViewScene scene() {
        return Holder.SCENE;
    }
}
