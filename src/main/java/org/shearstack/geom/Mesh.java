package org.shearstack.geom;

import java.util.Arrays;

/**
 * An immutable indexed triangle mesh in millimetres. Topology is by index: two triangles share an edge
 * exactly when they share the two vertex indices. Triangles wind counter-clockwise seen from outside.
 *
 * <p>The arrays are never exposed; readers use the accessors or take copies.
 */
public final class Mesh {

    private final double[] xyz;
    private final int[] triangles;

    private Mesh(double[] xyz, int[] triangles) {
        this.xyz = xyz;
        this.triangles = triangles;
    }

    /**
     * Builds a mesh from flat arrays (copied).
     *
     * @param xyz       x0, y0, z0, x1, ... in mm; length a multiple of 3
     * @param triangles a0, b0, c0, a1, ...; length a multiple of 3, every index in range
     * @throws IllegalArgumentException naming the first offending index, what was expected and what was found
     */
    public static Mesh of(double[] xyz, int[] triangles) {
        return ownedCopy(xyz.clone(), triangles.clone());
    }

    /** For kernel code that has just built fresh arrays it will not touch again: no copy. */
    static Mesh ownedCopy(double[] xyz, int[] triangles) {
        if (xyz.length % 3 != 0) {
            throw new IllegalArgumentException("vertex array length must be a multiple of 3, found " + xyz.length);
        }
        if (triangles.length % 3 != 0) {
            throw new IllegalArgumentException("triangle array length must be a multiple of 3, found " + triangles.length);
        }
        int vertexCount = xyz.length / 3;
        for (int i = 0; i < triangles.length; i++) {
            if (triangles[i] < 0 || triangles[i] >= vertexCount) {
                throw new IllegalArgumentException("triangle " + (i / 3) + " corner " + (i % 3)
                        + ": expected a vertex index in [0, " + vertexCount + "), found " + triangles[i]);
            }
        }
        for (int i = 0; i < xyz.length; i++) {
            if (!Double.isFinite(xyz[i])) {
                throw new IllegalArgumentException("vertex " + (i / 3) + " coordinate " + "xyz".charAt(i % 3)
                        + ": expected a finite number, found " + xyz[i]);
            }
        }
        return new Mesh(xyz, triangles);
    }

    public int vertexCount() {
        return xyz.length / 3;
    }

    public int triangleCount() {
        return triangles.length / 3;
    }

    public double x(int vertex) {
        return xyz[3 * vertex];
    }

    public double y(int vertex) {
        return xyz[3 * vertex + 1];
    }

    public double z(int vertex) {
        return xyz[3 * vertex + 2];
    }

    /** Vertex index of corner {@code corner} (0, 1, 2) of triangle {@code triangle}. */
    public int corner(int triangle, int corner) {
        return triangles[3 * triangle + corner];
    }

    /** A copy of the coordinates, x0, y0, z0, x1, ... */
    public double[] vertexArray() {
        return xyz.clone();
    }

    /** A copy of the triangle indices. */
    public int[] triangleArray() {
        return triangles.clone();
    }

    /**
     * This mesh moved by {@code transform}; same indices (no welding). A mirroring transform reverses every
     * triangle's winding so normals stay outward.
     */
    public Mesh transformed(Transform transform) {
        double[] out = new double[xyz.length];
        for (int i = 0; i < xyz.length; i += 3) {
            double x = xyz[i];
            double y = xyz[i + 1];
            double z = xyz[i + 2];
            out[i] = transform.applyX(x, y, z) + 0.0;
            out[i + 1] = transform.applyY(x, y, z) + 0.0;
            out[i + 2] = transform.applyZ(x, y, z) + 0.0;
        }
        int[] tri = triangles;
        if (transform.isMirroring()) {
            tri = triangles.clone();
            for (int t = 0; t < tri.length; t += 3) {
                int b = tri[t + 1];
                tri[t + 1] = tri[t + 2];
                tri[t + 2] = b;
            }
        }
        return new Mesh(out, tri);
    }

    /** The meshes side by side in one mesh (indices offset, nothing welded). */
    public static Mesh merged(java.util.List<Mesh> meshes) {
        int nv = 0;
        int nt = 0;
        for (Mesh m : meshes) {
            nv += m.xyz.length;
            nt += m.triangles.length;
        }
        double[] xyz = new double[nv];
        int[] tri = new int[nt];
        int vo = 0;
        int to = 0;
        for (Mesh m : meshes) {
            System.arraycopy(m.xyz, 0, xyz, vo, m.xyz.length);
            int base = vo / 3;
            for (int i = 0; i < m.triangles.length; i++) {
                tri[to + i] = m.triangles[i] + base;
            }
            vo += m.xyz.length;
            to += m.triangles.length;
        }
        return new Mesh(xyz, tri);
    }

    /** Direct access for kernel code that only reads (no copy). */
    double[] xyzUnsafe() {
        return xyz;
    }

    /** Direct access for kernel code that only reads (no copy). */
    int[] trianglesUnsafe() {
        return triangles;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Mesh m && Arrays.equals(xyz, m.xyz) && Arrays.equals(triangles, m.triangles);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(xyz) + Arrays.hashCode(triangles);
    }

    @Override
    public String toString() {
        return "Mesh[" + vertexCount() + " vertices, " + triangleCount() + " triangles]";
    }
}
