package org.shearstack.geom;

import java.util.ArrayList;
import java.util.Collection;
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
            List<Geometry> opened = ContactResolver.open(ctx, r.regions, z0, z1);
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

    private static NodeResult nodeOnce(GeometryContext ctx, List<Geometry> regions) {
        List<SegmentString> input = new ArrayList<>();
        for (int s = 0; s < regions.size(); s++) {
            Geometry g = regions.get(s);
            for (int p = 0; p < g.getNumGeometries(); p++) {
                Polygon poly = (Polygon) g.getGeometryN(p);
                if (poly.isEmpty()) {
                    continue;
                }
                input.add(new NodedSegmentString(poly.getExteriorRing().getCoordinates(), new RingId(s, p, 0)));
                for (int h = 0; h < poly.getNumInteriorRing(); h++) {
                    input.add(new NodedSegmentString(poly.getInteriorRingN(h).getCoordinates(), new RingId(s, p, h + 1)));
                }
            }
        }
        SnapRoundingNoder noder = new SnapRoundingNoder(ctx.precisionModel());
        noder.computeNodes(input);
        @SuppressWarnings("unchecked")
        Collection<SegmentString> pieces = noder.getNodedSubstrings();
        Map<Object, List<Coordinate>> rings = new java.util.HashMap<>();
        for (SegmentString piece : pieces) {
            List<Coordinate> ring = rings.computeIfAbsent(piece.getData(), k -> new ArrayList<>());
            Coordinate[] cs = piece.getCoordinates();
            for (int i = 0; i < cs.length; i++) {
                if (ring.isEmpty() || !ring.get(ring.size() - 1).equals2D(cs[i])) {
                    ring.add(cs[i]);
                }
            }
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
