package org.shearstack.geom;

import java.util.Arrays;

/**
 * Grid-keyed vertex table for the mesher: a vertex is identified by its integer grid coordinates, stored as
 * index / scale so equal keys give identical doubles (and identical float32 values in files). Open
 * addressing on primitive arrays: about 28 bytes per vertex.
 */
final class VertexTable {

    private final double scale;
    private double[] xyz = new double[3 * 1024];
    private int size;
    private int[] slots = new int[4096]; // vertex index + 1, 0 = free
    private int mask = slots.length - 1;

    VertexTable(double scale) {
        this(scale, 1024);
    }

    /** A table sized for about {@code expected} vertices (it grows beyond). */
    VertexTable(double scale, int expected) {
        this.scale = scale;
        int n = Math.max(1024, Math.min(expected, 1 << 26));
        this.xyz = new double[3 * n];
        this.slots = new int[Integer.highestOneBit(n - 1) << 2];
        this.mask = slots.length - 1;
    }

    int size() {
        return size;
    }

    /** Index of the vertex at grid point (ix, iy, iz), adding it if new. */
    int index(long ix, long iy, long iz) {
        double x = ix / scale + 0.0;
        double y = iy / scale + 0.0;
        double z = iz / scale + 0.0;
        int h = hash(ix, iy, iz) & mask;
        while (true) {
            int s = slots[h];
            if (s == 0) {
                break;
            }
            int v = 3 * (s - 1);
            if (xyz[v] == x && xyz[v + 1] == y && xyz[v + 2] == z) {
                return s - 1;
            }
            h = (h + 1) & mask;
        }
        if (3 * size + 3 > xyz.length) {
            xyz = Arrays.copyOf(xyz, xyz.length * 2);
        }
        xyz[3 * size] = x;
        xyz[3 * size + 1] = y;
        xyz[3 * size + 2] = z;
        slots[h] = ++size;
        if (2 * size > slots.length) {
            grow();
        }
        return size - 1;
    }

    /** Index of the vertex nearest to (x, y, z) on the grid. */
    int index(double x, double y, double z) {
        return index(Math.round(x * scale), Math.round(y * scale), Math.round(z * scale));
    }

    double[] coordinates() {
        return Arrays.copyOf(xyz, 3 * size);
    }

    private void grow() {
        int[] old = slots;
        slots = new int[old.length * 2];
        mask = slots.length - 1;
        for (int s : old) {
            if (s != 0) {
                int v = 3 * (s - 1);
                int h = hash(Math.round(xyz[v] * scale), Math.round(xyz[v + 1] * scale), Math.round(xyz[v + 2] * scale))
                        & mask;
                while (slots[h] != 0) {
                    h = (h + 1) & mask;
                }
                slots[h] = s;
            }
        }
    }

    private static int hash(long ix, long iy, long iz) {
        long h = ix * 0x9E3779B97F4A7C15L + iy * 0xC2B2AE3D27D4EB4FL + iz * 0x165667B19E3779F9L;
        h ^= h >>> 29;
        h *= 0xBF58476D1CE4E5B9L;
        h ^= h >>> 32;
        return (int) h;
    }
}
