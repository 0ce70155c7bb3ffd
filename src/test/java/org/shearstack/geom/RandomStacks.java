package org.shearstack.geom;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/** Seeded random stacks for property tests: rings and holes, shared, crossing and edge-touching boundaries. */
final class RandomStacks {

    private final GeometryContext ctx;
    private final Random rnd;

    RandomStacks(GeometryContext ctx, long seed) {
        this.ctx = ctx;
        this.rnd = new Random(seed);
    }

    LayeredSolid stack() {
        int slabs = 1 + rnd.nextInt(5);
        List<Slab> out = new ArrayList<>();
        double z = rnd.nextInt(5) * 0.25 - 0.5;
        Region previous = null;
        for (int i = 0; i < slabs; i++) {
            double h = 0.1 + rnd.nextInt(12) * 0.2 + (rnd.nextBoolean() ? 0.0 : rnd.nextDouble());
            Region r;
            double u = rnd.nextDouble();
            if (previous == null || u < 0.3) {
                r = region();
            } else if (u < 0.5) {
                r = previous; // equal neighbour: shared boundaries everywhere
            } else if (u < 0.75) {
                r = previous.minus(feature()); // shares part of its boundary with the slab below
            } else {
                r = previous.union(feature()).minus(hole());
            }
            if (!r.isEmpty()) {
                out.add(new Slab(z, z + h, r));
                previous = r;
            }
            z += h;
            if (rnd.nextDouble() < 0.15) {
                z += 0.5; // a gap: separate shells
            }
        }
        if (out.isEmpty()) {
            out.add(new Slab(0, 1, region()));
        }
        return LayeredSolid.of(ctx, out);
    }

    Region region() {
        Region r = feature();
        for (int k = rnd.nextInt(3); k > 0; k--) {
            r = r.union(feature());
        }
        if (rnd.nextDouble() < 0.3) {
            // an edge-touching rectangle: shares the full right edge of the bounds
            Bounds2 b = r.bounds();
            r = r.union(Region.rectangle(ctx, b.maxXMm() - 1, b.minYMm(), b.maxXMm() + 3, b.minYMm() + 2));
        }
        for (int k = rnd.nextInt(4); k > 0; k--) {
            r = r.minus(hole());
        }
        return r;
    }

    Region feature() {
        double cx = coord();
        double cy = coord();
        return switch (rnd.nextInt(6)) {
            case 0 -> Region.disc(ctx, cx, cy, 4 + rnd.nextDouble() * 26);
            case 1 -> Region.centredRectangle(ctx, cx, cy, 3 + rnd.nextDouble() * 20, 3 + rnd.nextDouble() * 20);
            case 2 -> Region.annulus(ctx, cx, cy, 20 + rnd.nextDouble() * 10, 4 + rnd.nextDouble() * 12);
            case 3 -> Region.arcBand(ctx, cx, cy, rnd.nextDouble() * 8, 12 + rnd.nextDouble() * 14,
                    rnd.nextDouble() * 360, 20 + rnd.nextDouble() * 300);
            case 4 -> Region.slot(ctx, cx, cy, coord(), coord(), 2 + rnd.nextDouble() * 6);
            default -> star(cx, cy);
        };
    }

    Region hole() {
        double cx = coord();
        double cy = coord();
        return switch (rnd.nextInt(4)) {
            case 0 -> Region.boreCircle(ctx, cx, cy, 1 + rnd.nextDouble() * 8);
            case 1 -> Region.regularPolygon(ctx, cx, cy, 6, 2 + rnd.nextDouble() * 6, rnd.nextDouble() * 60);
            case 2 -> Region.slotCut(ctx, cx, cy, cx + rnd.nextDouble() * 8, cy + rnd.nextDouble() * 3,
                    1 + rnd.nextDouble() * 3);
            default -> Region.centredRectangle(ctx, cx, cy, 1 + rnd.nextDouble() * 6, 1 + rnd.nextDouble() * 6);
        };
    }

    private Region star(double cx, double cy) {
        int n = 5 + rnd.nextInt(8);
        double[] xy = new double[2 * n];
        for (int k = 0; k < n; k++) {
            double a = 2 * Math.PI * k / n;
            double r = 3 + rnd.nextDouble() * 10;
            xy[2 * k] = cx + r * Math.cos(a);
            xy[2 * k + 1] = cy + r * Math.sin(a);
        }
        return Region.polygon(ctx, xy);
    }

    private double coord() {
        return (rnd.nextDouble() - 0.5) * 30;
    }
}
