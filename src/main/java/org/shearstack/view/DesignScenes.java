package org.shearstack.view;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.check.Severity;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.rules.Key;

/**
 * Design-to-scene steps. Until the kit builder (parts with meshes, placements and exploded placements)
 * is wired in, a resolved design shows its identity figures and says that parts are not built yet.
 */
public final class DesignScenes {

    private DesignScenes() {
    }

    /** The design's name and main resolved choices, with no parts. */
    public static ViewScene withoutParts(ResolvedDesign design) {
        List<HeadlineFigure> figures = new ArrayList<>();
        for (String name : List.of("printer", "filament", "supply.pressure", "rotor.diameter", "rotor.discs")) {
            design.key(name).ifPresent(k -> figures.add(new HeadlineFigure(name, display(design, k), Severity.OK)));
        }
        return new ViewScene(design.name(), List.of(), List.of(), figures,
                List.of("parts are not built from a spec in this version yet: the design resolved, nothing to draw"));
    }

    private static String display(ResolvedDesign design, Key key) {
        return design.display(key);
    }
}
