package org.shearstack.view;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.assembly.Kit;
import org.shearstack.assembly.KitPart;
import org.shearstack.geom.LayeredSolid;

/**
 * A kit as the viewer shows it: one view part per copy ("rotor-disc #3"), in the kit's family colours,
 * placed and exploded as the kit says, with sections cut from the layered solids and the kit's findings.
 */
public final class KitScenes {

    private KitScenes() {
    }

    public static ViewScene from(Kit kit, List<HeadlineFigure> headlines, List<String> notes) {
        List<ViewPart> parts = new ArrayList<>();
        int index = 0;
        for (KitPart p : kit.parts()) {
            Rgb colour = Palette.parseOr(Kit.colour(p.family()), index++);
            for (int copy = 0; copy < p.count(); copy++) {
                org.shearstack.assembly.Placement at = p.placements().get(copy);
                org.shearstack.assembly.Placement apart = kit.exploded(p, copy);
                String name = p.count() == 1 ? p.name() : p.name() + " #" + (copy + 1);
                OffsetMm offset = new OffsetMm(0, 0, apart.dzMm() - at.dzMm());
                LayeredSolid solid = p.solid();
                ViewPart part = ViewPart.of(name, p.mesh(), colour, Placement.of(at.transform()), offset)
                        .withSection(() -> LayeredSection.keptHalfMesh(at.apply(solid)));
                parts.add(part);
            }
        }
        return new ViewScene(kit.name(), parts, kit.findings(), headlines, notes);
    }
}
