package org.shearstack.view;

import org.shearstack.geom.Mesh;

/**
 * A rigid placement of a part in the assembly frame (mm): rotation rows then translation.
 * A point p maps to R p + t.
 */
public record Placement(
        double r00, double r01, double r02,
        double r10, double r11, double r12,
        double r20, double r21, double r22,
        double txMm, double tyMm, double tzMm) {

    public static final Placement IDENTITY = new Placement(1, 0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0);

    public Placement {
        double[] all = {r00, r01, r02, r10, r11, r12, r20, r21, r22, txMm, tyMm, tzMm};
        for (int i = 0; i < all.length; i++) {
            if (!Double.isFinite(all[i])) {
                throw new IllegalArgumentException("placement entry " + i + ": expected a finite number, found " + all[i]);
            }
        }
    }

    /** A pure translation. */
    public static Placement translation(double xMm, double yMm, double zMm) {
        return new Placement(1, 0, 0, 0, 1, 0, 0, 0, 1, xMm, yMm, zMm);
    }

    /**
     * From a 3MF-style row-major 3x4 matrix as used by the 3MF core specification's transform attribute
     * (m00 m01 m02 m10 m11 m12 m20 m21 m22 m30 m31 m32, points as row vectors: p' = p M).
     */
    public static Placement fromThreeMfMatrix(double[] m) {
        if (m.length != 12) {
            throw new IllegalArgumentException("3MF transform: expected 12 numbers, found " + m.length);
        }
        // p' = p M with p a row vector: x' = x m00 + y m10 + z m20 + m30, so R has rows (m00 m10 m20) ...
        return new Placement(m[0], m[3], m[6], m[1], m[4], m[7], m[2], m[5], m[8], m[9], m[10], m[11]);
    }

    /** From a kernel transform (3x4 matrix [A | t]). */
    public static Placement of(org.shearstack.geom.Transform t) {
        return new Placement(t.element(0, 0), t.element(0, 1), t.element(0, 2), t.element(1, 0), t.element(1, 1),
                t.element(1, 2), t.element(2, 0), t.element(2, 1), t.element(2, 2), t.element(0, 3), t.element(1, 3),
                t.element(2, 3));
    }

    /** The image of point (x, y, z). */
    public double[] apply(double xMm, double yMm, double zMm) {
        return new double[] {
            r00 * xMm + r01 * yMm + r02 * zMm + txMm,
            r10 * xMm + r11 * yMm + r12 * zMm + tyMm,
            r20 * xMm + r21 * yMm + r22 * zMm + tzMm};
    }

    /** The mesh moved by this placement (the same mesh when this is the identity). */
    public Mesh apply(Mesh mesh) {
        if (equals(IDENTITY)) {
            return mesh;
        }
        double[] xyz = mesh.vertexArray();
        for (int i = 0; i < xyz.length; i += 3) {
            double[] p = apply(xyz[i], xyz[i + 1], xyz[i + 2]);
            xyz[i] = p[0];
            xyz[i + 1] = p[1];
            xyz[i + 2] = p[2];
        }
        int[] tri = mesh.triangleArray();
        if (determinant() < 0) {
            for (int t = 0; t < tri.length; t += 3) {
                int swap = tri[t + 1];
                tri[t + 1] = tri[t + 2];
                tri[t + 2] = swap;
            }
        }
        return Mesh.of(xyz, tri);
    }

    /** Determinant of the rotation part; negative for a mirroring placement. */
    public double determinant() {
        return r00 * (r11 * r22 - r12 * r21) - r01 * (r10 * r22 - r12 * r20) + r02 * (r10 * r21 - r11 * r20);
    }
}
