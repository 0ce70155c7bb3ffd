package org.shearstack.view;

import org.shearstack.geom.Mesh;

/**
 * Small closed meshes made directly as arrays (box, ring, cylinder along Z), for the sample assembly and
 * tests. Circle points at multiples of 90 degrees are exact, so a cut through the axis meets vertices.
 */
public final class SampleShapes {

    private SampleShapes() {
    }

    /** An axis-aligned box, outward normals. */
    public static Mesh box(double x0Mm, double y0Mm, double z0Mm, double x1Mm, double y1Mm, double z1Mm) {
        double[] xyz = {
            x0Mm, y0Mm, z0Mm, x1Mm, y0Mm, z0Mm, x1Mm, y1Mm, z0Mm, x0Mm, y1Mm, z0Mm,
            x0Mm, y0Mm, z1Mm, x1Mm, y0Mm, z1Mm, x1Mm, y1Mm, z1Mm, x0Mm, y1Mm, z1Mm};
        int[] tri = {
            0, 2, 1, 0, 3, 2, // bottom, -z
            4, 5, 6, 4, 6, 7, // top, +z
            0, 1, 5, 0, 5, 4, // -y
            1, 2, 6, 1, 6, 5, // +x
            2, 3, 7, 2, 7, 6, // +y
            3, 0, 4, 3, 4, 7}; // -x
        return Mesh.of(xyz, tri);
    }

    /**
     * A flat ring (washer) around the Z axis from z0 to z1, faceted with {@code segments} sides.
     *
     * @param segments a multiple of 4, at least 4
     */
    public static Mesh ring(double innerRadiusMm, double outerRadiusMm, double z0Mm, double z1Mm, int segments) {
        checkSegments(segments);
        if (!(innerRadiusMm > 0 && outerRadiusMm > innerRadiusMm && z1Mm > z0Mm)) {
            throw new IllegalArgumentException("ring: expected 0 < inner radius < outer radius and z0 < z1, found "
                    + innerRadiusMm + ", " + outerRadiusMm + ", " + z0Mm + ", " + z1Mm);
        }
        int n = segments;
        double[] xyz = new double[12 * n];
        double[][] circles = {{outerRadiusMm, z0Mm}, {outerRadiusMm, z1Mm}, {innerRadiusMm, z0Mm}, {innerRadiusMm, z1Mm}};
        for (int c = 0; c < 4; c++) {
            for (int k = 0; k < n; k++) {
                int v = c * n + k;
                xyz[3 * v] = circles[c][0] * cosOfStep(k, n);
                xyz[3 * v + 1] = circles[c][0] * sinOfStep(k, n);
                xyz[3 * v + 2] = circles[c][1];
            }
        }
        int[] tri = new int[24 * n];
        int i = 0;
        for (int k = 0; k < n; k++) {
            int k1 = (k + 1) % n;
            int ob = k;
            int ob1 = k1;
            int ot = n + k;
            int ot1 = n + k1;
            int ib = 2 * n + k;
            int ib1 = 2 * n + k1;
            int it = 3 * n + k;
            int it1 = 3 * n + k1;
            int[] quads = {
                ob, ob1, ot1, ob, ot1, ot, // outer wall
                ib, it1, ib1, ib, it, it1, // inner wall
                it, ot, ot1, it, ot1, it1, // top
                ib, ob1, ob, ib, ib1, ob1}; // bottom
            System.arraycopy(quads, 0, tri, i, quads.length);
            i += quads.length;
        }
        return Mesh.of(xyz, tri);
    }

    /** A solid cylinder around the Z axis from z0 to z1 (end faces as fans around a centre vertex). */
    public static Mesh cylinder(double radiusMm, double z0Mm, double z1Mm, int segments) {
        checkSegments(segments);
        if (!(radiusMm > 0 && z1Mm > z0Mm)) {
            throw new IllegalArgumentException("cylinder: expected radius > 0 and z0 < z1, found "
                    + radiusMm + ", " + z0Mm + ", " + z1Mm);
        }
        int n = segments;
        double[] xyz = new double[6 * n + 6];
        for (int k = 0; k < n; k++) {
            for (int c = 0; c < 2; c++) {
                int v = c * n + k;
                xyz[3 * v] = radiusMm * cosOfStep(k, n);
                xyz[3 * v + 1] = radiusMm * sinOfStep(k, n);
                xyz[3 * v + 2] = c == 0 ? z0Mm : z1Mm;
            }
        }
        int bottomCentre = 2 * n;
        int topCentre = 2 * n + 1;
        xyz[3 * bottomCentre + 2] = z0Mm;
        xyz[3 * topCentre + 2] = z1Mm;
        int[] tri = new int[12 * n];
        int i = 0;
        for (int k = 0; k < n; k++) {
            int k1 = (k + 1) % n;
            int[] faces = {
                k, k1, n + k1, k, n + k1, n + k,
                topCentre, n + k, n + k1,
                bottomCentre, k1, k};
            System.arraycopy(faces, 0, tri, i, faces.length);
            i += faces.length;
        }
        return Mesh.of(xyz, tri);
    }

    /** Several meshes as one (shells side by side, indices shifted). */
    public static Mesh join(Mesh... meshes) {
        int vertices = 0;
        int triangles = 0;
        for (Mesh m : meshes) {
            vertices += m.vertexCount();
            triangles += m.triangleCount();
        }
        double[] xyz = new double[3 * vertices];
        int[] tri = new int[3 * triangles];
        int v = 0;
        int t = 0;
        for (Mesh m : meshes) {
            System.arraycopy(m.vertexArray(), 0, xyz, 3 * v, 3 * m.vertexCount());
            int[] own = m.triangleArray();
            for (int i = 0; i < own.length; i++) {
                tri[3 * t + i] = own[i] + v;
            }
            v += m.vertexCount();
            t += m.triangleCount();
        }
        return Mesh.of(xyz, tri);
    }

    /** cos(2 pi k / n), exact at multiples of a quarter turn. */
    static double cosOfStep(int k, int n) {
        return sinOfStep(k + n / 4, n);
    }

    /** sin(2 pi k / n), exact at multiples of a quarter turn. */
    static double sinOfStep(int k, int n) {
        int m = Math.floorMod(k, n);
        if (4 * m % n == 0) {
            return new double[] {0, 1, 0, -1}[4 * m / n];
        }
        return Math.sin(2 * Math.PI * m / n);
    }

    private static void checkSegments(int segments) {
        if (segments < 4 || segments % 4 != 0) {
            throw new IllegalArgumentException("segments: expected a multiple of 4 (at least 4), found " + segments);
        }
    }
}
