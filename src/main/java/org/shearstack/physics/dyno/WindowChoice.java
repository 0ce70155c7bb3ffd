package org.shearstack.physics.dyno;

import java.util.Locale;

/**
 * The Savitzky–Golay window used on one segment and why.
 *
 * @param points    odd number of samples in the window (the smallest, where the speed changes fastest)
 * @param maxPoints the largest window used in the segment (equal to points for a fixed window)
 * @param order     polynomial order
 * @param durationS length of the smallest window in seconds at the median sample period
 * @param reason    one sentence stating the rule that chose it
 */
public record WindowChoice(int points, int maxPoints, int order, double durationS, String reason) {
    /** Fewest points any window may have. */
    public static final int MIN_POINTS = 5;
    /** Most points an automatic window takes. */
    public static final int MAX_POINTS = 101;
    /** Share of a segment's speed change one window may span (physics.md §8.2, common practice). */
    public static final double SPEED_CHANGE_SHARE = 0.10;

    /**
     * Chooses the largest odd window whose span covers less than 10 % of the segment's speed change
     * at the segment's steepest slope (physics.md §8.2, common practice), between 5 and 101 points
     * and at most a third of the segment; quadratic fit.
     *
     * @param timeS   sample times of the segment
     * @param speed   speed samples of the segment (any unit)
     * @param label   segment name for the reason ("run-up")
     */
    public static WindowChoice choose(double[] timeS, double[] speed, String label) {
        int n = speed.length;
        double period = medianPeriod(timeS);
        // steepest slope from a coarse difference over ~5 % of the segment (at least 2 samples)
        int stride = Math.max(2, n / 20);
        double steepest = 0;
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            lo = Math.min(lo, speed[i]);
            hi = Math.max(hi, speed[i]);
            if (i + stride < n) {
                steepest = Math.max(steepest, Math.abs(speed[i + stride] - speed[i]) / (timeS[i + stride] - timeS[i]));
            }
        }
        double change = hi - lo;
        int byRule = steepest > 0 ? (int) Math.floor(SPEED_CHANGE_SHARE * change / steepest / period) : MAX_POINTS;
        int cap = Math.min(MAX_POINTS, Math.max(MIN_POINTS, n / 3));
        int pts = Math.max(MIN_POINTS, Math.min(byRule, cap));
        if (pts % 2 == 0) {
            pts -= 1;
        }
        pts = Math.max(MIN_POINTS, pts);
        String why;
        if (byRule < MIN_POINTS) {
            why = String.format(Locale.ROOT, "%d points (%.3g s), the smallest allowed: at %.3g s per sample even"
                    + " 5 points span more than 10 %% of the %s speed change; log faster for a finer result", pts,
                    pts * period, period, label);
        } else if (byRule > cap) {
            why = String.format(Locale.ROOT, "%d points (%.3g s): capped at %s; 10 %% of the %s speed change would"
                    + " allow %d points", pts, pts * period, cap == MAX_POINTS ? "101 points" : "a third of the segment",
                    label, byRule);
        } else {
            why = String.format(Locale.ROOT, "%d points (%.3g s at %.3g s per sample): the largest odd window that"
                    + " spans less than 10 %% of the %s speed change (%.4g) at its steepest slope"
                    + " (common practice, physics.md §8.2)", pts, pts * period, period, label, change);
        }
        return new WindowChoice(pts, pts, 2, pts * period, why + "; quadratic Savitzky–Golay fit");
    }

    /** A window given by the user. */
    public static WindowChoice given(int points, double[] timeS) {
        if (points < MIN_POINTS || points % 2 == 0) {
            throw new IllegalArgumentException("window must be an odd number of points >= 5, found " + points);
        }
        double period = medianPeriod(timeS);
        return new WindowChoice(points, points, 2, points * period,
                String.format(Locale.ROOT, "%d points (%.3g s), given on the command line; quadratic Savitzky–Golay"
                        + " fit", points, points * period));
    }

    /**
     * Applies the same 10 % rule at every sample with the local slope of a first smoothing: where the speed
     * changes slowly the window grows (up to 101 points and a third of the segment), which cuts the noise of the
     * derivative without letting any window span more than 10 % of the segment's speed change.
     *
     * @param pilot      the segment's window from {@link #choose}
     * @param slope      dω/dt from a first smoothing with the pilot window
     * @return the per-sample windows and the choice that describes them
     */
    public static Local local(WindowChoice pilot, double[] timeS, double[] speed, double[] slope, String label) {
        int n = speed.length;
        double period = medianPeriod(timeS);
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double w : speed) {
            lo = Math.min(lo, w);
            hi = Math.max(hi, w);
        }
        double change = hi - lo;
        int cap = Math.max(pilot.points(), Math.min(MAX_POINTS, n / 3));
        if (cap % 2 == 0) {
            cap--;
        }
        int[] win = new int[n];
        int min = Integer.MAX_VALUE;
        int max = 0;
        for (int i = 0; i < n; i++) {
            double a = Math.abs(slope[i]);
            int byRule = a > 0 ? (int) Math.min(cap, Math.floor(SPEED_CHANGE_SHARE * change / a / period)) : cap;
            int p = Math.max(pilot.points(), Math.min(byRule, cap));
            if (p % 2 == 0) {
                p--;
            }
            win[i] = Math.max(pilot.points(), p);
            min = Math.min(min, win[i]);
            max = Math.max(max, win[i]);
        }
        String why = String.format(Locale.ROOT, "%d to %d points (%.3g to %.3g s at %.3g s per sample): at each sample"
                + " the largest odd window that spans less than 10 %% of the %s speed change (%.4g) at the local slope"
                + " (common practice, physics.md §8.2); quadratic Savitzky–Golay fit", min, max, min * period,
                max * period, period, label, change);
        return new Local(win, new WindowChoice(min, max, pilot.order(), min * period, why));
    }

    /** Per-sample windows and their description. */
    public record Local(int[] windows, WindowChoice choice) {
    }

    static double medianPeriod(double[] timeS) {
        double[] d = new double[timeS.length - 1];
        for (int i = 1; i < timeS.length; i++) {
            d[i - 1] = timeS[i] - timeS[i - 1];
        }
        java.util.Arrays.sort(d);
        return d[d.length / 2];
    }
}
