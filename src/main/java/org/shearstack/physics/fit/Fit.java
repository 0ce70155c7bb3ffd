package org.shearstack.physics.fit;

/**
 * The fit between an internal feature (hole, seat) and an external one (shaft, ring). Clearance is
 * hole − shaft on diameter; a negative clearance is an interference.
 *
 * @param minClearanceMm smallest clearance (most negative = largest interference)
 * @param maxClearanceMm largest clearance
 */
public record Fit(double minClearanceMm, double maxClearanceMm) {

    /** Clearance throughout, interference throughout, or either depending on the actual sizes. */
    public enum Kind { CLEARANCE, TRANSITION, INTERFERENCE }

    public static Fit between(SizeRange hole, SizeRange shaft) {
        return new Fit(hole.minMm() - shaft.maxMm(), hole.maxMm() - shaft.minMm());
    }

    public static Fit between(ToleranceZone hole, ToleranceZone shaft) {
        return between(hole.range(), shaft.range());
    }

    public Kind kind() {
        if (minClearanceMm >= 0) {
            return Kind.CLEARANCE;
        }
        if (maxClearanceMm <= 0) {
            return Kind.INTERFERENCE;
        }
        return Kind.TRANSITION;
    }

    /** Largest interference (positive number, 0 when none). */
    public double maxInterferenceMm() {
        return Math.max(0, -minClearanceMm);
    }
}
