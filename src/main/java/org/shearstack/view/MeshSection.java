package org.shearstack.view;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.operation.polygonize.Polygonizer;
import org.locationtech.jts.triangulate.polygon.ConstrainedDelaunayTriangulator;
import org.shearstack.geom.Mesh;

/**
 * The section view's cut: keeps the half of a closed mesh with y &ge; 0 (the plane y = 0 contains the
 * turbine axis, Z) and closes the cut with a face built from the cut outline, so the result is closed
 * again. Cut vertices on an edge are shared by both triangles of that edge; the cut face uses only
 * outline vertices, so every edge of body plus cap is used exactly twice.
 */
public final class MeshSection {

    private MeshSection() {
    }

    /** Cuts an assembly-frame mesh with the half-space y &ge; 0. */
    public static SectionResult keepPositiveY(Mesh mesh) {
        boolean closed = isClosed(mesh);
        Clipped clipped = clip(mesh);
        Mesh body = Mesh.of(clipped.xyz(), clipped.triangles());
        Mesh empty = Mesh.of(clipped.xyz(), new int[0]);
        if (clipped.triangles().length == 0 || !clipped.touchedPlane()) {
            return new SectionResult(body, empty, "");
        }
        if (!closed) {
            return new SectionResult(body, empty, "mesh is not closed, so the cut face cannot be filled");
        }
        return cap(body);
    }

    /** True when every directed edge occurs once and its reverse occurs once. */
    public static boolean isClosed(Mesh mesh) {
        Set<Long> directed = new HashSet<>();
        long n = mesh.vertexCount();
        for (int t = 0; t < mesh.triangleCount(); t++) {
            for (int c = 0; c < 3; c++) {
                if (!directed.add(mesh.corner(t, c) * n + mesh.corner(t, (c + 1) % 3))) {
                    return false;
                }
            }
        }
        for (long e : directed) {
            if (!directed.contains((e % n) * n + e / n)) {
                return false;
            }
        }
        return true;
    }

    private record Clipped(double[] xyz, int[] triangles, boolean touchedPlane) {
    }

    private static Clipped clip(Mesh mesh) {
        List<Double> extra = new ArrayList<>();
        Map<Long, Integer> cutVertex = new HashMap<>();
        int base = mesh.vertexCount();
        List<Integer> out = new ArrayList<>();
        boolean touched = false;
        int[] polygon = new int[4];
        for (int t = 0; t < mesh.triangleCount(); t++) {
            int a = mesh.corner(t, 0);
            int b = mesh.corner(t, 1);
            int c = mesh.corner(t, 2);
            double da = mesh.y(a);
            double db = mesh.y(b);
            double dc = mesh.y(c);
            if (da < 0 || db < 0 || dc < 0 || da == 0 || db == 0 || dc == 0) {
                touched = true;
            }
            if (da == 0 && db == 0 && dc == 0) {
                continue; // lies in the cut plane: the cut face replaces it
            }
            int size = 0;
            int[] corners = {a, b, c};
            for (int i = 0; i < 3; i++) {
                int p = corners[i];
                int q = corners[(i + 1) % 3];
                double dp = mesh.y(p);
                double dq = mesh.y(q);
                if (dp >= 0) {
                    polygon[size++] = p;
                }
                if ((dp > 0 && dq < 0) || (dp < 0 && dq > 0)) {
                    polygon[size++] = cutVertexOn(mesh, p, q, cutVertex, extra, base);
                }
            }
            for (int i = 1; i + 1 < size; i++) {
                out.add(polygon[0]);
                out.add(polygon[i]);
                out.add(polygon[i + 1]);
            }
        }
        double[] xyz = new double[3 * base + extra.size()];
        System.arraycopy(mesh.vertexArray(), 0, xyz, 0, 3 * base);
        for (int i = 0; i < extra.size(); i++) {
            xyz[3 * base + i] = extra.get(i);
        }
        return compact(xyz, out.stream().mapToInt(Integer::intValue).toArray(), touched);
    }

    private static int cutVertexOn(Mesh mesh, int p, int q, Map<Long, Integer> cache, List<Double> extra, int base) {
        int lo = Math.min(p, q);
        int hi = Math.max(p, q);
        long key = (long) lo * mesh.vertexCount() + hi;
        Integer known = cache.get(key);
        if (known != null) {
            return known;
        }
        double dlo = mesh.y(lo);
        double dhi = mesh.y(hi);
        double s = dlo / (dlo - dhi);
        extra.add(mesh.x(lo) + s * (mesh.x(hi) - mesh.x(lo)));
        extra.add(0.0);
        extra.add(mesh.z(lo) + s * (mesh.z(hi) - mesh.z(lo)));
        int index = base + extra.size() / 3 - 1;
        cache.put(key, index);
        return index;
    }

    /** Drops unused vertices. */
    private static Clipped compact(double[] xyz, int[] triangles, boolean touched) {
        int[] map = new int[xyz.length / 3];
        java.util.Arrays.fill(map, -1);
        int next = 0;
        for (int v : triangles) {
            if (map[v] < 0) {
                map[v] = next++;
            }
        }
        double[] packed = new double[3 * next];
        for (int v = 0; v < map.length; v++) {
            if (map[v] >= 0) {
                System.arraycopy(xyz, 3 * v, packed, 3 * map[v], 3);
            }
        }
        int[] tri = new int[triangles.length];
        for (int i = 0; i < tri.length; i++) {
            tri[i] = map[triangles[i]];
        }
        return new Clipped(packed, tri, touched);
    }

    private static SectionResult cap(Mesh body) {
        Mesh noCap = Mesh.of(body.vertexArray(), new int[0]);
        long n = body.vertexCount();
        Set<Long> directed = new HashSet<>();
        for (int t = 0; t < body.triangleCount(); t++) {
            for (int c = 0; c < 3; c++) {
                directed.add(body.corner(t, c) * n + body.corner(t, (c + 1) % 3));
            }
        }
        GeometryFactory factory = new GeometryFactory();
        Polygonizer polygonizer = new Polygonizer(true);
        Map<PlanePoint, Integer> vertexAt = new HashMap<>();
        int outlineEdges = 0;
        for (long e : directed) {
            int from = (int) (e / n);
            int to = (int) (e % n);
            if (directed.contains(to * n + from)) {
                continue;
            }
            if (body.y(from) != 0 || body.y(to) != 0) {
                return new SectionResult(body, noCap, "cut outline leaves the cut plane; cut face not filled");
            }
            outlineEdges++;
            vertexAt.put(xzKey(body, from), from);
            vertexAt.put(xzKey(body, to), to);
            polygonizer.add(factory.createLineString(new Coordinate[] {
                new Coordinate(body.x(from), body.z(from)), new Coordinate(body.x(to), body.z(to))}));
        }
        if (outlineEdges == 0) {
            return new SectionResult(body, noCap, "");
        }
        @SuppressWarnings("unchecked")
        Collection<Polygon> faces = polygonizer.getPolygons();
        if (!polygonizer.getDangles().isEmpty() || !polygonizer.getCutEdges().isEmpty()
                || !polygonizer.getInvalidRingLines().isEmpty()) {
            return new SectionResult(body, noCap, "cut outline is not a set of closed loops; cut face not filled");
        }
        List<Integer> capTriangles = new ArrayList<>();
        for (Polygon face : faces) {
            Geometry triangles = ConstrainedDelaunayTriangulator.triangulate(face);
            for (int i = 0; i < triangles.getNumGeometries(); i++) {
                Coordinate[] ring = triangles.getGeometryN(i).getCoordinates();
                int[] tri = new int[3];
                for (int k = 0; k < 3; k++) {
                    Integer v = vertexAt.get(xzKey(ring[k].x, ring[k].y));
                    if (v == null) {
                        return new SectionResult(body, noCap, "cut face needed a vertex off the outline; not filled");
                    }
                    tri[k] = v;
                }
                orientTowardsNegativeY(body, tri);
                capTriangles.add(tri[0]);
                capTriangles.add(tri[1]);
                capTriangles.add(tri[2]);
            }
        }
        Mesh cap = Mesh.of(body.vertexArray(), capTriangles.stream().mapToInt(Integer::intValue).toArray());
        return new SectionResult(body, cap, "");
    }

    /** The cut face looks into the removed half (outward normal -y). */
    private static void orientTowardsNegativeY(Mesh body, int[] tri) {
        double ux = body.x(tri[1]) - body.x(tri[0]);
        double uz = body.z(tri[1]) - body.z(tri[0]);
        double vx = body.x(tri[2]) - body.x(tri[0]);
        double vz = body.z(tri[2]) - body.z(tri[0]);
        double normalY = uz * vx - ux * vz;
        if (normalY > 0) {
            int swap = tri[1];
            tri[1] = tri[2];
            tri[2] = swap;
        }
    }

    private static PlanePoint xzKey(Mesh body, int v) {
        return xzKey(body.x(v), body.z(v));
    }

    private static PlanePoint xzKey(double x, double z) {
        return new PlanePoint(x + 0.0, z + 0.0); // + 0.0 turns -0.0 into 0.0
    }

    /** A point of the cut plane, exact. */
    private record PlanePoint(double x, double z) {
    }
}
