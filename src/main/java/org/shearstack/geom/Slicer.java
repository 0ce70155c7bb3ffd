package org.shearstack.geom;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateArrays;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.util.GeometryFixer;
import org.locationtech.jts.operation.overlayng.OverlayNG;

/**
 * Cuts a mesh (ours or a foreign one) by horizontal planes into {@link Region}s, so the printability checks
 * can run on any mesh. Triangle–plane intersection gives one segment per crossing triangle (a vertex on the
 * plane counts as above it); segment ends are keyed by the mesh edge they lie on, so chaining is exact by
 * topology, not by coordinates; closed chains become rings (points collinear with their neighbours dropped,
 * then rounded to the grid), and the region is the even-odd combination
 * (symmetric difference) of all rings, which handles any nesting of islands and holes.
 */
public final class Slicer {

    private Slicer() {
    }

    /**
     * A cross-section.
     *
     * @param region     the material at that height
     * @param openChains chains that did not close (the mesh is not closed there); 0 for a valid solid
     */
    public record Section(double zMm, Region region, int openChains) {
    }

    /** The cross-section of {@code mesh} at height {@code zMm}. */
    public static Section section(Mesh mesh, double zMm, GeometryContext ctx) {
        double[] xyz = mesh.xyzUnsafe();
        int[] tri = mesh.trianglesUnsafe();
        // segment i joins edge key ends[2i] and ends[2i+1]; points stored per edge key
        Map<Long, int[]> byEdge = new HashMap<>();
        Map<Long, Coordinate> points = new HashMap<>();
        List<long[]> segments = new ArrayList<>();
        for (int t = 0; t < tri.length; t += 3) {
            long[] ends = new long[2];
            int found = 0;
            for (int k = 0; k < 3 && found < 2; k++) {
                int a = tri[t + k];
                int b = tri[t + (k + 1) % 3];
                boolean aAbove = xyz[3 * a + 2] >= zMm;
                boolean bAbove = xyz[3 * b + 2] >= zMm;
                if (aAbove != bAbove) {
                    int lo = Math.min(a, b);
                    int hi = Math.max(a, b);
                    long key = ((long) lo << 32) | hi;
                    ends[found++] = key;
                    points.computeIfAbsent(key, kk -> crossing(xyz, lo, hi, zMm, ctx));
                }
            }
            if (found == 2) {
                int idx = segments.size();
                segments.add(ends);
                for (long e : ends) {
                    int[] s = byEdge.get(e);
                    if (s == null) {
                        byEdge.put(e, new int[] {idx, -1});
                    } else if (s[1] < 0) {
                        s[1] = idx;
                    }
                }
            }
        }
        boolean[] used = new boolean[segments.size()];
        GeometryFactory f = ctx.factory();
        Geometry acc = f.createPolygon();
        int open = 0;
        for (int s0 = 0; s0 < segments.size(); s0++) {
            if (used[s0]) {
                continue;
            }
            List<Coordinate> ring = new ArrayList<>();
            long start = segments.get(s0)[0];
            long at = start;
            int s = s0;
            boolean closed = false;
            while (s >= 0 && !used[s]) {
                used[s] = true;
                ring.add(points.get(at));
                long[] ends = segments.get(s);
                at = ends[0] == at ? ends[1] : ends[0];
                if (at == start) {
                    closed = true;
                    break;
                }
                int[] pair = byEdge.get(at);
                s = pair[0] == s ? pair[1] : pair[0];
            }
            if (!closed) {
                open++;
                continue;
            }
            List<Coordinate> kept = dropCollinear(ring);
            List<Coordinate> snapped = new ArrayList<>();
            for (Coordinate c : kept) {
                snapped.add(new Coordinate(ctx.snap(c.x), ctx.snap(c.y)));
            }
            if (snapped.isEmpty()) {
                continue;
            }
            snapped.add(snapped.get(0));
            Coordinate[] cs = CoordinateArrays.removeRepeatedPoints(snapped.toArray(new Coordinate[0]));
            if (cs.length < 4) {
                continue;
            }
            Geometry poly = f.createPolygon(cs);
            if (!poly.isValid()) {
                poly = GeometryFixer.fix(poly);
            }
            if (poly.isEmpty() || poly.getArea() == 0) {
                continue;
            }
            acc = OverlayNG.overlay(acc, poly, OverlayNG.SYMDIFFERENCE, ctx.precisionModel());
        }
        return new Section(zMm, Region.fromGeometry(ctx, acc), open);
    }

    /**
     * The mesh as a layered solid with slabs between consecutive {@code boundariesMm} (ascending), each slab's
     * region being the section at the slab's mid-height.
     */
    public static LayeredSolid slabs(Mesh mesh, GeometryContext ctx, double... boundariesMm) {
        List<Slab> out = new ArrayList<>();
        for (int i = 0; i + 1 < boundariesMm.length; i++) {
            if (!(boundariesMm[i + 1] > boundariesMm[i])) {
                throw new IllegalArgumentException("slice heights: expected ascending values, found " + boundariesMm[i]
                        + " then " + boundariesMm[i + 1] + " at index " + (i + 1));
            }
            Region r = section(mesh, (boundariesMm[i] + boundariesMm[i + 1]) / 2, ctx).region();
            if (!r.isEmpty()) {
                out.add(new Slab(boundariesMm[i], boundariesMm[i + 1], r));
            }
        }
        return LayeredSolid.of(ctx, out);
    }

    private static Coordinate crossing(double[] xyz, int lo, int hi, double z, GeometryContext ctx) {
        double za = xyz[3 * lo + 2];
        double zb = xyz[3 * hi + 2];
        double t = (z - za) / (zb - za);
        double x = xyz[3 * lo] + t * (xyz[3 * hi] - xyz[3 * lo]);
        double y = xyz[3 * lo + 1] + t * (xyz[3 * hi + 1] - xyz[3 * lo + 1]);
        return new Coordinate(x, y);
    }

    /**
     * Drops points that lie on the line through their neighbours (to 1e-12 relative), e.g. where a wall's
     * diagonal edge crosses the plane, so the ring keeps only the mesh's own corners before grid rounding.
     */
    private static List<Coordinate> dropCollinear(List<Coordinate> ring) {
        List<Coordinate> out = new ArrayList<>(ring);
        boolean removed = true;
        while (removed && out.size() > 3) {
            removed = false;
            for (int i = 0; i < out.size() && out.size() > 3; i++) {
                Coordinate a = out.get((i + out.size() - 1) % out.size());
                Coordinate b = out.get(i);
                Coordinate c = out.get((i + 1) % out.size());
                double cross = (b.x - a.x) * (c.y - a.y) - (b.y - a.y) * (c.x - a.x);
                double dot = (b.x - a.x) * (c.x - b.x) + (b.y - a.y) * (c.y - b.y);
                double scale = a.distance(b) * b.distance(c);
                if (b.equals2D(a) || (Math.abs(cross) <= 1e-12 * scale && dot > 0)) {
                    out.remove(i);
                    removed = true;
                    i--;
                }
            }
        }
        return out;
    }
}
