package org.shearstack.geom;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Validates a mesh as a solid: directed-edge pairing (each directed edge once, its reverse once), degenerate
 * triangles, finite coordinates, shells (edge-connected components) with their genus from the Euler
 * characteristic and their signed volumes (divergence theorem, sum of signed tetrahedra from the origin).
 */
public final class MeshCheck {

    private MeshCheck() {
    }

    public static MeshReport validate(Mesh mesh) {
        double[] xyz = mesh.xyzUnsafe();
        int[] tri = mesh.trianglesUnsafe();
        int nv = mesh.vertexCount();
        int nt = mesh.triangleCount();

        int nonFinite = 0;
        for (double c : xyz) {
            if (!Double.isFinite(c)) {
                nonFinite++;
            }
        }
        int degenerate = 0;
        for (int t = 0; t < nt; t++) {
            int a = tri[3 * t];
            int b = tri[3 * t + 1];
            int c = tri[3 * t + 2];
            if (a == b || b == c || a == c || isZeroArea(xyz, a, b, c)) {
                degenerate++;
            }
        }

        long[] edges = new long[3 * nt];
        for (int t = 0; t < nt; t++) {
            for (int k = 0; k < 3; k++) {
                long a = tri[3 * t + k];
                long b = tri[3 * t + (k + 1) % 3];
                edges[3 * t + k] = (a << 32) | b;
            }
        }
        Arrays.sort(edges);
        int open = 0;
        int duplicate = 0;
        for (int i = 0; i < edges.length; i++) {
            if (i > 0 && edges[i] == edges[i - 1]) {
                duplicate++;
                continue;
            }
            long rev = ((edges[i] & 0xffffffffL) << 32) | (edges[i] >>> 32);
            if (Arrays.binarySearch(edges, rev) < 0) {
                open++;
            }
        }

        // shells: union-find over vertices joined by triangle edges
        int[] parent = new int[nv];
        for (int i = 0; i < nv; i++) {
            parent[i] = i;
        }
        boolean[] used = new boolean[nv];
        for (int t = 0; t < nt; t++) {
            int a = tri[3 * t];
            used[a] = true;
            for (int k = 1; k < 3; k++) {
                used[tri[3 * t + k]] = true;
                union(parent, a, tri[3 * t + k]);
            }
        }
        int unused = 0;
        int[] shellOf = new int[nv];
        int shells = 0;
        int[] rootShell = new int[nv];
        Arrays.fill(rootShell, -1);
        for (int v = 0; v < nv; v++) {
            if (!used[v]) {
                unused++;
                continue;
            }
            int r = find(parent, v);
            if (rootShell[r] < 0) {
                rootShell[r] = shells++;
            }
            shellOf[v] = rootShell[r];
        }
        long[] vCount = new long[shells];
        long[] fCount = new long[shells];
        double[] vol = new double[shells];
        for (int v = 0; v < nv; v++) {
            if (used[v]) {
                vCount[shellOf[v]]++;
            }
        }
        double total = 0;
        for (int t = 0; t < nt; t++) {
            int s = shellOf[tri[3 * t]];
            fCount[s]++;
            double v6 = tetra6(xyz, tri[3 * t], tri[3 * t + 1], tri[3 * t + 2]);
            vol[s] += v6 / 6;
            total += v6;
        }
        boolean closed = open == 0 && duplicate == 0;
        List<Integer> genus = new ArrayList<>();
        List<Double> volumes = new ArrayList<>();
        for (int s = 0; s < shells; s++) {
            long e = 3 * fCount[s] / 2;
            long chi = vCount[s] - e + fCount[s];
            genus.add(closed && (fCount[s] % 2 == 0) && chi % 2 == 0 ? (int) ((2 - chi) / 2) : -1);
            volumes.add(vol[s]);
        }
        int pinched = closed ? pinchedVertices(tri, nv) : 0;
        return new MeshReport(nv, nt, open, duplicate, degenerate, nonFinite, unused, pinched, shells, genus, volumes,
                total / 6);
    }

    /** Vertices whose link (the edges opposite them) is more than one cycle; the mesh must be closed. */
    private static int pinchedVertices(int[] tri, int nv) {
        int[] start = new int[nv + 1];
        for (int c : tri) {
            start[c + 1]++;
        }
        for (int v = 0; v < nv; v++) {
            start[v + 1] += start[v];
        }
        long[] link = new long[tri.length];
        int[] fill = start.clone();
        for (int t = 0; t < tri.length; t += 3) {
            for (int k = 0; k < 3; k++) {
                int v = tri[t + k];
                long a = tri[t + (k + 1) % 3];
                long b = tri[t + (k + 2) % 3];
                link[fill[v]++] = (a << 32) | b;
            }
        }
        int pinched = 0;
        for (int v = 0; v < nv; v++) {
            int from = start[v];
            int to = start[v + 1];
            if (to - from < 3) {
                continue;
            }
            Arrays.sort(link, from, to);
            // follow the link cycle from the first edge; a manifold vertex visits all its edges
            long first = link[from];
            int visited = 0;
            long e = first;
            do {
                visited++;
                long next = e & 0xffffffffL;
                int i = Arrays.binarySearch(link, from, to, next << 32);
                int idx = i >= 0 ? i : -i - 1;
                if (idx >= to || (link[idx] >>> 32) != next) {
                    break;
                }
                e = link[idx];
            } while (e != first && visited <= to - from);
            if (visited != to - from) {
                pinched++;
            }
        }
        return pinched;
    }

    /** Six times the signed volume of the tetrahedron (origin, a, b, c). */
    static double tetra6(double[] xyz, int a, int b, int c) {
        double ax = xyz[3 * a];
        double ay = xyz[3 * a + 1];
        double az = xyz[3 * a + 2];
        double bx = xyz[3 * b];
        double by = xyz[3 * b + 1];
        double bz = xyz[3 * b + 2];
        double cx = xyz[3 * c];
        double cy = xyz[3 * c + 1];
        double cz = xyz[3 * c + 2];
        return ax * (by * cz - bz * cy) - ay * (bx * cz - bz * cx) + az * (bx * cy - by * cx);
    }

    private static boolean isZeroArea(double[] xyz, int a, int b, int c) {
        double ux = xyz[3 * b] - xyz[3 * a];
        double uy = xyz[3 * b + 1] - xyz[3 * a + 1];
        double uz = xyz[3 * b + 2] - xyz[3 * a + 2];
        double vx = xyz[3 * c] - xyz[3 * a];
        double vy = xyz[3 * c + 1] - xyz[3 * a + 1];
        double vz = xyz[3 * c + 2] - xyz[3 * a + 2];
        double nx = uy * vz - uz * vy;
        double ny = uz * vx - ux * vz;
        double nz = ux * vy - uy * vx;
        return nx == 0 && ny == 0 && nz == 0;
    }

    private static int find(int[] parent, int v) {
        while (parent[v] != v) {
            parent[v] = parent[parent[v]];
            v = parent[v];
        }
        return v;
    }

    private static void union(int[] parent, int a, int b) {
        int ra = find(parent, a);
        int rb = find(parent, b);
        if (ra != rb) {
            parent[Math.max(ra, rb)] = Math.min(ra, rb);
        }
    }
}
