package org.shearstack.view;

import org.shearstack.geom.Mesh;

/** An axis-aligned box, mm; {@link #EMPTY} contains nothing. */
public record Box3(double minX, double minY, double minZ, double maxX, double maxY, double maxZ) {

    public static final Box3 EMPTY = new Box3(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY,
            Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY);

    public static Box3 of(Mesh mesh) {
        Box3 box = EMPTY;
        for (int t = 0; t < mesh.triangleCount(); t++) {
            for (int c = 0; c < 3; c++) {
                int v = mesh.corner(t, c);
                box = box.including(mesh.x(v), mesh.y(v), mesh.z(v));
            }
        }
        return box;
    }

    public boolean isEmpty() {
        return minX > maxX;
    }

    public Box3 including(double x, double y, double z) {
        return new Box3(Math.min(minX, x), Math.min(minY, y), Math.min(minZ, z),
                Math.max(maxX, x), Math.max(maxY, y), Math.max(maxZ, z));
    }

    public Box3 union(Box3 other) {
        if (other.isEmpty()) {
            return this;
        }
        return including(other.minX, other.minY, other.minZ).including(other.maxX, other.maxY, other.maxZ);
    }

    public Box3 shifted(double dx, double dy, double dz) {
        return isEmpty() ? this : new Box3(minX + dx, minY + dy, minZ + dz, maxX + dx, maxY + dy, maxZ + dz);
    }

    public double[] centre() {
        return isEmpty() ? new double[3] : new double[] {(minX + maxX) / 2, (minY + maxY) / 2, (minZ + maxZ) / 2};
    }

    /** Length of the diagonal (0 when empty). */
    public double diagonal() {
        if (isEmpty()) {
            return 0;
        }
        return Math.sqrt(sq(maxX - minX) + sq(maxY - minY) + sq(maxZ - minZ));
    }

    /** The eight corners, x y z each. */
    public double[][] corners() {
        double[][] out = new double[8][];
        for (int i = 0; i < 8; i++) {
            out[i] = new double[] {(i & 1) == 0 ? minX : maxX, (i & 2) == 0 ? minY : maxY, (i & 4) == 0 ? minZ : maxZ};
        }
        return out;
    }

    private static double sq(double v) {
        return v * v;
    }
}
