package org.shearstack.geom;

import java.util.ArrayList;
import java.util.List;

import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.noding.SegmentExtractingNoder;
import org.locationtech.jts.operation.overlayng.OverlayNG;
import org.locationtech.jts.triangulate.polygon.PolygonTriangulator;
import org.locationtech.jts.triangulate.tri.Tri;

/**
 * Turns a layered solid into a closed indexed mesh (DESIGN §2, kernel-notes recipe):
 * <ol>
 * <li>merge neighbouring slabs with equal regions;</li>
 * <li>at every interface z (A below, B above, either may be empty) the up face is A − B and the down face
 * B − A (OverlayNG on the grid); the interface's node set is every vertex of A, B and both faces;</li>
 * <li>each slab wall segment is split at the node-set points whose hot pixel (the snap-rounding criterion)
 * it crosses, separately at its bottom and top, and the two chains are zipped into triangles;</li>
 * <li>faces are triangulated from their boundary vertices only (JTS PolygonTriangulator: hole joining plus
 * ear clipping, no Steiner points) and each triangle's winding is forced (up faces CCW, down faces CW
 * seen from above);</li>
 * <li>vertices are shared by grid key while they are created, never welded afterwards.</li>
 * </ol>
 * When the solid has been {@link LayeredSolid#noded() noded}, no wall needs splitting and every slab is an
 * exact prism.
 */
final class StackMesher {

    private final GeometryContext ctx;
    private final VertexTable vertices;
    private final IntList triangles;
    private int wallSplits;
    private final boolean assumeNoded;

    private StackMesher(GeometryContext ctx, int expectedTriangles, boolean assumeNoded) {
        this.ctx = ctx;
        this.assumeNoded = assumeNoded;
        this.vertices = new VertexTable(ctx.scale(), expectedTriangles / 2);
        this.triangles = new IntList(3 * expectedTriangles);
    }

    /** Meshes a solid that came out of {@link LayeredSolid#noded()}. */
    static Mesh meshNoded(LayeredSolid nodedSolid) {
        return build(nodedSolid, true).mesh;
    }

    /** The mesh together with the number of wall splits needed (0 for a fully noded solid). */
    static Result build(LayeredSolid solid) {
        return build(solid, false);
    }

    static Result build(LayeredSolid solid, boolean assumeNoded) {
        List<Band> bands = mergeEqual(solid.slabs());
        int points = 0;
        for (Band b : bands) {
            points += b.geometry.getNumPoints();
        }
        StackMesher m = new StackMesher(solid.context(), 4 * points, assumeNoded);
        m.run(bands);
        return new Result(Mesh.ownedCopy(m.vertices.coordinates(), m.triangles.toArray()), m.wallSplits);
    }

    record Result(Mesh mesh, int wallSplits) {
    }

    private record Band(double z0, double z1, Geometry geometry) {
    }

    private static List<Band> mergeEqual(List<Slab> slabs) {
        List<Band> out = new ArrayList<>();
        for (Slab s : slabs) {
            Geometry g = s.region().jts();
            if (!out.isEmpty()) {
                Band last = out.get(out.size() - 1);
                if (last.z1 == s.z0Mm() && sameGeometry(last.geometry, g)) {
                    out.set(out.size() - 1, new Band(last.z0, s.z1Mm(), last.geometry));
                    continue;
                }
            }
            out.add(new Band(s.z0Mm(), s.z1Mm(), g));
        }
        return out;
    }

    private static boolean sameGeometry(Geometry a, Geometry b) {
        if (a == b) {
            return true;
        }
        return a.getNumPoints() == b.getNumPoints() && a.getEnvelopeInternal().equals(b.getEnvelopeInternal())
                && a.equalsNorm(b);
    }

    private record Interface(double z, Geometry below, Geometry above) {
    }

    /**
     * One interface's faces without height: local vertices (grid indices x, y), triangles on them (winding
     * fixed), and the interface's node index.
     */
    private record Faces(long[] xy, int[] triangles, NodeIndex nodes) {
    }

    /**
     * The regions on both sides of an interface, equal when both sides are the same geometry or exactly equal
     * geometries (same rings, same vertex order), which have the same faces and nodes.
     */
    private static final class PairKey {
        private final Geometry below;
        private final Geometry above;
        private final int hash;

        PairKey(Geometry below, Geometry above) {
            this.below = below;
            this.above = above;
            this.hash = 31 * shapeHash(below) + shapeHash(above);
        }

        private static int shapeHash(Geometry g) {
            return g == null ? 0 : g.getNumPoints() * 31 + g.getEnvelopeInternal().hashCode();
        }

        private static boolean same(Geometry a, Geometry b) {
            return a == b || (a != null && b != null && a.getNumPoints() == b.getNumPoints() && a.equalsExact(b));
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof PairKey k && k.hash == hash && same(below, k.below) && same(above, k.above);
        }

        @Override
        public int hashCode() {
            return hash;
        }
    }

    private void run(List<Band> bands) {
        int n = bands.size();
        List<Interface> interfaces = new ArrayList<>();
        int[] below = new int[n];
        int[] above = new int[n];
        for (int i = 0; i < n; i++) {
            Band b = bands.get(i);
            if (i == 0 || bands.get(i - 1).z1 != b.z0) {
                below[i] = interfaces.size();
                interfaces.add(new Interface(b.z0, null, b.geometry));
            }
            Band next = i + 1 < n ? bands.get(i + 1) : null;
            above[i] = interfaces.size();
            if (next != null && next.z0 == b.z1) {
                below[i + 1] = interfaces.size();
                interfaces.add(new Interface(b.z1, b.geometry, next.geometry));
            } else {
                interfaces.add(new Interface(b.z1, b.geometry, null));
            }
        }
        // Interfaces with the same pair of regions (below, above) have the same faces and node set at another
        // height: each distinct pair is computed once (its first occurrence, in order, so the result does not
        // depend on scheduling). Distinct interfaces are independent: computed in parallel, then emitted in
        // order, so the output (vertex and triangle order) is the same as a sequential run.
        int[] rep = new int[interfaces.size()];
        List<Integer> distinct = new ArrayList<>();
        java.util.Map<PairKey, Integer> firstOf = new java.util.HashMap<>();
        for (int k = 0; k < interfaces.size(); k++) {
            Interface in = interfaces.get(k);
            Integer first = firstOf.putIfAbsent(new PairKey(in.below, in.above), distinct.size());
            if (first == null) {
                rep[k] = distinct.size();
                distinct.add(k);
            } else {
                rep[k] = first;
            }
        }
        List<Faces> computed = distinct.parallelStream().map(k -> faces(interfaces.get(k))).toList();
        List<Faces> faces = new ArrayList<>(interfaces.size());
        for (int k = 0; k < interfaces.size(); k++) {
            faces.add(computed.get(rep[k]));
        }
        for (int k = 0; k < interfaces.size(); k++) {
            Faces f = faces.get(k);
            long iz = ctx.gridIndex(interfaces.get(k).z);
            int[] global = new int[f.xy.length / 2];
            for (int v = 0; v < global.length; v++) {
                global[v] = vertices.index(f.xy[2 * v], f.xy[2 * v + 1], iz);
            }
            int[] c = f.triangles;
            for (int t = 0; t < c.length; t += 3) {
                triangles.add(global[c[t]], global[c[t + 1]], global[c[t + 2]]);
            }
        }
        for (int i = 0; i < n; i++) {
            walls(bands.get(i), faces.get(below[i]).nodes, faces.get(above[i]).nodes);
        }
    }

    /** The up and down faces at one interface, and its node index. */
    private Faces faces(Interface in) {
        Geometry a = in.below;
        Geometry b = in.above;
        Geometry up;
        Geometry down;
        if (a == null) {
            up = null;
            down = b;
        } else if (b == null) {
            up = a;
            down = null;
        } else {
            up = difference(a, b);
            down = difference(b, a);
        }
        NodeIndex nodes = new NodeIndex(ctx.scale());
        nodes.addAll(a);
        nodes.addAll(b);
        if (a != null && b != null) {
            nodes.addAll(up);
            nodes.addAll(down);
        }
        nodes.build();
        List<Coordinate[]> tris = new ArrayList<>();
        triangulate(up, true, tris);
        triangulate(down, false, tris);
        // index the face vertices locally, so each is looked up once per height in the mesh's vertex table
        VertexTable local = new VertexTable(ctx.scale(), Math.max(16, tris.size()));
        int[] corners = new int[3 * tris.size()];
        double scale = ctx.scale();
        int k = 0;
        for (Coordinate[] t : tris) {
            for (Coordinate c : t) {
                corners[k++] = local.index((long) Math.rint(c.x * scale), (long) Math.rint(c.y * scale), 0);
            }
        }
        double[] xyz = local.coordinates();
        long[] xy = new long[2 * local.size()];
        for (int v = 0; v < local.size(); v++) {
            xy[2 * v] = (long) Math.rint(xyz[3 * v] * scale);
            xy[2 * v + 1] = (long) Math.rint(xyz[3 * v + 1] * scale);
        }
        return new Faces(xy, corners, nodes);
    }

    /**
     * A − B on the grid. For a noded solid (neighbours already snap-rounded together) the segments are
     * extracted as they are, skipping a second snap rounding; any failure falls back to the snap-rounding
     * overlay, and the wall splitting below keeps the mesh closed either way.
     */
    private Geometry difference(Geometry a, Geometry b) {
        if (assumeNoded) {
            try {
                Geometry g = OverlayNG.overlay(a, b, OverlayNG.DIFFERENCE, ctx.precisionModel(), new SegmentExtractingNoder());
                if (onGrid(g)) {
                    return g;
                }
            } catch (RuntimeException e) {
                // fall through to the robust overlay
            }
        }
        return OverlayNG.overlay(a, b, OverlayNG.DIFFERENCE, ctx.precisionModel());
    }

    private boolean onGrid(Geometry g) {
        double scale = ctx.scale();
        for (Coordinate c : g.getCoordinates()) {
            if (Math.rint(c.x * scale) != c.x * scale || Math.rint(c.y * scale) != c.y * scale) {
                return false;
            }
        }
        return true;
    }

    /** Triangles of each face polygon from its boundary vertices, wound CCW seen from above if up, else CW. */
    private static void triangulate(Geometry faces, boolean up, List<Coordinate[]> out) {
        if (faces == null || faces.isEmpty()) {
            return;
        }
        for (int i = 0; i < faces.getNumGeometries(); i++) {
            Geometry part = faces.getGeometryN(i);
            if (!(part instanceof Polygon p) || p.isEmpty()) {
                continue;
            }
            for (Tri t : new PolygonTriangulator(p).getTriangles()) {
                Coordinate p0 = t.getCoordinate(0);
                Coordinate p1 = t.getCoordinate(1);
                Coordinate p2 = t.getCoordinate(2);
                double cross = (p1.x - p0.x) * (p2.y - p0.y) - (p1.y - p0.y) * (p2.x - p0.x);
                out.add((cross > 0) == up ? new Coordinate[] {p0, p1, p2} : new Coordinate[] {p0, p2, p1});
            }
        }
    }

    private int vertex(Coordinate c, long iz) {
        double scale = ctx.scale(); // grid points: the products are whole numbers
        return vertices.index((long) Math.rint(c.x * scale), (long) Math.rint(c.y * scale), iz);
    }

    private void walls(Band band, NodeIndex bottomNodes, NodeIndex topNodes) {
        long iz0 = ctx.gridIndex(band.z0);
        long iz1 = ctx.gridIndex(band.z1);
        Geometry g = band.geometry;
        for (int i = 0; i < g.getNumGeometries(); i++) {
            Polygon p = (Polygon) g.getGeometryN(i);
            wallRing(p.getExteriorRing(), false, iz0, iz1, bottomNodes, topNodes);
            for (int h = 0; h < p.getNumInteriorRing(); h++) {
                wallRing(p.getInteriorRingN(h), true, iz0, iz1, bottomNodes, topNodes);
            }
        }
    }

    private void wallRing(LineString ring, boolean hole, long iz0, long iz1, NodeIndex bottomNodes,
            NodeIndex topNodes) {
        Coordinate[] cs = ring.getCoordinates();
        boolean ccw = Orientation.isCCWArea(cs);
        boolean reverse = ccw == hole; // shells counter-clockwise, holes clockwise
        int n = cs.length - 1;
        List<Coordinate> bottom = new ArrayList<>();
        List<Coordinate> top = new ArrayList<>();
        // consecutive segments share their end vertices: carried over instead of looked up again
        Coordinate first = reverse ? cs[n] : cs[0];
        int firstB = vertex(first, iz0);
        int firstT = vertex(first, iz1);
        lastB = firstB;
        lastT = firstT;
        for (int k = 0; k < n; k++) {
            Coordinate p = reverse ? cs[n - k] : cs[k];
            Coordinate q = reverse ? cs[n - k - 1] : cs[k + 1];
            bottom.clear();
            top.clear();
            bottomNodes.split(p, q, bottom);
            topNodes.split(p, q, top);
            wallSplits += bottom.size() + top.size() - 4;
            boolean closing = k == n - 1;
            zipper(p, q, bottom, top, iz0, iz1, lastB, lastT, closing ? firstB : -1, closing ? firstT : -1);
        }
    }

    /** The end vertices (bottom, top) of the last zipped segment. */
    private int lastB;
    private int lastT;

    /** Triangulates the strip between the bottom chain and the top chain of one wall segment p→q. */
    private void zipper(Coordinate p, Coordinate q, List<Coordinate> bottom, List<Coordinate> top, long iz0,
            long iz1, int b0, int t0, int bEnd, int tEnd) {
        double dx = q.x - p.x;
        double dy = q.y - p.y;
        int i = 0;
        int j = 0;
        int mb = bottom.size() - 1;
        int mt = top.size() - 1;
        int b = b0;
        int t = t0;
        while (i < mb || j < mt) {
            boolean advanceBottom;
            if (i == mb) {
                advanceBottom = false;
            } else if (j == mt) {
                advanceBottom = true;
            } else {
                advanceBottom = param(bottom.get(i + 1), p, dx, dy) <= param(top.get(j + 1), p, dx, dy);
            }
            if (advanceBottom) {
                ++i;
                int nb = i == mb && bEnd >= 0 ? bEnd : vertex(bottom.get(i), iz0);
                triangles.add(b, nb, t);
                b = nb;
            } else {
                ++j;
                int nt = j == mt && tEnd >= 0 ? tEnd : vertex(top.get(j), iz1);
                triangles.add(b, nt, t);
                t = nt;
            }
        }
        lastB = b;
        lastT = t;
    }

    private static double param(Coordinate c, Coordinate p, double dx, double dy) {
        return (c.x - p.x) * dx + (c.y - p.y) * dy;
    }
}
