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
            cuts.addAll(roof(d, d.portPilotDepth(), t, d.portPilot(), d.portFeed(),
                    dia -> Region.boreCircle(ctx, d.plenumRadius(), 0, dia)));
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
                List<Feature> f = new ArrayList<>();
                f.add(new Feature(0, t, Shapes.holeCircle(ctx, d.boltCount(), d.boltCircle(), d.anchorHole(), start)));
                f.add(new Feature(0, d.anchorDepth(), Region.unionAll(ctx, pockets)));
                // the pocket's ceiling narrows at 45° to the screw hole, like a drill point
                f.addAll(roof(d, d.anchorDepth(), t, d.nutAcrossFlats(), d.anchorHole(), af -> {
                    List<Region> p = new ArrayList<>();
                    for (int k = 0; k < d.boltCount(); k++) {
                        double a = start + 360.0 * k / d.boltCount();
                        p.add(Region.regularPolygon(ctx, r * Shapes.cosDeg(a), r * Shapes.sinDeg(a), 6, af, a));
                    }
                    return Region.unionAll(ctx, p);
                }));
                yield f;
            }
            case "tapped" -> List.of(new Feature(0, t,
                    Shapes.holeCircle(ctx, d.boltCount(), d.boltCircle(), d.anchorHole(), start)));
            default -> List.of(new Feature(t - d.anchorDepth(), t,
                    Shapes.holeCircle(ctx, d.boltCount(), d.boltCircle(), d.anchorHole(), start)));
        };
    }

    /**
     * The ceiling over a wide pocket printed from below, stepped inward by one layer height per layer (45°,
     * as a drill point leaves it) until it meets the narrower hole above: the 45° overhang rule of FFF printing
     * (common practice), so the ceiling prints without support or bridging. {@code shape} gives the cut for a
     * size (diameter or across-flats); the steps stop below {@code top}.
     */
    static List<Feature> roof(Dims d, double from, double top, double wide, double narrow,
            java.util.function.DoubleFunction<Region> shape) {
        List<Feature> out = new ArrayList<>();
        double layer = d.layerHeight();
        double size = wide - 2 * layer;
        double u = from;
        while (size > narrow && u + layer <= top) {
            out.add(new Feature(u, u + layer, shape.apply(size)));
            size -= 2 * layer;
            u += layer;
        }
        return out;
    }

    /** Arc openings between the seat wall and the disc ports, webs between them. */
    public static Region exhaust(Dims d, GeometryContext ctx) {
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

    /**
     * Builds slabs between all feature heights, each slab the outline minus the cuts that cover it. Cuts through
     * the whole height are taken out once; each slab then takes out the union of its own partial cuts (one
     * overlay per distinct set of cuts rather than one per cut and slab).
     */
    static LayeredSolid stack(GeometryContext ctx, Region outline, double u0, double u1, List<Feature> cuts) {
        double lo = ctx.snap(u0);
        double hi = ctx.snap(u1);
        TreeSet<Double> zs = new TreeSet<>();
        zs.add(lo);
        zs.add(hi);
        List<Region> through = new ArrayList<>();
        List<Feature> partial = new ArrayList<>();
        for (Feature f : cuts) {
            zs.add(ctx.snap(f.u0()));
            zs.add(ctx.snap(f.u1()));
            if (ctx.snap(f.u0()) <= lo && ctx.snap(f.u1()) >= hi) {
                through.add(f.cut());
            } else {
                partial.add(f);
            }
        }
        Region base = through.isEmpty() ? outline : outline.minus(Region.unionAll(ctx, through));
        List<Double> levels = new ArrayList<>(zs.subSet(lo, true, hi, true));
        java.util.Map<java.util.BitSet, Region> bySet = new java.util.HashMap<>();
        List<Slab> slabs = new ArrayList<>();
        for (int i = 0; i + 1 < levels.size(); i++) {
            double a = levels.get(i);
            double b = levels.get(i + 1);
            java.util.BitSet active = new java.util.BitSet();
            for (int k = 0; k < partial.size(); k++) {
                Feature f = partial.get(k);
                if (ctx.snap(f.u0()) <= a && ctx.snap(f.u1()) >= b) {
                    active.set(k);
                }
            }
            Region r = bySet.computeIfAbsent(active, set -> set.isEmpty() ? base
                    : base.minus(Region.unionAll(ctx, set.stream().mapToObj(k -> partial.get(k).cut()).toList())));
            slabs.add(new Slab(a, b, r));
        }
        return LayeredSolid.of(ctx, slabs);
    }
}
