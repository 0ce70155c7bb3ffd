package org.shearstack.geom;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Objects;

import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.AffineTransformation;
import org.locationtech.jts.operation.buffer.BufferOp;
import org.locationtech.jts.operation.buffer.BufferParameters;
import org.locationtech.jts.operation.overlayng.OverlayNG;
import org.locationtech.jts.operation.overlayng.UnaryUnionNG;
import org.locationtech.jts.operation.valid.IsValidOp;
import org.locationtech.jts.operation.valid.TopologyValidationError;
import org.locationtech.jts.precision.GeometryPrecisionReducer;

/**
 * An immutable 2D region (outer rings with holes, possibly several parts) on the grid of a
 * {@link GeometryContext}, backed by a valid JTS polygonal geometry. Booleans use JTS OverlayNG with the
 * context's fixed precision model (snap rounding), so results are robust and stay on the grid.
 *
 * <p>Faceting: outer boundaries of circles ({@link #disc}) have their vertices on the circle; bores
 * ({@link #boreCircle}) are circumscribed polygons whose inscribed circle has the target diameter, so
 * holes do not print small. Angles are in degrees, counter-clockwise, exact at multiples of 90°.
 */
public final class Region {

    private final GeometryContext ctx;
    private final Geometry geometry;

    private Region(GeometryContext ctx, Geometry geometry) {
        this.ctx = ctx;
        this.geometry = geometry;
    }

    // ---------------------------------------------------------------- factories

    /** The empty region. */
    public static Region empty(GeometryContext ctx) {
        return new Region(ctx, ctx.factory().createPolygon());
    }

    /** A full disc; its faceted boundary has vertices on the circle (for outer boundaries). */
    public static Region disc(GeometryContext ctx, double cxMm, double cyMm, double diameterMm) {
        requirePositive("diameter", diameterMm);
        return fromRing(ctx, Facets.circle(ctx, cxMm, cyMm, diameterMm / 2, false), "disc");
    }

    /**
     * The material to remove for a round bore: a circumscribed polygon whose inscribed circle has diameter
     * {@code diameterMm}. Subtract it ({@link #minus}).
     */
    public static Region boreCircle(GeometryContext ctx, double cxMm, double cyMm, double diameterMm) {
        requirePositive("diameter", diameterMm);
        return fromRing(ctx, Facets.circle(ctx, cxMm, cyMm, diameterMm / 2, true), "bore");
    }

    /** A ring: a {@link #disc} of the outer diameter minus a {@link #boreCircle} of the inner diameter. */
    public static Region annulus(GeometryContext ctx, double cxMm, double cyMm, double outerDiameterMm,
            double innerDiameterMm) {
        requirePositive("inner diameter", innerDiameterMm);
        if (!(outerDiameterMm > innerDiameterMm)) {
            throw new IllegalArgumentException("annulus: expected outer diameter > inner diameter, found outer "
                    + outerDiameterMm + " mm, inner " + innerDiameterMm + " mm");
        }
        return disc(ctx, cxMm, cyMm, outerDiameterMm).minus(boreCircle(ctx, cxMm, cyMm, innerDiameterMm));
    }

    /** An axis-aligned rectangle from its corners. */
    public static Region rectangle(GeometryContext ctx, double minXMm, double minYMm, double maxXMm, double maxYMm) {
        if (!(maxXMm > minXMm && maxYMm > minYMm)) {
            throw new IllegalArgumentException("rectangle: expected max > min on both axes, found x " + minXMm + ".."
                    + maxXMm + ", y " + minYMm + ".." + maxYMm);
        }
        return polygon(ctx, minXMm, minYMm, maxXMm, minYMm, maxXMm, maxYMm, minXMm, maxYMm);
    }

    /** An axis-aligned rectangle from its centre and size. */
    public static Region centredRectangle(GeometryContext ctx, double cxMm, double cyMm, double widthMm,
            double heightMm) {
        return rectangle(ctx, cxMm - widthMm / 2, cyMm - heightMm / 2, cxMm + widthMm / 2, cyMm + heightMm / 2);
    }

    /**
     * A simple polygon from flat coordinates x0, y0, x1, y1, ... (either winding, not closed).
     *
     * @throws IllegalArgumentException if it self-intersects on the grid, naming the location
     */
    public static Region polygon(GeometryContext ctx, double... xyMm) {
        if (xyMm.length % 2 != 0 || xyMm.length < 6) {
            throw new IllegalArgumentException("polygon: expected at least 3 x,y pairs, found " + xyMm.length
                    + " numbers");
        }
        List<Coordinate> pts = new ArrayList<>();
        for (int i = 0; i < xyMm.length; i += 2) {
            Facets.add(ctx, pts, xyMm[i], xyMm[i + 1]);
        }
        return fromRing(ctx, Facets.close(pts), "polygon");
    }

    /**
     * A regular polygon (e.g. a hex socket) given the distance across flats, with a vertex at
     * {@code rotationDeg} and the others every 360/sides degrees.
     */
    public static Region regularPolygon(GeometryContext ctx, double cxMm, double cyMm, int sides,
            double acrossFlatsMm, double rotationDeg) {
        if (sides < 3) {
            throw new IllegalArgumentException("regular polygon: expected at least 3 sides, found " + sides);
        }
        requirePositive("across flats", acrossFlatsMm);
        double rv = acrossFlatsMm / 2 / Math.cos(Math.PI / sides);
        List<Coordinate> pts = new ArrayList<>();
        for (int k = 0; k < sides; k++) {
            double deg = rotationDeg + 360.0 * k / sides;
            Facets.add(ctx, pts, cxMm + rv * Degrees.cos(deg), cyMm + rv * Degrees.sin(deg));
        }
        return fromRing(ctx, Facets.close(pts), "regular polygon");
    }

    /**
     * A stadium (slot) of width {@code widthMm} around the segment between two end centres, ends faceted
     * with their vertices on the end circles (for material).
     */
    public static Region slot(GeometryContext ctx, double x0Mm, double y0Mm, double x1Mm, double y1Mm, double widthMm) {
        return stadium(ctx, x0Mm, y0Mm, x1Mm, y1Mm, widthMm, false);
    }

    /** A stadium to cut away: ends circumscribed so the slot is at least {@code widthMm} wide everywhere. */
    public static Region slotCut(GeometryContext ctx, double x0Mm, double y0Mm, double x1Mm, double y1Mm,
            double widthMm) {
        return stadium(ctx, x0Mm, y0Mm, x1Mm, y1Mm, widthMm, true);
    }

    private static Region stadium(GeometryContext ctx, double x0, double y0, double x1, double y1, double widthMm,
            boolean circumscribed) {
        requirePositive("slot width", widthMm);
        double r = widthMm / 2;
        double len = Math.hypot(x1 - x0, y1 - y0);
        if (len == 0) {
            return circumscribed ? boreCircle(ctx, x0, y0, widthMm) : disc(ctx, x0, y0, widthMm);
        }
        double phi = Math.atan2(y1 - y0, x1 - x0);
        int n = ctx.segmentCount(r);
        double step = 2 * Math.PI / n;
        double rv = Facets.vertexRadius(r, n, circumscribed);
        List<Coordinate> pts = new ArrayList<>();
        for (int end = 0; end < 2; end++) {
            double cx = end == 0 ? x1 : x0;
            double cy = end == 0 ? y1 : y0;
            double a0 = phi - Math.PI / 2 + end * Math.PI;
            int count = n / 2;
            for (int k = 0; k <= count; k++) {
                double a = circumscribed ? a0 + (k + 0.5) * step : a0 + k * step;
                if (circumscribed && k == count) {
                    break;
                }
                Facets.add(ctx, pts, cx + rv * Math.cos(a), cy + rv * Math.sin(a));
            }
        }
        return fromRing(ctx, Facets.close(pts), "slot");
    }

    /**
     * A band between two radii over an angular range: the outer arc faceted like {@link #disc}, the inner arc
     * like {@link #boreCircle} (same vertices), so a band shares its boundary exactly with an
     * {@link #annulus} of the same diameters. An inner diameter of 0 gives a sector.
     */
    public static Region arcBand(GeometryContext ctx, double cxMm, double cyMm, double innerDiameterMm,
            double outerDiameterMm, double startDeg, double sweepDeg) {
        if (!(outerDiameterMm > innerDiameterMm && innerDiameterMm >= 0)) {
            throw new IllegalArgumentException("arc band: expected 0 <= inner diameter < outer diameter, found "
                    + innerDiameterMm + " and " + outerDiameterMm + " mm");
        }
        if (!(sweepDeg > 0)) {
            throw new IllegalArgumentException("arc band: expected a positive sweep in degrees, found " + sweepDeg);
        }
        if (sweepDeg >= 360) {
            return innerDiameterMm > 0 ? annulus(ctx, cxMm, cyMm, outerDiameterMm, innerDiameterMm)
                    : disc(ctx, cxMm, cyMm, outerDiameterMm);
        }
        double a0 = Math.toRadians(startDeg);
        double a1 = Math.toRadians(startDeg + sweepDeg);
        List<Coordinate> pts = new ArrayList<>(Facets.arc(ctx, cxMm, cyMm, outerDiameterMm / 2, false, a0, a1, false));
        if (innerDiameterMm > 0) {
            for (Coordinate c : Facets.arc(ctx, cxMm, cyMm, innerDiameterMm / 2, true, a0, a1, true)) {
                Facets.add(ctx, pts, c.x, c.y);
            }
        } else {
            Facets.add(ctx, pts, cxMm, cyMm);
        }
        return fromRing(ctx, Facets.close(pts), "arc band");
    }

    /**
     * Wraps a foreign JTS polygonal geometry (e.g. from slicing), reducing it to the grid with snap rounding.
     *
     * @throws IllegalArgumentException if the geometry is not polygonal
     */
    public static Region fromGeometry(GeometryContext ctx, Geometry geometry) {
        if (geometry.getDimension() != 2 && !geometry.isEmpty()) {
            throw new IllegalArgumentException("region: expected a polygonal geometry, found " + geometry.getGeometryType());
        }
        Geometry g = geometry.isEmpty() ? ctx.factory().createPolygon()
                : GeometryPrecisionReducer.reduce(geometry, ctx.precisionModel());
        return new Region(ctx, polygonal(ctx, g));
    }

    /** Union of many regions (one pass, cheaper than repeated {@link #union}). */
    public static Region unionAll(GeometryContext ctx, Collection<Region> regions) {
        if (regions.isEmpty()) {
            return empty(ctx);
        }
        List<Geometry> parts = new ArrayList<>();
        for (Region r : regions) {
            r.requireSameContext(ctx);
            if (!r.isEmpty()) {
                parts.add(r.geometry);
            }
        }
        if (parts.isEmpty()) {
            return empty(ctx);
        }
        Geometry all = ctx.factory().buildGeometry(parts);
        return new Region(ctx, polygonal(ctx, UnaryUnionNG.union(all, ctx.precisionModel())));
    }

    // ---------------------------------------------------------------- operations

    public Region union(Region other) {
        return overlay(other, OverlayNG.UNION);
    }

    public Region minus(Region other) {
        return overlay(other, OverlayNG.DIFFERENCE);
    }

    public Region intersect(Region other) {
        return overlay(other, OverlayNG.INTERSECTION);
    }

    private Region overlay(Region other, int op) {
        requireSameContext(other.ctx);
        if (op == OverlayNG.DIFFERENCE && (isEmpty() || other.isEmpty())) {
            return this;
        }
        if (op == OverlayNG.UNION && other.isEmpty()) {
            return this;
        }
        if (op == OverlayNG.UNION && isEmpty()) {
            return other;
        }
        if (op == OverlayNG.INTERSECTION && (isEmpty() || other.isEmpty())) {
            return empty(ctx);
        }
        if (!geometry.getEnvelopeInternal().intersects(other.geometry.getEnvelopeInternal())) {
            if (op == OverlayNG.INTERSECTION) {
                return empty(ctx);
            }
            if (op == OverlayNG.DIFFERENCE) {
                return this;
            }
        }
        return new Region(ctx, polygonal(ctx, OverlayNG.overlay(geometry, other.geometry, op, ctx.precisionModel())));
    }

    /**
     * Grows (positive) or shrinks (negative) the region by {@code distanceMm}, round joins faceted by the
     * context's segment count for that radius.
     */
    public Region offset(double distanceMm) {
        if (distanceMm == 0 || isEmpty()) {
            return this;
        }
        BufferParameters params = new BufferParameters();
        params.setQuadrantSegments(Math.max(2, ctx.segmentCount(Math.abs(distanceMm)) / 4));
        params.setJoinStyle(BufferParameters.JOIN_ROUND);
        Geometry buffered = BufferOp.bufferOp(geometry, distanceMm, params);
        // The buffer of a geometry on the grid's factory rounds every output vertex to the grid already; when the
        // result is also valid, the snap-rounding reduction (an OverlayNG pass, several times the buffer's cost)
        // would return it unchanged in all but near-touching cases, so it is skipped.
        if (buffered.isEmpty()) {
            return empty(ctx);
        }
        if (buffered.getDimension() == 2 && onGrid(buffered) && buffered.isValid()) {
            return new Region(ctx, polygonal(ctx, buffered));
        }
        return fromGeometry(ctx, buffered);
    }

    private boolean onGrid(Geometry g) {
        double scale = ctx.scale();
        boolean[] ok = {true};
        g.apply((org.locationtech.jts.geom.CoordinateSequenceFilter) new org.locationtech.jts.geom.CoordinateSequenceFilter() {
            @Override
            public void filter(CoordinateSequence seq, int i) {
                double x = seq.getX(i) * scale;
                double y = seq.getY(i) * scale;
                if (x != Math.rint(x) || y != Math.rint(y)) {
                    ok[0] = false;
                }
            }

            @Override
            public boolean isDone() {
                return !ok[0];
            }

            @Override
            public boolean isGeometryChanged() {
                return false;
            }
        });
        return ok[0];
    }

    /** Rotation about the origin, counter-clockwise in degrees; exact (no rounding) at multiples of 90°. */
    public Region rotatedDeg(double angleDeg) {
        int q = Degrees.quarterTurns(angleDeg);
        if (q == 0 || isEmpty()) {
            return this;
        }
        if (q > 0) {
            Geometry g = geometry.copy();
            g.apply((org.locationtech.jts.geom.CoordinateSequenceFilter) new QuarterTurnFilter(q));
            g.geometryChanged();
            return new Region(ctx, g);
        }
        AffineTransformation t = new AffineTransformation(Degrees.cos(angleDeg), -Degrees.sin(angleDeg), 0,
                Degrees.sin(angleDeg), Degrees.cos(angleDeg), 0);
        return fromGeometry(ctx, t.transform(geometry));
    }

    /** Translation by a vector snapped to the grid (exact: the grid maps onto itself). */
    public Region translated(double dxMm, double dyMm) {
        double dx = ctx.snap(dxMm);
        double dy = ctx.snap(dyMm);
        if ((dx == 0 && dy == 0) || isEmpty()) {
            return this;
        }
        Geometry g = geometry.copy();
        g.apply(new org.locationtech.jts.geom.CoordinateSequenceFilter() {
            @Override
            public void filter(CoordinateSequence seq, int i) {
                seq.setOrdinate(i, 0, ctx.snap(seq.getX(i) + dx));
                seq.setOrdinate(i, 1, ctx.snap(seq.getY(i) + dy));
            }

            @Override
            public boolean isDone() {
                return false;
            }

            @Override
            public boolean isGeometryChanged() {
                return true;
            }
        });
        return new Region(ctx, g);
    }

    /** Mirror image across the X axis (y → −y); exact. */
    public Region mirroredAcrossXAxis() {
        if (isEmpty()) {
            return this;
        }
        Geometry g = geometry.copy();
        g.apply(new org.locationtech.jts.geom.CoordinateSequenceFilter() {
            @Override
            public void filter(CoordinateSequence seq, int i) {
                seq.setOrdinate(i, 1, 0.0 - seq.getY(i) + 0.0);
            }

            @Override
            public boolean isDone() {
                return false;
            }

            @Override
            public boolean isGeometryChanged() {
                return true;
            }
        });
        return new Region(ctx, g.reverse());
    }

    /** Union of {@code count} copies rotated about the origin by multiples of 360/count degrees. */
    public Region patternPolar(int count) {
        if (count < 1) {
            throw new IllegalArgumentException("polar pattern: expected a count >= 1, found " + count);
        }
        List<Region> copies = new ArrayList<>(count);
        for (int i = 0; i < count; i++) {
            copies.add(rotatedDeg(360.0 * i / count));
        }
        return unionAll(ctx, copies);
    }

    // ---------------------------------------------------------------- queries

    public GeometryContext context() {
        return ctx;
    }

    public boolean isEmpty() {
        return geometry.isEmpty();
    }

    /** Area in mm² (shoelace formula on the grid coordinates). */
    public double areaMm2() {
        return geometry.getArea();
    }

    /** Total boundary length in mm (outer rings and holes). */
    public double perimeterMm() {
        return geometry.getLength();
    }

    /** The bounding box; throws for an empty region. */
    public Bounds2 bounds() {
        if (isEmpty()) {
            throw new IllegalStateException("bounds of an empty region");
        }
        Envelope e = geometry.getEnvelopeInternal();
        return new Bounds2(e.getMinX(), e.getMinY(), e.getMaxX(), e.getMaxY());
    }

    /** Number of connected parts (polygons). */
    public int partCount() {
        return isEmpty() ? 0 : geometry.getNumGeometries();
    }

    /** All rings: for each part its outer ring (counter-clockwise) then its holes (clockwise). */
    public List<Ring> rings() {
        List<Ring> out = new ArrayList<>();
        for (int i = 0; i < partCount(); i++) {
            Polygon p = (Polygon) geometry.getGeometryN(i);
            out.add(toRing(p.getExteriorRing(), false));
            for (int h = 0; h < p.getNumInteriorRing(); h++) {
                out.add(toRing(p.getInteriorRingN(h), true));
            }
        }
        return out;
    }

    /** True if the point lies inside or on the boundary. */
    public boolean containsPoint(double xMm, double yMm) {
        return !isEmpty() && geometry.intersects(ctx.factory().createPoint(new Coordinate(xMm, yMm)));
    }

    /** A copy of the underlying JTS geometry (Polygon or MultiPolygon, valid, on the grid). */
    public Geometry geometry() {
        return geometry.copy();
    }

    /** The geometry itself, for kernel code that will not modify it. */
    Geometry jts() {
        return geometry;
    }

    static Region ofValid(GeometryContext ctx, Geometry polygonal) {
        return new Region(ctx, polygonal);
    }

    /** Exact equality of the point sets' representations after normalisation (same rings, same vertices). */
    @Override
    public boolean equals(Object o) {
        if (o == this) {
            return true;
        }
        // point count and envelope first: normalising copies both geometries, the costly part of a comparison
        return o instanceof Region r && r.ctx.equals(ctx) && r.geometry.getNumPoints() == geometry.getNumPoints()
                && r.geometry.getEnvelopeInternal().equals(geometry.getEnvelopeInternal())
                && r.geometry.equalsNorm(geometry);
    }

    @Override
    public int hashCode() {
        return Objects.hash(ctx, geometry.getNumPoints(), geometry.getEnvelopeInternal());
    }

    @Override
    public String toString() {
        return "Region[" + partCount() + " parts, " + geometry.getNumPoints() + " points, area "
                + String.format(java.util.Locale.ROOT, "%.6f", areaMm2()) + " mm2]";
    }

    // ---------------------------------------------------------------- helpers

    private void requireSameContext(GeometryContext other) {
        if (!ctx.equals(other)) {
            throw new IllegalArgumentException("regions from different geometry contexts: " + ctx + " and " + other);
        }
    }

    private static Ring toRing(org.locationtech.jts.geom.LineString ring, boolean hole) {
        Coordinate[] cs = ring.getCoordinates();
        boolean ccw = Orientation.isCCWArea(cs);
        int n = cs.length - 1;
        double[] xy = new double[2 * n];
        for (int i = 0; i < n; i++) {
            Coordinate c = (ccw != hole) ? cs[i] : cs[n - i];
            xy[2 * i] = c.x;
            xy[2 * i + 1] = c.y;
        }
        return new Ring(xy, hole);
    }

    private static Region fromRing(GeometryContext ctx, List<Coordinate> closed, String what) {
        if (closed.size() < 4) {
            throw new IllegalArgumentException(what + ": collapses to fewer than 3 distinct grid points (grid "
                    + ctx.gridMm() + " mm); feature too small");
        }
        GeometryFactory f = ctx.factory();
        LinearRing ring = f.createLinearRing(closed.toArray(new Coordinate[0]));
        Polygon p = f.createPolygon(ring);
        IsValidOp op = new IsValidOp(p);
        if (!op.isValid()) {
            TopologyValidationError e = op.getValidationError();
            throw new IllegalArgumentException(what + ": not a simple polygon on the grid: " + e.getMessage()
                    + " at (" + e.getCoordinate().x + ", " + e.getCoordinate().y + ")");
        }
        if (p.getArea() == 0) {
            throw new IllegalArgumentException(what + ": zero area on the grid");
        }
        return new Region(ctx, p);
    }

    private static Geometry polygonal(GeometryContext ctx, Geometry g) {
        if (g.isEmpty()) {
            return ctx.factory().createPolygon();
        }
        if (g instanceof Polygon || g instanceof org.locationtech.jts.geom.MultiPolygon) {
            return g;
        }
        List<Polygon> polys = new ArrayList<>();
        for (int i = 0; i < g.getNumGeometries(); i++) {
            Geometry part = g.getGeometryN(i);
            if (part instanceof Polygon p && !p.isEmpty()) {
                polys.add(p);
            } else if (part instanceof org.locationtech.jts.geom.MultiPolygon mp) {
                for (int j = 0; j < mp.getNumGeometries(); j++) {
                    polys.add((Polygon) mp.getGeometryN(j));
                }
            }
        }
        if (polys.isEmpty()) {
            return ctx.factory().createPolygon();
        }
        return polys.size() == 1 ? polys.get(0) : ctx.factory().createMultiPolygon(polys.toArray(new Polygon[0]));
    }

    private static void requirePositive(String what, double valueMm) {
        if (!(valueMm > 0) || !Double.isFinite(valueMm)) {
            throw new IllegalArgumentException(what + ": expected a positive finite length in mm, found " + valueMm);
        }
    }

    /** Exact rotation by q quarter turns. */
    private static final class QuarterTurnFilter implements org.locationtech.jts.geom.CoordinateSequenceFilter {
        private final int q;

        QuarterTurnFilter(int q) {
            this.q = q;
        }

        @Override
        public void filter(CoordinateSequence seq, int i) {
            double x = seq.getX(i);
            double y = seq.getY(i);
            for (int r = 0; r < q; r++) {
                double t = x;
                x = 0.0 - y + 0.0;
                y = t;
            }
            seq.setOrdinate(i, 0, x);
            seq.setOrdinate(i, 1, y);
        }

        @Override
        public boolean isDone() {
            return false;
        }

        @Override
        public boolean isGeometryChanged() {
            return true;
        }
    }
}
