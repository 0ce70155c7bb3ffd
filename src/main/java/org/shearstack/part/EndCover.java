package org.shearstack.part;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;

import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;
import org.shearstack.geom.Slab;

/**
 * An end cover, printed with its outer face on the bed (u = 0) and its inner face up (u = thickness): the
 * bearing pocket opens towards the chamber with a 45° lead-in, the lip behind it holds the outer ring; arc
 * exhaust openings around the seat; the face O-ring groove in the inner face; the screw holes. The free
 * cover anchors the screws (heat-set pilots from the inner face, nut pockets from the outer face, or tap-drill
 * pilots) and carries the inlet: a thread pilot from the outer face and a feed hole into the plenum. The drive
 * cover has plain clearance holes; the bracket flange sits on it and takes the screw heads.
 */
public final class EndCover {

    /** Which cover. */
    public enum Side { FREE, DRIVE }

    private EndCover() {
    }

    public static LayeredSolid solid(Dims d, GeometryContext ctx, Side side) {
        double t = d.coverThickness();
        List<Feature> cuts = new ArrayList<>();
        cuts.add(new Feature(0, t, Region.boreCircle(ctx, 0, 0, d.lipHole())));
        cuts.add(new Feature(t - d.seatDepth(), t, Region.boreCircle(ctx, 0, 0, d.seatDiameter())));
        cuts.add(new Feature(t - d.leadInDepth(), t, Region.boreCircle(ctx, 0, 0, d.leadInDiameter())));
        cuts.add(new Feature(0, t, exhaust(d, ctx)));
        if (d.grooveWidth() > 0) {
            cuts.add(new Feature(t - d.grooveDepth(), t, Region.annulus(ctx, 0, 0, d.grooveInner() + 2 * d.grooveWidth(),
                    d.grooveInner())));
        }
        double start = Shapes.boltStartDeg(d.boltCount());
        if (side == Side.DRIVE) {
            cuts.add(new Feature(0, t, Shapes.holeCircle(ctx, d.boltCount(), d.boltCircle(), d.boltClearance(), start)));
        } else {
            cuts.addAll(anchors(d, ctx, start));
            cuts.add(new Feature(0, d.portPilotDepth(), Region.boreCircle(ctx, d.plenumRadius(), 0, d.portPilot())));
            cuts.add(new Feature(0, t, Region.boreCircle(ctx, d.plenumRadius(), 0, d.portFeed())));
        }
        return stack(ctx, Region.disc(ctx, 0, 0, d.housingOutside()), 0, t, cuts);
    }

    private static List<Feature> anchors(Dims d, GeometryContext ctx, double start) {
        double t = d.coverThickness();
        return switch (d.anchor()) {
            case "nut" -> {
                List<Region> pockets = new ArrayList<>();
                double r = d.boltCircle() / 2;
                for (int k = 0; k < d.boltCount(); k++) {
                    double a = start + 360.0 * k / d.boltCount();
                    pockets.add(Region.regularPolygon(ctx, r * Shapes.cosDeg(a), r * Shapes.sinDeg(a), 6,
                            d.nutAcrossFlats(), a));
                }
                yield List.of(new Feature(0, t, Shapes.holeCircle(ctx, d.boltCount(), d.boltCircle(), d.anchorHole(), start)),
                        new Feature(0, d.anchorDepth(), Region.unionAll(ctx, pockets)));
            }
            case "tapped" -> List.of(new Feature(0, t,
                    Shapes.holeCircle(ctx, d.boltCount(), d.boltCircle(), d.anchorHole(), start)));
            default -> List.of(new Feature(t - d.anchorDepth(), t,
                    Shapes.holeCircle(ctx, d.boltCount(), d.boltCircle(), d.anchorHole(), start)));
        };
    }

    /** Arc openings between the seat wall and the disc ports, webs between them. */
    static Region exhaust(Dims d, GeometryContext ctx) {
        int n = d.coverExhaustCount();
        double webDeg = Math.toDegrees(d.coverExhaustWeb() / (d.coverExhaustInner() / 2));
        double sweep = 360.0 / n - webDeg;
        List<Region> arcs = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            arcs.add(Region.arcBand(ctx, 0, 0, d.coverExhaustInner(), d.coverExhaustOuter(),
                    360.0 * k / n + webDeg / 2 + 30.0 / n, sweep));
        }
        return Region.unionAll(ctx, arcs);
    }

    /** A cut applied to the heights [u0, u1]. */
    record Feature(double u0, double u1, Region cut) {
    }

    /** Builds slabs between all feature heights, each slab the outline minus the cuts that cover it. */
    static LayeredSolid stack(GeometryContext ctx, Region outline, double u0, double u1, List<Feature> cuts) {
        TreeSet<Double> zs = new TreeSet<>();
        zs.add(ctx.snap(u0));
        zs.add(ctx.snap(u1));
        for (Feature f : cuts) {
            zs.add(ctx.snap(f.u0()));
            zs.add(ctx.snap(f.u1()));
        }
        List<Double> levels = new ArrayList<>(zs.subSet(ctx.snap(u0), true, ctx.snap(u1), true));
        List<Slab> slabs = new ArrayList<>();
        for (int i = 0; i + 1 < levels.size(); i++) {
            double a = levels.get(i);
            double b = levels.get(i + 1);
            Region r = outline;
            for (Feature f : cuts) {
                if (ctx.snap(f.u0()) <= a && ctx.snap(f.u1()) >= b) {
                    r = r.minus(f.cut());
                }
            }
            slabs.add(new Slab(a, b, r));
        }
        return LayeredSolid.of(ctx, slabs);
    }
}
