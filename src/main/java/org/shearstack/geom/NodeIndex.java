package org.shearstack.geom;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.index.strtree.STRtree;
import org.locationtech.jts.noding.snapround.HotPixel;

/**
 * The grid nodes at one interface, with the snap-rounding hot-pixel test that tells where a wall segment
 * must bend.
 */
final class NodeIndex {

    private final double scale;
    private final Set<Coordinate> seen = new HashSet<>();
    private final STRtree tree = new STRtree();

    NodeIndex(double scale) {
        this.scale = scale;
    }

    void addAll(Geometry g) {
        if (g == null) {
            return;
        }
        for (Coordinate c : g.getCoordinates()) {
            Coordinate key = new Coordinate(c.x, c.y);
            if (seen.add(key)) {
                tree.insert(new Envelope(key), key);
            }
        }
    }

    /** Builds the spatial index now (queries are then read-only). */
    void build() {
        tree.build();
    }

    /**
     * Appends to {@code out} p, every node strictly between p and q whose hot pixel the segment crosses
     * (sorted along p→q), then q.
     */
    void split(Coordinate p, Coordinate q, List<Coordinate> out) {
        out.add(p);
        Envelope env = new Envelope(p, q);
        env.expandBy(1.0 / scale);
        @SuppressWarnings("unchecked")
        List<Coordinate> hits = tree.query(env);
        if (!hits.isEmpty()) {
            List<Coordinate> inner = new ArrayList<>();
            for (Coordinate c : hits) {
                if (c.equals2D(p) || c.equals2D(q)) {
                    continue;
                }
                if (new HotPixel(c, scale).intersects(p, q)) {
                    inner.add(c);
                }
            }
            double dx = q.x - p.x;
            double dy = q.y - p.y;
            inner.sort((u, v) -> Double.compare((u.x - p.x) * dx + (u.y - p.y) * dy, (v.x - p.x) * dx + (v.y - p.y) * dy));
            out.addAll(inner);
        }
        out.add(q);
    }
}
