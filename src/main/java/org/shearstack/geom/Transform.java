package org.shearstack.geom;

/**
 * A rigid (or mirroring) 3D affine transform p' = A·p + t in mm, for placing parts in assemblies and print
 * orientation. Rotations are in degrees and exact at multiples of 90°. Immutable.
 */
public final class Transform {

    private static final Transform IDENTITY = new Transform(new double[] {1, 0, 0, 0, 1, 0, 0, 0, 1}, 0, 0, 0);

    private final double[] a; // row-major 3x3
    private final double tx;
    private final double ty;
    private final double tz;

    private Transform(double[] a, double tx, double ty, double tz) {
        this.a = a;
        this.tx = tx;
        this.ty = ty;
        this.tz = tz;
    }

    public static Transform identity() {
        return IDENTITY;
    }

    /** Rotation about +Z (counter-clockwise seen from above). */
    public static Transform rotationZDeg(double angleDeg) {
        double c = Degrees.cos(angleDeg);
        double s = Degrees.sin(angleDeg);
        return new Transform(new double[] {c, -s, 0, s, c, 0, 0, 0, 1}, 0, 0, 0);
    }

    /** Rotation about +X. */
    public static Transform rotationXDeg(double angleDeg) {
        double c = Degrees.cos(angleDeg);
        double s = Degrees.sin(angleDeg);
        return new Transform(new double[] {1, 0, 0, 0, c, -s, 0, s, c}, 0, 0, 0);
    }

    /** Rotation about +Y. */
    public static Transform rotationYDeg(double angleDeg) {
        double c = Degrees.cos(angleDeg);
        double s = Degrees.sin(angleDeg);
        return new Transform(new double[] {c, 0, s, 0, 1, 0, -s, 0, c}, 0, 0, 0);
    }

    /** Turns a part upside down for printing: a half turn about the X axis (y → −y, z → −z); not a mirror. */
    public static Transform flipOverX() {
        return rotationXDeg(180);
    }

    /** Mirror image across the plane z = 0 (reverses handedness; meshes flip their winding). */
    public static Transform mirrorZ() {
        return new Transform(new double[] {1, 0, 0, 0, 1, 0, 0, 0, -1}, 0, 0, 0);
    }

    public static Transform translation(double dxMm, double dyMm, double dzMm) {
        return new Transform(IDENTITY.a, dxMm, dyMm, dzMm);
    }

    /** This transform followed by {@code next} (p → next(this(p))). */
    public Transform then(Transform next) {
        double[] b = next.a;
        double[] m = new double[9];
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                m[3 * r + c] = b[3 * r] * a[c] + b[3 * r + 1] * a[3 + c] + b[3 * r + 2] * a[6 + c];
            }
        }
        double nx = b[0] * tx + b[1] * ty + b[2] * tz + next.tx;
        double ny = b[3] * tx + b[4] * ty + b[5] * tz + next.ty;
        double nz = b[6] * tx + b[7] * ty + b[8] * tz + next.tz;
        return new Transform(m, nx, ny, nz);
    }

    public double applyX(double x, double y, double z) {
        return a[0] * x + a[1] * y + a[2] * z + tx;
    }

    public double applyY(double x, double y, double z) {
        return a[3] * x + a[4] * y + a[5] * z + ty;
    }

    public double applyZ(double x, double y, double z) {
        return a[6] * x + a[7] * y + a[8] * z + tz;
    }

    /** Determinant of the linear part. */
    public double determinant() {
        return a[0] * (a[4] * a[8] - a[5] * a[7]) - a[1] * (a[3] * a[8] - a[5] * a[6])
                + a[2] * (a[3] * a[7] - a[4] * a[6]);
    }

    /** True if the transform reverses handedness (negative determinant). */
    public boolean isMirroring() {
        return determinant() < 0;
    }

    /** Element (row, col) of the 3×4 matrix [A | t], col 3 being the translation. */
    public double element(int row, int col) {
        if (col == 3) {
            return row == 0 ? tx : row == 1 ? ty : tz;
        }
        return a[3 * row + col];
    }

    /**
     * The 12 numbers of a 3MF {@code transform} attribute: m00 m01 m02 m10 m11 m12 m20 m21 m22 m30 m31 m32,
     * where 3MF multiplies row vectors (p' = p·M), so m_ij = A_ji and the last row is the translation.
     */
    public double[] to3mfMatrix() {
        return new double[] {a[0], a[3], a[6], a[1], a[4], a[7], a[2], a[5], a[8], tx, ty, tz};
    }

    /** From the 12 numbers of a 3MF {@code transform} attribute (see {@link #to3mfMatrix()}). */
    public static Transform from3mfMatrix(double[] m) {
        if (m.length != 12) {
            throw new IllegalArgumentException("3MF transform: expected 12 numbers, found " + m.length);
        }
        return new Transform(new double[] {m[0], m[3], m[6], m[1], m[4], m[7], m[2], m[5], m[8]}, m[9], m[10], m[11]);
    }

    public boolean isIdentity() {
        return equals(IDENTITY);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Transform t && java.util.Arrays.equals(a, t.a) && t.tx == tx && t.ty == ty && t.tz == tz;
    }

    @Override
    public int hashCode() {
        return java.util.Arrays.hashCode(a) * 31 + java.util.Objects.hash(tx, ty, tz);
    }

    @Override
    public String toString() {
        return "Transform" + java.util.Arrays.toString(to3mfMatrix());
    }
}
