package org.shearstack.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.function.LongSupplier;
import org.shearstack.family.FamilyRunner;
import org.shearstack.io.family.FamilyRow;

/**
 * The family's progress line on the command's error stream: variants done, failures so far and an estimate of the
 * time left. On a terminal it is redrawn in place (carriage return, at most ten times a second); elsewhere (a log,
 * a test) a line is printed at every tenth of the family, so logs stay short. The clock only feeds this line, never
 * a file.
 */
final class FamilyProgress implements FamilyRunner.Listener {

    private static final long REDRAW_NANOS = 100_000_000L;

    private final PrintWriter err;
    private final boolean inPlace;
    private final LongSupplier nanoClock;
    private long startNanos;
    private long lastDrawNanos;
    private int lastTenth = -1;
    private int width;
    private String last = "";

    FamilyProgress(PrintWriter err, boolean inPlace, LongSupplier nanoClock) {
        this.err = err;
        this.inPlace = inPlace;
        this.nanoClock = nanoClock;
    }

    @Override
    public void started(int total, int jobs) {
        startNanos = nanoClock.getAsLong();
        lastDrawNanos = startNanos - REDRAW_NANOS;
        err.println("family: " + total + " variant" + (total == 1 ? "" : "s") + " on " + jobs + " worker"
                + (jobs == 1 ? "" : "s"));
        err.flush();
    }

    @Override
    public void finished(FamilyRow row, int done, int failed, int total) {
        long now = nanoClock.getAsLong();
        String line = line(done, failed, total, now - startNanos);
        last = line;
        if (inPlace) {
            if (now - lastDrawNanos >= REDRAW_NANOS || done == total) {
                lastDrawNanos = now;
                String padded = line.length() < width ? line + " ".repeat(width - line.length()) : line;
                width = line.length();
                err.print("\r" + padded);
                if (done == total) {
                    err.println();
                }
                err.flush();
            }
        } else {
            int tenth = (int) ((long) done * 10 / total);
            if (tenth != lastTenth) {
                lastTenth = tenth;
                err.println(line);
                err.flush();
            }
        }
    }

    /** Ends an in-place line early (a stop), showing the last counts. */
    void close() {
        if (inPlace) {
            err.println("\r" + last + (last.length() < width ? " ".repeat(width - last.length()) : ""));
            err.flush();
        }
    }

    /** "12/20 done, 1 failed, about 4 s left". */
    static String line(int done, int failed, int total, long elapsedNanos) {
        StringBuilder b = new StringBuilder();
        b.append("family: ").append(done).append('/').append(total).append(" done, ").append(failed)
                .append(failed == 1 ? " failure" : " failures");
        if (done > 0 && done < total) {
            double left = elapsedNanos / 1e9 / done * (total - done);
            b.append(", about ").append(duration(left)).append(" left");
        }
        return b.toString();
    }

    static String duration(double seconds) {
        if (seconds < 60) {
            return String.format(Locale.ROOT, "%d s", Math.max(1, Math.round(seconds)));
        }
        long s = Math.round(seconds);
        return String.format(Locale.ROOT, "%d min %02d s", s / 60, s % 60);
    }
}
