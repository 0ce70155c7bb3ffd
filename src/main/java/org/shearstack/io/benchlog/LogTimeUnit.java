package org.shearstack.io.benchlog;

import java.util.Locale;
import java.util.Optional;

/** Unit of a log's time column. */
public enum LogTimeUnit {
    SECOND("s", 1.0),
    MILLISECOND("ms", 1e-3);

    private final String symbol;
    private final double toSeconds;

    LogTimeUnit(String symbol, double toSeconds) {
        this.symbol = symbol;
        this.toSeconds = toSeconds;
    }

    public String symbol() {
        return symbol;
    }

    public double toSeconds(double value) {
        return value * toSeconds;
    }

    /** The unit for a symbol as written in a header or an option ("s", "sec", "ms", ...), if known. */
    public static Optional<LogTimeUnit> fromSymbol(String text) {
        switch (text.trim().toLowerCase(Locale.ROOT)) {
            case "s", "sec", "secs", "second", "seconds":
                return Optional.of(SECOND);
            case "ms", "msec", "millis", "millisecond", "milliseconds":
                return Optional.of(MILLISECOND);
            default:
                return Optional.empty();
        }
    }
}
