package org.shearstack.physics.dyno;

import java.util.Optional;

/**
 * Finds the run-up (air on), the steady stretch near top speed and the coast-down (air off) in a log
 * of one run: the top is the stretch within 2 % of the highest smoothed speed; the run-up is the rise
 * from the last sample below 0.5 % of it (or from the log's start) to the top; the coast-down is the fall
 * from the top until the speed drops below 5 % again, rises again, or the log ends. A rise or fall of
 * less than 30 % of the top speed is not counted as a segment.
 */
public final class SegmentDetector {
    /** Band below the top speed counted as "at the top". */
    public static final double TOP_BAND = 0.02;
    /** Speed, as a share of the top speed, below which the rotor counts as stopped. */
    public static final double LOW_SHARE = 0.05;
    /** Speed, as a share of the top speed, below which a run-up is taken to start from rest. */
    public static final double START_SHARE = 0.005;
    /** Smallest speed change, as a share of the top speed, that makes a segment. */
    public static final double MIN_CHANGE_SHARE = 0.30;

    private SegmentDetector() {
    }

    /** Detects the segments of a log (at least 10 samples). */
    public static Segments detect(SpeedLog log) {
        int n = log.size();
        if (n < 10) {
            throw new IllegalArgumentException("segment detection needs at least 10 samples, found " + n);
        }
        double[] t = log.timesS();
        int win = Math.max(5, (n / 50) | 1);
        win = Math.min(win, (n % 2 == 1) ? n : n - 1);
        double[] w = SavitzkyGolay.apply(t, log.speedsRadPerS(), win, 2).value();
        int iMax = 0;
        for (int i = 1; i < n; i++) {
            if (w[i] > w[iMax]) {
                iMax = i;
            }
        }
        double top = w[iMax];
        if (!(top > 0)) {
            return new Segments(Optional.empty(), Optional.empty(), Optional.empty());
        }
        double band = top * (1 - TOP_BAND);
        double low = top * LOW_SHARE;
        int hiStart = iMax;
        while (hiStart > 0 && w[hiStart - 1] >= band) {
            hiStart--;
        }
        int hiEnd = iMax;
        while (hiEnd < n - 1 && w[hiEnd + 1] >= band) {
            hiEnd++;
        }
        // run-up: back from the top to standstill (the rotor starts from rest when the air comes on)
        int ruStart = hiStart;
        while (ruStart > 0 && w[ruStart - 1] > START_SHARE * top && w[ruStart - 1] <= w[ruStart] + top * TOP_BAND) {
            ruStart--;
        }
        // coast-down: forward from the top until low, a renewed rise, or the end
        int cdEnd = hiEnd;
        double runningMin = w[hiEnd];
        while (cdEnd < n - 1 && w[cdEnd + 1] > low && w[cdEnd + 1] <= runningMin + top * TOP_BAND) {
            cdEnd++;
            runningMin = Math.min(runningMin, w[cdEnd]);
        }
        Optional<Segment> runUp = hiStart - ruStart >= 5 && w[hiStart] - w[ruStart] >= MIN_CHANGE_SHARE * top
                ? Optional.of(new Segment(Segment.Kind.RUN_UP, ruStart, hiStart + 1, "detected")) : Optional.empty();
        Optional<Segment> coast = cdEnd - hiEnd >= 5 && w[hiEnd] - w[cdEnd] >= MIN_CHANGE_SHARE * top
                ? Optional.of(new Segment(Segment.Kind.COAST_DOWN, hiEnd, cdEnd + 1, "detected")) : Optional.empty();
        Optional<Segment> steady = hiEnd - hiStart >= 4
                ? Optional.of(new Segment(Segment.Kind.STEADY, hiStart, hiEnd + 1, "detected")) : Optional.empty();
        return new Segments(runUp, steady, coast);
    }

    /** The sample index range covering a time range, as a segment of the given kind. */
    public static Segment fromTimes(SpeedLog log, TimeRange range, Segment.Kind kind) {
        int from = 0;
        while (from < log.size() && log.timeS(from) < range.startS()) {
            from++;
        }
        int to = from;
        while (to < log.size() && log.timeS(to) <= range.endS()) {
            to++;
        }
        if (to - from < 5) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "%s %.6g..%.6g s holds %d samples; at least 5 are needed (log spans %.6g..%.6g s)",
                    kind.label(), range.startS(), range.endS(), to - from, log.timeS(0), log.timeS(log.size() - 1)));
        }
        return new Segment(kind, from, to, "given");
    }
}
