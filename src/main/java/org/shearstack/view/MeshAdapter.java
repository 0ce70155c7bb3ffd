package org.shearstack.view;

import org.shearstack.geom.Mesh;

/**
 * Turns our mesh into JavaFX mesh arrays: coordinates relative to an origin, degenerate triangles left
 * out, per-corner normals smoothed across edges flatter than a crease angle (a faceted cylinder looks
 * round, a disc's rim stays sharp).
 */
public final class MeshAdapter {

    /** Farthest a vertex may be from the origin: beyond this float coordinates lose sub-0.1 mm detail. */
    public static final double MAX_DISTANCE_FROM_ORIGIN_MM = 1.0e6;

    /** Crease angle used by the viewer: edges sharper than this stay sharp. */
    public static final double DEFAULT_CREASE_DEGREES = 35.0;

    /** A triangle whose doubled area is below this fraction of its longest edge squared counts as degenerate. */
    private static final double DEGENERATE_RELATIVE_AREA = 1.0e-12;

    private MeshAdapter() {
    }

    /**
     * Converts a mesh.
     *
     * @param mesh          the mesh, mm, in the frame to draw
     * @param originMm      x, y, z subtracted from every vertex (usually the scene centre)
     * @param creaseDegrees edges between faces whose normals differ by more than this stay sharp
     * @throws IllegalArgumentException naming the vertex when a coordinate is too far from the origin
     */
    public static FxMeshArrays toArrays(Mesh mesh, double[] originMm, double creaseDegrees) {
        if (originMm.length != 3) {
            throw new IllegalArgumentException("origin: expected 3 coordinates, found " + originMm.length);
        }
        if (!(creaseDegrees >= 0 && creaseDegrees <= 180)) {
            throw new IllegalArgumentException("crease angle: expected 0..180 degrees, found " + creaseDegrees);
        }
        float[] points = relativePoints(mesh, originMm);
        double[] faceNormals = new double[3 * mesh.triangleCount()];
        boolean[] kept = new boolean[mesh.triangleCount()];
        int keptCount = 0;
        for (int t = 0; t < mesh.triangleCount(); t++) {
            kept[t] = faceNormal(mesh, t, faceNormals);
            keptCount += kept[t] ? 1 : 0;
        }
        int[][] incident = incidentFaces(mesh, kept);
        double cosCrease = Math.cos(Math.toRadians(creaseDegrees));
        float[] normals = new float[9 * keptCount];
        int[] faces = new int[9 * keptCount];
        int f = 0;
        for (int t = 0; t < mesh.triangleCount(); t++) {
            if (!kept[t]) {
                continue;
            }
            for (int c = 0; c < 3; c++) {
                int v = mesh.corner(t, c);
                double[] n = cornerNormal(t, incident[v], faceNormals, cosCrease);
                int normalIndex = 3 * f + c;
                normals[3 * normalIndex] = (float) n[0];
                normals[3 * normalIndex + 1] = (float) n[1];
                normals[3 * normalIndex + 2] = (float) n[2];
                faces[9 * f + 3 * c] = v;
                faces[9 * f + 3 * c + 1] = normalIndex;
                faces[9 * f + 3 * c + 2] = 0;
            }
            f++;
        }
        return new FxMeshArrays(points, normals, new float[] {0f, 0f}, faces, mesh.triangleCount() - keptCount);
    }

    private static float[] relativePoints(Mesh mesh, double[] originMm) {
        float[] points = new float[3 * mesh.vertexCount()];
        for (int v = 0; v < mesh.vertexCount(); v++) {
            double[] p = {mesh.x(v) - originMm[0], mesh.y(v) - originMm[1], mesh.z(v) - originMm[2]};
            for (int a = 0; a < 3; a++) {
                if (!(Math.abs(p[a]) <= MAX_DISTANCE_FROM_ORIGIN_MM)) {
                    throw new IllegalArgumentException("vertex " + v + " coordinate " + "xyz".charAt(a)
                            + ": expected within " + MAX_DISTANCE_FROM_ORIGIN_MM + " mm of the scene centre, found "
                            + p[a] + " mm from it (is the file in another unit?)");
                }
                points[3 * v + a] = (float) p[a];
            }
        }
        return points;
    }

    /** Writes the area-weighted normal (the cross product) of triangle t; false when it has no area. */
    private static boolean faceNormal(Mesh mesh, int t, double[] out) {
        int a = mesh.corner(t, 0);
        int b = mesh.corner(t, 1);
        int c = mesh.corner(t, 2);
        if (a == b || b == c || a == c) {
            return false;
        }
        double ux = mesh.x(b) - mesh.x(a);
        double uy = mesh.y(b) - mesh.y(a);
        double uz = mesh.z(b) - mesh.z(a);
        double vx = mesh.x(c) - mesh.x(a);
        double vy = mesh.y(c) - mesh.y(a);
        double vz = mesh.z(c) - mesh.z(a);
        double nx = uy * vz - uz * vy;
        double ny = uz * vx - ux * vz;
        double nz = ux * vy - uy * vx;
        double wx = mesh.x(c) - mesh.x(b);
        double wy = mesh.y(c) - mesh.y(b);
        double wz = mesh.z(c) - mesh.z(b);
        double longest = Math.max(ux * ux + uy * uy + uz * uz,
                Math.max(vx * vx + vy * vy + vz * vz, wx * wx + wy * wy + wz * wz));
        double length = Math.sqrt(nx * nx + ny * ny + nz * nz);
        if (!(length > DEGENERATE_RELATIVE_AREA * longest)) {
            return false;
        }
        out[3 * t] = nx;
        out[3 * t + 1] = ny;
        out[3 * t + 2] = nz;
        return true;
    }

    private static int[][] incidentFaces(Mesh mesh, boolean[] kept) {
        int[] count = new int[mesh.vertexCount()];
        for (int t = 0; t < mesh.triangleCount(); t++) {
            if (kept[t]) {
                for (int c = 0; c < 3; c++) {
                    count[mesh.corner(t, c)]++;
                }
            }
        }
        int[][] incident = new int[mesh.vertexCount()][];
        for (int v = 0; v < incident.length; v++) {
            incident[v] = new int[count[v]];
            count[v] = 0;
        }
        for (int t = 0; t < mesh.triangleCount(); t++) {
            if (kept[t]) {
                for (int c = 0; c < 3; c++) {
                    int v = mesh.corner(t, c);
                    incident[v][count[v]++] = t;
                }
            }
        }
        return incident;
    }

    private static double[] cornerNormal(int face, int[] around, double[] faceNormals, double cosCrease) {
        double[] own = unit(faceNormals, face);
        double sx = 0;
        double sy = 0;
        double sz = 0;
        for (int g : around) {
            double[] other = unit(faceNormals, g);
            if (own[0] * other[0] + own[1] * other[1] + own[2] * other[2] >= cosCrease) {
                sx += faceNormals[3 * g];
                sy += faceNormals[3 * g + 1];
                sz += faceNormals[3 * g + 2];
            }
        }
        double length = Math.sqrt(sx * sx + sy * sy + sz * sz);
        return length > 0 ? new double[] {sx / length, sy / length, sz / length} : own;
    }

    private static double[] unit(double[] normals, int face) {
        double x = normals[3 * face];
        double y = normals[3 * face + 1];
        double z = normals[3 * face + 2];
        double length = Math.sqrt(x * x + y * y + z * z);
        return new double[] {x / length, y / length, z / length};
    }
}
