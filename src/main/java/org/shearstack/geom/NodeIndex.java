package org.shearstack.geom;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.noding.snapround.HotPixel;

/**
 * The grid nodes at one interface, with the snap-rounding hot-pixel test that tells where a wall segment
 * must bend. Nodes are kept as packed grid indices (x in the high 32 bits, y in the low 32 bits, sorted and
 * deduplicated, 8 bytes a node); a segment's candidates are the nodes of its x range, filtered by y.
 */
final class NodeIndex {

    private static final long MAX_INDEX = Integer.MAX_VALUE - 1;

    private final double scale;
    private long[] keys = new long[256];
    private int size;
    private boolean built;

    NodeIndex(double scale) {
        this.scale = scale;
    }

    void addAll(Geometry g) {
        if (g == null || g.isEmpty()) {
            return;
        }
        if (built) {
            throw new IllegalStateException("node index already built");
        }
        int n = g.getNumPoints();
        if (size + n > keys.length) {
            keys = Arrays.copyOf(keys, Math.max(2 * keys.length, size + n));
        }
        g.apply(new CoordinateSequenceFilter() {
            @Override
            public void filter(CoordinateSequence seq, int i) {
                keys[size++] = key(index(seq.getX(i)), index(seq.getY(i)));
            }

            @Override
            public boolean isDone() {
                return false;
            }

            @Override
            public boolean isGeometryChanged() {
                return false;
            }
        });
    }

    /** Sorts and deduplicates the nodes (queries are then read-only and thread-safe). */
    void build() {
        Arrays.sort(keys, 0, size);
        int m = 0;
        for (int i = 0; i < size; i++) {
            if (m == 0 || keys[i] != keys[m - 1]) {
                keys[m++] = keys[i];
            }
        }
        size = m;
        keys = Arrays.copyOf(keys, m);
        built = true;
    }

    /** Number of distinct nodes. */
    int size() {
        return size;
    }

    /**
     * Appends to {@code out} p, every node strictly between p and q whose hot pixel the segment crosses
     * (sorted along p→q), then q.
     */
    void split(Coordinate p, Coordinate q, List<Coordinate> out) {
        if (!built) {
            throw new IllegalStateException("node index not built");
        }
        out.add(p);
        long px = index(p.x);
        long py = index(p.y);
        long qx = index(q.x);
        long qy = index(q.y);
        long x0 = Math.min(px, qx) - 1;
        long x1 = Math.max(px, qx) + 1;
        long y0 = Math.min(py, qy) - 1;
        long y1 = Math.max(py, qy) + 1;
        List<Coordinate> inner = null;
        for (int i = lowerBound(key(x0, Integer.MIN_VALUE)); i < size; i++) {
            long k = keys[i];
            long x = k >> 32;
            if (x > x1) {
                break;
            }
            long y = yOf(k);
            if (y < y0 || y > y1 || (x == px && y == py) || (x == qx && y == qy)) {
                continue;
            }
            Coordinate c = new Coordinate(x / scale, y / scale);
            if (new HotPixel(c, scale).intersects(p, q)) {
                if (inner == null) {
                    inner = new ArrayList<>();
                }
                inner.add(c);
            }
        }
        if (inner != null) {
            double dx = q.x - p.x;
            double dy = q.y - p.y;
            inner.sort((u, v) -> Double.compare((u.x - p.x) * dx + (u.y - p.y) * dy, (v.x - p.x) * dx + (v.y - p.y) * dy));
            out.addAll(inner);
        }
        out.add(q);
    }

    private int lowerBound(long key) {
        int lo = 0;
        int hi = size;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (keys[mid] < key) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    private long index(double valueMm) {
        double v = Math.rint(valueMm * scale);
        if (!(Math.abs(v) <= MAX_INDEX)) {
            throw new IllegalArgumentException("node index: coordinate " + valueMm + " mm is beyond the grid's range");
        }
        return (long) v;
    }

    /** x in the high half (signed), y offset by 2^31 in the low half: sorted by x, then y. */
    private static long key(long x, long y) {
        return (x << 32) | ((y - Integer.MIN_VALUE) & 0xFFFF_FFFFL);
    }

    private static long yOf(long key) {
        return (key & 0xFFFF_FFFFL) + Integer.MIN_VALUE;
    }
}
