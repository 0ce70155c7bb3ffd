package org.shearstack.physics.dyno;

/**
 * A stretch of a log: samples {@code from} (inclusive) to {@code to} (exclusive).
 *
 * @param kind   run-up (air on, speeding up), steady (near the top speed) or coast-down (air off)
 * @param from   first sample index
 * @param to     one past the last sample index
 * @param origin "detected" or "given" (from an option)
 */
public record Segment(Kind kind, int from, int to, String origin) {
    /** What the rotor was doing. */
    public enum Kind {
        RUN_UP, STEADY, COAST_DOWN;

        /** Lower-case label used in outputs ("run-up"). */
        public String label() {
            return name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
        }
    }

    public Segment {
        if (from < 0 || to <= from) {
            throw new IllegalArgumentException("segment needs 0 <= from < to, found " + from + ".." + to);
        }
    }

    public int length() {
        return to - from;
    }
}
