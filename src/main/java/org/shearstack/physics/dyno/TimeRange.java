package org.shearstack.physics.dyno;

/** A closed time interval of a log, in seconds. */
public record TimeRange(double startS, double endS) {
    public TimeRange {
        if (!(endS > startS)) {
            throw new IllegalArgumentException("time range needs start < end, found " + startS + " .. " + endS + " s");
        }
    }

    /** Parses "START:END" in seconds, e.g. "2.5:14". */
    public static TimeRange parse(String text) {
        String[] p = text.split(":");
        if (p.length != 2) {
            throw new IllegalArgumentException("expected START:END in seconds (e.g. 2.5:14), found '" + text + "'");
        }
        try {
            return new TimeRange(Double.parseDouble(p[0].trim()), Double.parseDouble(p[1].trim()));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("expected START:END in seconds (e.g. 2.5:14), found '" + text + "'", e);
        }
    }
}
