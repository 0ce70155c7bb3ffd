package org.shearstack.rules.geometry;

/**
 * Snapping lengths to what a printer can make: heights to whole layers, widths to whole line widths.
 * A value within {@link #SNAP_TOLERANCE_MM} of a whole step counts as that step, so 0.75 / 0.25 is three
 * layers and not four.
 */
public final class Quanta {

    /** Lengths closer than this to a whole number of steps count as whole (far below any printer's step). */
    public static final double SNAP_TOLERANCE_MM = 1e-6;

    private Quanta() {
    }

    /** The smallest whole number of steps whose total is at least {@code valueMm}. */
    public static int stepsUp(double valueMm, double stepMm) {
        requireStep(stepMm);
        return (int) Math.ceil(valueMm / stepMm - SNAP_TOLERANCE_MM / stepMm);
    }

    /** {@code valueMm} raised to a whole number of steps. */
    public static double up(double valueMm, double stepMm) {
        return stepsUp(valueMm, stepMm) * stepMm;
    }

    /** {@code valueMm} rounded to the nearest whole number of steps, at least one step. */
    public static double nearest(double valueMm, double stepMm) {
        requireStep(stepMm);
        long n = Math.max(1, Math.round(valueMm / stepMm));
        return n * stepMm;
    }

    /** {@code valueMm} rounded up to a multiple of {@code stepMm} (for catalogue-like dimensions such as 0.05 mm). */
    public static double upToMultiple(double valueMm, double stepMm) {
        return up(valueMm, stepMm);
    }

    private static void requireStep(double stepMm) {
        if (!(stepMm > 0) || Double.isInfinite(stepMm)) {
            throw new IllegalArgumentException("step must be a positive length, found " + stepMm + " mm");
        }
    }
}
