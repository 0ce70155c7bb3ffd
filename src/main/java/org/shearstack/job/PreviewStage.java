package org.shearstack.job;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.assembly.Kit;
import org.shearstack.assembly.KitPart;
import org.shearstack.io.report.Preview;
import org.shearstack.view.DisplayUnavailableException;
import org.shearstack.view.OffsetMm;
import org.shearstack.view.Placement;
import org.shearstack.view.Rgb;
import org.shearstack.view.SnapshotOptions;
import org.shearstack.view.Snapshots;
import org.shearstack.view.ViewPart;
import org.shearstack.view.ViewScene;

/**
 * The assembly picture for the report, through the viewer's off-screen snapshots. Without a display the report
 * says why there is no picture; nothing else changes.
 */
final class PreviewStage {

    static final int WIDTH_PX = 960;
    static final int HEIGHT_PX = 560;

    private PreviewStage() {
    }

    static Preview render(Kit kit, boolean wanted) {
        if (!wanted) {
            return Preview.none("not asked for (--no-preview or a check-only run).");
        }
        if (!Snapshots.displayAvailable()) {
            return Preview.none("no display was available to render one (DISPLAY is not set; run under a desktop"
                    + " or xvfb-run to get a picture).");
        }
        try {
            byte[] png = Snapshots.render(scene(kit), new SnapshotOptions(WIDTH_PX, HEIGHT_PX, false, true));
            return Preview.of(png);
        } catch (DisplayUnavailableException e) {
            return Preview.none("the display could not render 3D: " + e.getMessage());
        }
    }

    /** Every copy of every kit part, placed and coloured as in assembly.3mf. */
    static ViewScene scene(Kit kit) {
        List<ViewPart> parts = new ArrayList<>();
        for (KitPart p : kit.parts()) {
            Rgb colour = Rgb.parse(Kit.colour(p.family()).substring(0, 7));
            for (int k = 0; k < p.count(); k++) {
                Placement at = Placement.fromThreeMfMatrix(p.placements().get(k).transform().to3mfMatrix());
                Placement ex = Placement.fromThreeMfMatrix(kit.exploded(p, k).transform().to3mfMatrix());
                parts.add(ViewPart.of(p.name() + " #" + (k + 1), p.mesh(), colour, at,
                        new OffsetMm(ex.txMm() - at.txMm(), ex.tyMm() - at.tyMm(), ex.tzMm() - at.tzMm())));
            }
        }
        return ViewScene.ofParts(kit.name(), parts);
    }
}
