package org.shearstack.geom;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateArrays;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.GeometryFixer;
import org.locationtech.jts.noding.NodedSegmentString;
import org.locationtech.jts.noding.SegmentString;
import org.locationtech.jts.noding.snapround.SnapRoundingNoder;
import org.locationtech.jts.operation.overlayng.OverlayNG;

/**
 * Snap-rounds the rings of all slabs of a solid together (JTS SnapRoundingNoder on the context grid), so
 * every slab carries every crossing and near-touching node of its neighbours. Afterwards no wall needs
 * bending at an interface, each slab is an exact prism, and the mesh volume equals Σ area × height of the
 * noded slabs to rounding (kernel-notes, pitfall P1).
 */
final class StackNoder {

    private static final int MAX_ROUNDS = 6;

    private StackNoder() {
    }

    static LayeredSolid node(LayeredSolid solid) {
        List<Slab> slabs = solid.slabs();
        if (slabs.isEmpty()) {
            return solid;
        }
        GeometryContext ctx = solid.context();
        List<Geometry> regions = new ArrayList<>();
        for (Slab s : slabs) {
            regions.add(s.region().jts());
        }
        double[] z0 = new double[slabs.size()];
        double[] z1 = new double[slabs.size()];
        for (int i = 0; i < slabs.size(); i++) {
            z0[i] = slabs.get(i).z0Mm();
            z1[i] = slabs.get(i).z1Mm();
        }
        for (int round = 0; round < MAX_ROUNDS; round++) {
            NodeResult r = nodeOnce(ctx, regions);
            List<Geometry> opened = ContactResolver.open(ctx, r.regions, z0, z1, round);
            regions = opened;
            if (!r.repaired && opened == r.regions) {
                break;
            }
        }
        List<Slab> out = new ArrayList<>();
        for (int i = 0; i < slabs.size(); i++) {
            Geometry g = regions.get(i);
            if (g == slabs.get(i).region().jts()) {
                out.add(slabs.get(i));
            } else {
                out.add(slabs.get(i).withRegion(Region.ofValid(ctx, g)));
            }
        }
        return LayeredSolid.of(ctx, out);
    }

    private record NodeResult(List<Geometry> regions, boolean repaired) {
    }

    private record RingId(int slab, int polygon, int ring) {
    }

    private record Segment(double ax, double ay, double bx, double by) {
    }

    private static int compare(Coordinate a, Coordinate b) {
        int c = Double.compare(a.x, b.x);
        return c != 0 ? c : Double.compare(a.y, b.y);
    }

    /**
     * Nodes the distinct regions (by identity) once and shares each result among the slabs that had the same
     * region, so equal slabs stay one geometry object for the steps after (contacts, faces per interface pair).
     */
    private static NodeResult nodeOnce(GeometryContext ctx, List<Geometry> regions) {
        java.util.IdentityHashMap<Geometry, Integer> index = new java.util.IdentityHashMap<>();
        List<Geometry> distinct = new ArrayList<>();
        for (Geometry g : regions) {
            if (index.putIfAbsent(g, distinct.size()) == null) {
                distinct.add(g);
            }
        }
        NodeResult r = nodeDistinct(ctx, distinct);
        if (distinct.size() == regions.size()) {
            return r;
        }
        List<Geometry> out = new ArrayList<>(regions.size());
        for (Geometry g : regions) {
            out.add(r.regions.get(index.get(g)));
        }
        return new NodeResult(out, r.repaired);
    }

    private static NodeResult nodeDistinct(GeometryContext ctx, List<Geometry> regions) {
        // Node each distinct segment once: slabs repeat most of their neighbours' rings, and noding the
        // repeated copies together would be quadratic in the number of slabs.
        Map<Segment, Integer> segmentIds = new HashMap<>();
        List<SegmentString> input = new ArrayList<>();
        Map<RingId, int[]> ringSegments = new HashMap<>();
        for (int s = 0; s < regions.size(); s++) {
            Geometry g = regions.get(s);
            for (int p = 0; p < g.getNumGeometries(); p++) {
                Polygon poly = (Polygon) g.getGeometryN(p);
                if (poly.isEmpty()) {
                    continue;
                }
                for (int h = 0; h <= poly.getNumInteriorRing(); h++) {
                    Coordinate[] cs = (h == 0 ? poly.getExteriorRing() : poly.getInteriorRingN(h - 1)).getCoordinates();
                    int[] ids = new int[cs.length - 1];
                    for (int i = 0; i + 1 < cs.length; i++) {
                        boolean forward = compare(cs[i], cs[i + 1]) < 0;
                        Coordinate a = forward ? cs[i] : cs[i + 1];
                        Coordinate b = forward ? cs[i + 1] : cs[i];
                        Segment key = new Segment(a.x, a.y, b.x, b.y);
                        Integer id = segmentIds.get(key);
                        if (id == null) {
                            id = input.size();
                            segmentIds.put(key, id);
                            input.add(new NodedSegmentString(new Coordinate[] {a.copy(), b.copy()}, id));
                        }
                        ids[i] = forward ? id : ~id;
                    }
                    ringSegments.put(new RingId(s, p, h), ids);
                }
            }
        }
        SnapRoundingNoder noder = new SnapRoundingNoder(ctx.precisionModel());
        noder.computeNodes(input);
        @SuppressWarnings("unchecked")
        Collection<SegmentString> pieces = noder.getNodedSubstrings();
        List<List<Coordinate>> noded = new ArrayList<>(input.size());
        for (int i = 0; i < input.size(); i++) {
            noded.add(new ArrayList<>(2));
        }
        for (SegmentString piece : pieces) {
            List<Coordinate> path = noded.get((Integer) piece.getData());
            for (Coordinate c : piece.getCoordinates()) {
                if (path.isEmpty() || !path.get(path.size() - 1).equals2D(c)) {
                    path.add(c);
                }
            }
        }
        Map<RingId, List<Coordinate>> rings = new HashMap<>();
        for (Map.Entry<RingId, int[]> e : ringSegments.entrySet()) {
            List<Coordinate> ring = new ArrayList<>();
            for (int code : e.getValue()) {
                List<Coordinate> path = noded.get(code >= 0 ? code : ~code);
                int n = path.size();
                for (int k = 0; k < n; k++) {
                    Coordinate c = path.get(code >= 0 ? k : n - 1 - k);
                    if (ring.isEmpty() || !ring.get(ring.size() - 1).equals2D(c)) {
                        ring.add(c);
                    }
                }
            }
            rings.put(e.getKey(), ring);
        }
        GeometryFactory f = ctx.factory();
        List<Geometry> out = new ArrayList<>();
        boolean repaired = false;
        for (int s = 0; s < regions.size(); s++) {
            Geometry g = regions.get(s);
            List<Polygon> polys = new ArrayList<>();
            boolean changed = false;
            for (int p = 0; p < g.getNumGeometries(); p++) {
                Polygon poly = (Polygon) g.getGeometryN(p);
                if (poly.isEmpty()) {
                    continue;
                }
                LinearRing shell = ring(f, rings.get(new RingId(s, p, 0)));
                changed |= shell == null || shell.getNumPoints() != poly.getExteriorRing().getNumPoints();
                if (shell == null) {
                    continue;
                }
                List<LinearRing> holes = new ArrayList<>();
                for (int h = 0; h < poly.getNumInteriorRing(); h++) {
                    LinearRing hole = ring(f, rings.get(new RingId(s, p, h + 1)));
                    changed |= hole == null || hole.getNumPoints() != poly.getInteriorRingN(h).getNumPoints();
                    if (hole != null) {
                        holes.add(hole);
                    }
                }
                polys.add(f.createPolygon(shell, holes.toArray(new LinearRing[0])));
            }
            if (!changed) {
                out.add(g);
                continue;
            }
            Geometry rebuilt = polys.isEmpty() ? f.createPolygon()
                    : polys.size() == 1 ? polys.get(0) : f.createMultiPolygon(polys.toArray(new Polygon[0]));
            if (!rebuilt.isValid()) {
                // a ring pinched or two parts touched after rounding: repair, then node again
                Geometry fixed = GeometryFixer.fix(rebuilt);
                rebuilt = OverlayNG.overlay(fixed, f.createPolygon(), OverlayNG.UNION, ctx.precisionModel());
                repaired = true;
            }
            out.add(rebuilt);
        }
        return new NodeResult(out, repaired);
    }

    private static LinearRing ring(GeometryFactory f, List<Coordinate> pts) {
        if (pts == null) {
            return null;
        }
        List<Coordinate> c = new ArrayList<>(pts);
        if (!c.isEmpty() && !c.get(0).equals2D(c.get(c.size() - 1))) {
            c.add(c.get(0).copy());
        }
        Coordinate[] arr = CoordinateArrays.removeRepeatedPoints(c.toArray(new Coordinate[0]));
        if (arr.length < 4) {
            return null;
        }
        return f.createLinearRing(arr);
    }

}
