package org.shearstack.io.benchlog;

import java.util.Locale;
import java.util.Optional;

/** Unit of a log's speed column. */
public enum SpeedUnit {
    RPM("rpm", Math.PI / 30),
    HERTZ("Hz", 2 * Math.PI),
    RAD_PER_S("rad/s", 1.0);

    private final String symbol;
    private final double toRadPerS;

    SpeedUnit(String symbol, double toRadPerS) {
        this.symbol = symbol;
        this.toRadPerS = toRadPerS;
    }

    public String symbol() {
        return symbol;
    }

    public double toRadPerS(double value) {
        return value * toRadPerS;
    }

    /** The unit for a symbol as written in a header or an option ("rpm", "Hz", "rad/s", ...), if known. */
    public static Optional<SpeedUnit> fromSymbol(String text) {
        switch (text.trim().toLowerCase(Locale.ROOT).replace(" ", "")) {
            case "rpm", "r/min", "rev/min", "1/min", "min^-1", "min-1", "u/min":
                return Optional.of(RPM);
            case "hz", "rev/s", "rps", "r/s":
                return Optional.of(HERTZ);
            case "rad/s", "rad/sec", "rads", "rad_s", "rad*s^-1":
                return Optional.of(RAD_PER_S);
            default:
                return Optional.empty();
        }
    }
}
