package org.shearstack.view;

import java.util.List;
import org.shearstack.check.Finding;
import org.shearstack.check.Severity;
import org.shearstack.geom.Mesh;

/**
 * A built-in sample: a small disc-turbine-like stack made from plain shapes, with invented findings and
 * figures, for trying the viewer and for tests before real designs are wired in. It is not a design.
 */
public final class SampleAssembly {

    private static final int SEGMENTS = 96;

    private SampleAssembly() {
    }

    /** The sample scene. */
    public static ViewScene scene() {
        Mesh discs = discPack(6, 40, 6.5, 1.2, 2.8);
        List<ViewPart> parts = List.of(
                ViewPart.of("inlet cover", SampleShapes.ring(11, 50, -6, 0, SEGMENTS), Rgb.parse("#2f6db5"),
                        Placement.IDENTITY, new OffsetMm(0, 0, -45)),
                ViewPart.of("housing ring", housing(), Rgb.parse("#e0a526"),
                        Placement.IDENTITY, OffsetMm.ZERO),
                ViewPart.of("disc pack", discs, Rgb.parse("#c8412f"),
                        Placement.translation(0, 0, 3), new OffsetMm(0, 0, 60)),
                ViewPart.of("shaft", SampleShapes.cylinder(4, -14, 44, 32), Rgb.parse("#3f9e5a"),
                        Placement.IDENTITY, new OffsetMm(0, 0, 60)),
                ViewPart.of("outlet cover", SampleShapes.ring(16, 50, 30, 36, SEGMENTS), Rgb.parse("#8a4fb8"),
                        Placement.IDENTITY, new OffsetMm(0, 0, 120)));
        List<Finding> findings = List.of(
                new Finding("SAMPLE-WALL", Severity.CAUTION, "Housing wall near the inlet is 1.6 mm, two line widths.",
                        1.6, 1.2, "mm", 1.33, "housing ring", "inlet boss", "sample", "Widen the boss to 2 mm.",
                        new Finding.Location(0, -58, 15)),
                new Finding("SAMPLE-GAP", Severity.OK, "Disc gap 1.6 mm prints as separate walls.",
                        1.6, 0.8, "mm", 2.0, "disc pack", "gap between discs", "sample", "",
                        new Finding.Location(40, 0, 8)),
                new Finding("SAMPLE-BURST", Severity.FAIL, "Runaway speed exceeds the allowable disc speed.",
                        52000, 41000, "rpm", 0.79, "disc pack", "disc rim", "sample",
                        "Reduce supply pressure or disc diameter.", new Finding.Location(0, 40, 2)));
        List<HeadlineFigure> headlines = List.of(
                new HeadlineFigure("operating point", "18 000 rpm, 4.1 W (sample)", Severity.OK),
                new HeadlineFigure("runaway vs allowable", "52 000 vs 41 000 rpm (sample)", Severity.FAIL),
                new HeadlineFigure("safe pressure", "3.0 bar(g) (sample)", Severity.CAUTION));
        return new ViewScene("sample assembly (invented figures)", parts, findings, headlines,
                List.of("built-in sample: plain shapes, invented figures"));
    }

    private static Mesh housing() {
        return SampleShapes.join(
                SampleShapes.ring(42, 50, 0, 30, SEGMENTS),
                SampleShapes.box(-6, -58, 9, 6, -49, 21)); // inlet boss, overlapping the wall like a separate shell
    }

    private static Mesh discPack(int count, double radiusMm, double boreMm, double thicknessMm, double pitchMm) {
        Mesh[] discs = new Mesh[count];
        for (int i = 0; i < count; i++) {
            double z0 = i * pitchMm;
            discs[i] = SampleShapes.ring(boreMm, radiusMm, z0, z0 + thicknessMm, SEGMENTS);
        }
        return SampleShapes.join(discs);
    }
}
