package org.shearstack.geom;

import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.PrecisionModel;

/**
 * The one precision context of the kernel: a fixed coordinate grid (mm) and the chord tolerance (mm) from
 * which curves are faceted. Every coordinate the kernel produces, z included, lies on the grid.
 *
 * <p>The default grid is 1/2048 mm (about 0.49 µm). Being a power of two, every grid coordinate is exact as
 * a double and, up to ±8192 mm, exact as a float32 too, so a vertex has one bit pattern in every STL triangle
 * and rotations by multiples of 90° stay on the grid. The default chord tolerance is 0.01 mm.
 */
public final class GeometryContext {

    /** Default grid: 2^-11 mm, about 0.49 µm. */
    public static final double DEFAULT_GRID_MM = 1.0 / 2048.0;
    /** Default chord tolerance (maximum distance between a facet and the true curve). */
    public static final double DEFAULT_CHORD_TOLERANCE_MM = 0.01;
    /** Upper bound on the segment count of one circle, so a tiny tolerance cannot exhaust memory. */
    public static final int MAX_SEGMENTS = 1 << 14;

    private final double gridMm;
    private final double chordToleranceMm;
    private final double scale;
    private final PrecisionModel precisionModel;
    private final GeometryFactory factory;

    /**
     * @param gridMm           grid spacing in mm, &gt; 0 and &le; 0.01 mm
     * @param chordToleranceMm chord tolerance in mm, &gt; 0 and at least two grid cells
     */
    public GeometryContext(double gridMm, double chordToleranceMm) {
        if (!(gridMm > 0 && gridMm <= 0.01)) {
            throw new IllegalArgumentException("grid: expected a value in (0, 0.01] mm, found " + gridMm);
        }
        if (!(chordToleranceMm >= 2 * gridMm && chordToleranceMm <= 10)) {
            throw new IllegalArgumentException("chord tolerance: expected a value in [2 grid = " + 2 * gridMm
                    + ", 10] mm, found " + chordToleranceMm);
        }
        this.gridMm = gridMm;
        this.chordToleranceMm = chordToleranceMm;
        double s = 1.0 / gridMm;
        double rounded = Math.rint(s);
        this.scale = Math.abs(s - rounded) < 1e-9 * s ? rounded : s;
        this.precisionModel = new PrecisionModel(scale);
        this.factory = new GeometryFactory(precisionModel);
    }

    /** The default context: grid 1/2048 mm, chord tolerance 0.01 mm. */
    public static GeometryContext standard() {
        return new GeometryContext(DEFAULT_GRID_MM, DEFAULT_CHORD_TOLERANCE_MM);
    }

    /** The default grid with another chord tolerance (e.g. from the command line or the spec). */
    public static GeometryContext withChordTolerance(double chordToleranceMm) {
        return new GeometryContext(DEFAULT_GRID_MM, chordToleranceMm);
    }

    public double gridMm() {
        return gridMm;
    }

    public double chordToleranceMm() {
        return chordToleranceMm;
    }

    /** Grid cells per mm (the JTS precision-model scale). */
    public double scale() {
        return scale;
    }

    /** The fixed JTS precision model of the grid. */
    public PrecisionModel precisionModel() {
        return precisionModel;
    }

    /** A JTS geometry factory on the grid. */
    public GeometryFactory factory() {
        return factory;
    }

    /** Nearest grid value to {@code valueMm}. */
    public double snap(double valueMm) {
        return Math.rint(valueMm * scale) / scale;
    }

    /** Grid index of {@code valueMm} (its nearest grid value divided by the grid). */
    public long gridIndex(double valueMm) {
        return Math.round(valueMm * scale);
    }

    /**
     * Number of facets for a full circle of radius {@code radiusMm}: the smallest multiple of 4 (at least 8)
     * such that both the inscribed polygon (sagitta r(1 − cos π/n)) and the circumscribed polygon
     * (r(sec π/n − 1)) stay within the chord tolerance. A pure function of radius and tolerance, so equal
     * radii always give equal polygons; multiples of 4 put vertices exactly on the quadrant points.
     */
    public int segmentCount(double radiusMm) {
        if (!(radiusMm > 0) || !Double.isFinite(radiusMm)) {
            throw new IllegalArgumentException("radius: expected a positive finite value in mm, found " + radiusMm);
        }
        // circumscribed error is the larger one: r (1/cos(pi/n) - 1) <= tol  <=>  cos(pi/n) >= r / (r + tol)
        double halfAngle = Math.acos(radiusMm / (radiusMm + chordToleranceMm));
        double n = Math.PI / halfAngle;
        long count = (long) Math.ceil(n - 1e-9);
        count = ((count + 3) / 4) * 4;
        return (int) Math.max(8, Math.min(MAX_SEGMENTS, count));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof GeometryContext c && c.gridMm == gridMm && c.chordToleranceMm == chordToleranceMm;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(gridMm) * 31 + Double.hashCode(chordToleranceMm);
    }

    @Override
    public String toString() {
        return "GeometryContext[grid " + gridMm + " mm, chord tolerance " + chordToleranceMm + " mm]";
    }
}
