package org.shearstack.geom;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.operation.overlayng.OverlayNG;
import org.locationtech.jts.operation.overlayng.UnaryUnionNG;

/**
 * Finds and removes the two contacts that no meshing can make 2-manifold (kernel-notes P7, P8):
 * <ul>
 * <li>a pinch: one grid vertex used twice by the rings of one slab (parts or holes touching at a point);</li>
 * <li>an opposite-side contact: a boundary edge of the slab below that the slab above has reversed (material
 * on opposite sides), so two bodies meet along an edge.</li>
 * </ul>
 * Each is opened by cutting away a square (pinch; one grid cell to each side, wider in later rounds) or a
 * strip (edge; 1.5 grid cells to each side) from the slab (the upper one for an edge contact): a change far
 * below any printer's resolution that makes the solid a proper 2-manifold.
 */
final class ContactResolver {

    private ContactResolver() {
    }

    private record Edge(long px, long py, long qx, long qy) {
    }

    /** A slab's region and the region directly below it (or null), compared by identity. */
    private record IdentityPair(Geometry region, Geometry below) {
        @Override
        public boolean equals(Object o) {
            return o instanceof IdentityPair p && p.region == region && p.below == below;
        }

        @Override
        public int hashCode() {
            return 31 * System.identityHashCode(region) + System.identityHashCode(below);
        }
    }

    /** Returns the regions with contacts opened, or the same list if none were found. */
    static List<Geometry> open(GeometryContext ctx, List<Geometry> regions, double[] z0, double[] z1, int round) {
        List<Geometry> out = new ArrayList<>(regions);
        boolean changed = false;
        GeometryFactory f = ctx.factory();
        double g = ctx.gridMm();
        // tangent curves stay within a grid cell of each other over a length of about sqrt(2 R grid), so a
        // pinch found again in a later round is opened with a square four times as wide
        double half = g * Math.pow(4, round);
        // slabs sharing a region (and the region below) share their result: computed once per distinct pair
        java.util.Map<IdentityPair, Geometry> done = new java.util.HashMap<>();
        for (int s = 0; s < regions.size(); s++) {
            boolean stacked = s > 0 && z1[s - 1] == z0[s];
            IdentityPair pair = new IdentityPair(regions.get(s), stacked ? regions.get(s - 1) : null);
            Geometry known = done.get(pair);
            if (known != null) {
                if (known != regions.get(s)) {
                    out.set(s, known);
                    changed = true;
                }
                continue;
            }
            List<Geometry> cuts = new ArrayList<>();
            Set<Long> seen = new HashSet<>();
            Set<Long> pinched = new HashSet<>();
            forEachRing(regions.get(s), cs -> {
                for (int i = 0; i + 1 < cs.length; i++) {
                    long key = key(ctx, cs[i]);
                    if (!seen.add(key) && pinched.add(key)) {
                        cuts.add(square(f, cs[i], half));
                    }
                }
            });
            if (stacked) {
                Set<Edge> below = new HashSet<>();
                forEachRing(regions.get(s - 1), cs -> {
                    for (int i = 0; i + 1 < cs.length; i++) {
                        below.add(edge(ctx, cs[i], cs[i + 1]));
                    }
                });
                forEachRing(regions.get(s), cs -> {
                    for (int i = 0; i + 1 < cs.length; i++) {
                        if (below.contains(edge(ctx, cs[i + 1], cs[i]))) {
                            cuts.add(strip(f, cs[i], cs[i + 1], g));
                        }
                    }
                });
            }
            if (!cuts.isEmpty()) {
                Geometry cut = UnaryUnionNG.union(f.buildGeometry(cuts), ctx.precisionModel());
                out.set(s, OverlayNG.overlay(regions.get(s), cut, OverlayNG.DIFFERENCE, ctx.precisionModel()));
                changed = true;
            }
            done.put(pair, out.get(s));
        }
        return changed ? out : regions;
    }

    /** Calls {@code action} with every ring's closed coordinates, shells counter-clockwise, holes clockwise. */
    static void forEachRing(Geometry region, java.util.function.Consumer<Coordinate[]> action) {
        for (int p = 0; p < region.getNumGeometries(); p++) {
            Polygon poly = (Polygon) region.getGeometryN(p);
            if (poly.isEmpty()) {
                continue;
            }
            action.accept(oriented(poly.getExteriorRing(), false));
            for (int h = 0; h < poly.getNumInteriorRing(); h++) {
                action.accept(oriented(poly.getInteriorRingN(h), true));
            }
        }
    }

    private static Coordinate[] oriented(LineString ring, boolean hole) {
        Coordinate[] cs = ring.getCoordinates();
        if (Orientation.isCCWArea(cs) == hole) {
            Coordinate[] r = new Coordinate[cs.length];
            for (int i = 0; i < cs.length; i++) {
                r[i] = cs[cs.length - 1 - i];
            }
            return r;
        }
        return cs;
    }

    private static long key(GeometryContext ctx, Coordinate c) {
        return ctx.gridIndex(c.x) * 0x1_0000_0001L ^ Long.rotateLeft(ctx.gridIndex(c.y), 32) * 31;
    }

    private static Edge edge(GeometryContext ctx, Coordinate p, Coordinate q) {
        return new Edge(ctx.gridIndex(p.x), ctx.gridIndex(p.y), ctx.gridIndex(q.x), ctx.gridIndex(q.y));
    }

    private static Geometry square(GeometryFactory f, Coordinate c, double half) {
        return f.toGeometry(new org.locationtech.jts.geom.Envelope(c.x - half, c.x + half, c.y - half, c.y + half));
    }

    /** A rectangle one grid cell to each side of p→q, extended one cell past both ends. */
    private static Geometry strip(GeometryFactory f, Coordinate p, Coordinate q, double g) {
        double len = p.distance(q);
        double ux = (q.x - p.x) / len * g * 1.5;
        double uy = (q.y - p.y) / len * g * 1.5;
        Coordinate[] cs = {
            new Coordinate(p.x - ux + uy, p.y - uy - ux), new Coordinate(q.x + ux + uy, q.y + uy - ux),
            new Coordinate(q.x + ux - uy, q.y + uy + ux), new Coordinate(p.x - ux - uy, p.y - uy + ux),
            new Coordinate(p.x - ux + uy, p.y - uy - ux)};
        return f.createPolygon(cs);
    }
}
