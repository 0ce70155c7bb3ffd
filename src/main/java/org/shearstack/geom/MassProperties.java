package org.shearstack.geom;

/**
 * Volume, surface area, centroid and inertia of a closed, outward-oriented mesh of uniform density.
 *
 * <p>Method: D. Eberly, "Polyhedral Mass Properties (Revisited)", Geometric Tools, 2002 (revised 2009):
 * the divergence theorem turns each volume integral of 1, x, y, z, x², y², z², xy, yz, zx into sums of
 * closed-form polynomials over the triangles. Coordinates are shifted to the bounding-box centre first to
 * limit cancellation. Lengths in the mesh are mm; mass in kg; inertia in kg·m².
 *
 * @param volumeMm3                 enclosed volume
 * @param surfaceAreaMm2            total triangle area
 * @param centroidXMm               centroid x
 * @param centroidYMm               centroid y
 * @param centroidZMm               centroid z
 * @param massKg                    volume × density
 * @param inertiaCentroidKgM2       inertia tensor about the centroid, row-major 3×3 (Ixx, Ixy, Ixz, ...;
 *                                  products of inertia carry the minus sign of the tensor)
 * @param inertiaZAxisKgM2          moment of inertia about the Z axis through the origin (the part axis)
 */
public record MassProperties(double volumeMm3, double surfaceAreaMm2, double centroidXMm, double centroidYMm,
        double centroidZMm, double massKg, double[] inertiaCentroidKgM2, double inertiaZAxisKgM2) {

    private static final double MM5_TO_M5 = 1e-15;
    private static final double MM3_TO_M3 = 1e-9;

    public MassProperties {
        inertiaCentroidKgM2 = inertiaCentroidKgM2.clone();
    }

    @Override
    public double[] inertiaCentroidKgM2() {
        return inertiaCentroidKgM2.clone();
    }

    /** Element (row, col) of the inertia tensor about the centroid, kg·m². */
    public double inertiaCentroidKgM2(int row, int col) {
        return inertiaCentroidKgM2[3 * row + col];
    }

    /**
     * Mass properties of a closed mesh.
     *
     * @param densityKgPerM3 material density, &gt; 0
     */
    public static MassProperties of(Mesh mesh, double densityKgPerM3) {
        if (!(densityKgPerM3 > 0) || !Double.isFinite(densityKgPerM3)) {
            throw new IllegalArgumentException("density: expected a positive value in kg/m3, found " + densityKgPerM3);
        }
        double[] xyz = mesh.xyzUnsafe();
        int[] tri = mesh.trianglesUnsafe();
        double minX = Double.POSITIVE_INFINITY;
        double minY = Double.POSITIVE_INFINITY;
        double minZ = Double.POSITIVE_INFINITY;
        double maxX = Double.NEGATIVE_INFINITY;
        double maxY = Double.NEGATIVE_INFINITY;
        double maxZ = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < xyz.length; i += 3) {
            minX = Math.min(minX, xyz[i]);
            maxX = Math.max(maxX, xyz[i]);
            minY = Math.min(minY, xyz[i + 1]);
            maxY = Math.max(maxY, xyz[i + 1]);
            minZ = Math.min(minZ, xyz[i + 2]);
            maxZ = Math.max(maxZ, xyz[i + 2]);
        }
        double ox = xyz.length == 0 ? 0 : (minX + maxX) / 2;
        double oy = xyz.length == 0 ? 0 : (minY + maxY) / 2;
        double oz = xyz.length == 0 ? 0 : (minZ + maxZ) / 2;

        double[] in = new double[10];
        double area = 0;
        double[] fx = new double[6];
        double[] fy = new double[6];
        double[] fz = new double[6];
        for (int t = 0; t < tri.length; t += 3) {
            int a = 3 * tri[t];
            int b = 3 * tri[t + 1];
            int c = 3 * tri[t + 2];
            double x0 = xyz[a] - ox;
            double y0 = xyz[a + 1] - oy;
            double z0 = xyz[a + 2] - oz;
            double x1 = xyz[b] - ox;
            double y1 = xyz[b + 1] - oy;
            double z1 = xyz[b + 2] - oz;
            double x2 = xyz[c] - ox;
            double y2 = xyz[c + 1] - oy;
            double z2 = xyz[c + 2] - oz;
            double a1 = x1 - x0;
            double b1 = y1 - y0;
            double c1 = z1 - z0;
            double a2 = x2 - x0;
            double b2 = y2 - y0;
            double c2 = z2 - z0;
            double d0 = b1 * c2 - b2 * c1;
            double d1 = a2 * c1 - a1 * c2;
            double d2 = a1 * b2 - a2 * b1;
            area += Math.sqrt(d0 * d0 + d1 * d1 + d2 * d2) / 2;
            subexpressions(x0, x1, x2, fx);
            subexpressions(y0, y1, y2, fy);
            subexpressions(z0, z1, z2, fz);
            in[0] += d0 * fx[0];
            in[1] += d0 * fx[1];
            in[2] += d1 * fy[1];
            in[3] += d2 * fz[1];
            in[4] += d0 * fx[2];
            in[5] += d1 * fy[2];
            in[6] += d2 * fz[2];
            in[7] += d0 * (y0 * fx[3] + y1 * fx[4] + y2 * fx[5]);
            in[8] += d1 * (z0 * fy[3] + z1 * fy[4] + z2 * fy[5]);
            in[9] += d2 * (x0 * fz[3] + x1 * fz[4] + x2 * fz[5]);
        }
        in[0] /= 6;
        for (int i = 1; i <= 3; i++) {
            in[i] /= 24;
        }
        for (int i = 4; i <= 6; i++) {
            in[i] /= 60;
        }
        for (int i = 7; i <= 9; i++) {
            in[i] /= 120;
        }
        double v = in[0];
        double cx = v == 0 ? 0 : in[1] / v;
        double cy = v == 0 ? 0 : in[2] / v;
        double cz = v == 0 ? 0 : in[3] / v;
        // second moments about the centroid (volume-weighted, mm^5)
        double sxx = in[4] - v * cx * cx;
        double syy = in[5] - v * cy * cy;
        double szz = in[6] - v * cz * cz;
        double sxy = in[7] - v * cx * cy;
        double syz = in[8] - v * cy * cz;
        double sxz = in[9] - v * cz * cx;
        double k = densityKgPerM3 * MM5_TO_M5;
        double[] tensor = {
            k * (syy + szz), -k * sxy, -k * sxz,
            -k * sxy, k * (sxx + szz), -k * syz,
            -k * sxz, -k * syz, k * (sxx + syy)};
        double gx = cx + ox;
        double gy = cy + oy;
        // parallel axis theorem from the centroid to the Z axis through the origin
        double izAxis = tensor[8] + densityKgPerM3 * v * MM3_TO_M3 * (gx * gx + gy * gy) * 1e-6;
        return new MassProperties(v, area, gx, gy, cz + oz, densityKgPerM3 * v * MM3_TO_M3, tensor, izAxis);
    }

    /** Eberly's subexpressions f1, f2, f3, g0, g1, g2 for one coordinate. */
    private static void subexpressions(double w0, double w1, double w2, double[] out) {
        double temp0 = w0 + w1;
        double f1 = temp0 + w2;
        double temp1 = w0 * w0;
        double temp2 = temp1 + w1 * temp0;
        double f2 = temp2 + w2 * f1;
        double f3 = w0 * temp1 + w1 * temp2 + w2 * f2;
        out[0] = f1;
        out[1] = f2;
        out[2] = f3;
        out[3] = f2 + w0 * (f1 + w0);
        out[4] = f2 + w1 * (f1 + w1);
        out[5] = f2 + w2 * (f1 + w2);
    }
}
