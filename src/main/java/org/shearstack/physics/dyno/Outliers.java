package org.shearstack.physics.dyno;

import java.util.Arrays;

/**
 * Single-sample spikes in a tachometer log (a missed or doubled reflection reads half or twice the speed): a
 * sample is an outlier when it differs from the median of its 7 neighbours (itself included) by more than
 * 5 % of the log's top speed and by more than 6 robust standard deviations (1.4826 × median absolute deviation)
 * of the whole log's departures from that running median.
 */
public final class Outliers {
    private static final int HALF = 3;
    /** Smallest departure, as a share of the top speed, that can make an outlier. */
    public static final double MIN_SHARE = 0.05;
    private static final double ROBUST_SIGMAS = 6;

    private Outliers() {
    }

    /** Flags per sample; true marks an outlier. */
    public static boolean[] find(double[] speed) {
        int n = speed.length;
        boolean[] out = new boolean[n];
        if (n < 2 * HALF + 1) {
            return out;
        }
        double top = 0;
        for (double w : speed) {
            top = Math.max(top, w);
        }
        double[] dev = new double[n];
        double[] win = new double[2 * HALF + 1];
        for (int i = 0; i < n; i++) {
            int s = Math.min(Math.max(0, i - HALF), n - win.length);
            System.arraycopy(speed, s, win, 0, win.length);
            Arrays.sort(win);
            dev[i] = speed[i] - win[HALF];
        }
        double[] abs = new double[n];
        for (int i = 0; i < n; i++) {
            abs[i] = Math.abs(dev[i]);
        }
        Arrays.sort(abs);
        double sigma = 1.4826 * abs[n / 2];
        double limit = Math.max(MIN_SHARE * top, ROBUST_SIGMAS * sigma);
        for (int i = 0; i < n; i++) {
            out[i] = Math.abs(dev[i]) > limit;
        }
        return out;
    }

    /** The log without the flagged samples. */
    static SpeedLog without(SpeedLog log, boolean[] flags) {
        int keep = 0;
        for (boolean f : flags) {
            keep += f ? 0 : 1;
        }
        double[] t = new double[keep];
        double[] w = new double[keep];
        double[] v = log.hasElectrical() ? new double[keep] : null;
        double[] a = log.hasElectrical() ? new double[keep] : null;
        double[] vv = log.voltagesV().orElse(null);
        double[] aa = log.currentsA().orElse(null);
        int k = 0;
        for (int i = 0; i < log.size(); i++) {
            if (!flags[i]) {
                t[k] = log.timeS(i);
                w[k] = log.speedRadPerS(i);
                if (v != null) {
                    v[k] = vv[i];
                    a[k] = aa[i];
                }
                k++;
            }
        }
        return SpeedLog.of(t, w, v, a);
    }
}
