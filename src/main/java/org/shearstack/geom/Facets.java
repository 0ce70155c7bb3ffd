package org.shearstack.geom;

import java.util.ArrayList;
import java.util.List;

import org.locationtech.jts.geom.Coordinate;

/**
 * Faceting of circles, arcs and slots into grid coordinates. A circle of radius r always has
 * {@link GeometryContext#segmentCount(double)} vertices at angles 2πk/n (phase 0), either on the circle
 * (inscribed: for outer boundaries) or at r / cos(π/n) (circumscribed: for bores, whose polygon then
 * has the target inscribed circle). Arcs of the same radius reuse those vertices and put their end points
 * on the full polygon's edges, so arcs and full circles of the same radius share boundaries exactly.
 */
final class Facets {

    private Facets() {
    }

    /** Vertex radius of the n-gon that faces a circle of radius r (inscribed or circumscribed). */
    static double vertexRadius(double radiusMm, int n, boolean circumscribed) {
        return circumscribed ? radiusMm / Math.cos(Math.PI / n) : radiusMm;
    }

    /** Closed counter-clockwise ring (first point repeated) of a full circle. */
    static List<Coordinate> circle(GeometryContext ctx, double cx, double cy, double radiusMm, boolean circumscribed) {
        int n = ctx.segmentCount(radiusMm);
        double rv = vertexRadius(radiusMm, n, circumscribed);
        double[] unit = Degrees.unitCircle(n);
        List<Coordinate> pts = new ArrayList<>(n + 1);
        for (int k = 0; k < n; k++) {
            add(ctx, pts, cx + rv * unit[2 * k], cy + rv * unit[2 * k + 1]);
        }
        return close(pts);
    }

    /**
     * Points along the faceted circle of radius r from angle startRad to endRad (endRad &gt; startRad,
     * counter-clockwise), end points on the full polygon's edges, in between its vertices. If reverse, the
     * list is returned clockwise (from endRad to startRad).
     */
    static List<Coordinate> arc(GeometryContext ctx, double cx, double cy, double radiusMm, boolean circumscribed,
            double startRad, double endRad, boolean reverse) {
        int n = ctx.segmentCount(radiusMm);
        double rv = vertexRadius(radiusMm, n, circumscribed);
        double step = 2 * Math.PI / n;
        double apothem = rv * Math.cos(step / 2);
        double[] unit = Degrees.unitCircle(n);
        List<Coordinate> pts = new ArrayList<>();
        pts.add(pointOnPolygon(ctx, cx, cy, apothem, step, startRad));
        long kFirst = (long) Math.floor(startRad / step + 1e-9) + 1;
        long kLast = (long) Math.ceil(endRad / step - 1e-9) - 1;
        for (long k = kFirst; k <= kLast; k++) {
            int idx = (int) Math.floorMod(k, (long) n);
            add(ctx, pts, cx + rv * unit[2 * idx], cy + rv * unit[2 * idx + 1]);
        }
        Coordinate end = pointOnPolygon(ctx, cx, cy, apothem, step, endRad);
        add(ctx, pts, end.x, end.y);
        if (reverse) {
            java.util.Collections.reverse(pts);
        }
        return pts;
    }

    private static Coordinate pointOnPolygon(GeometryContext ctx, double cx, double cy, double apothem, double step,
            double angleRad) {
        double k = Math.floor(angleRad / step);
        double mid = (k + 0.5) * step;
        double rho = apothem / Math.cos(angleRad - mid);
        double deg = Math.toDegrees(angleRad);
        double c = Degrees.quarterTurns(Math.rint(deg * 1e9) / 1e9) >= 0 ? Degrees.cos(Math.rint(deg)) : Math.cos(angleRad);
        double s = Degrees.quarterTurns(Math.rint(deg * 1e9) / 1e9) >= 0 ? Degrees.sin(Math.rint(deg)) : Math.sin(angleRad);
        return new Coordinate(ctx.snap(cx + rho * c), ctx.snap(cy + rho * s));
    }

    static void add(GeometryContext ctx, List<Coordinate> pts, double x, double y) {
        Coordinate c = new Coordinate(ctx.snap(x), ctx.snap(y));
        if (pts.isEmpty() || !pts.get(pts.size() - 1).equals2D(c)) {
            pts.add(c);
        }
    }

    /** Drops a last point equal to the first, then repeats the first point at the end. */
    static List<Coordinate> close(List<Coordinate> pts) {
        while (pts.size() > 1 && pts.get(pts.size() - 1).equals2D(pts.get(0))) {
            pts.remove(pts.size() - 1);
        }
        if (!pts.isEmpty()) {
            pts.add(pts.get(0).copy());
        }
        return pts;
    }
}
