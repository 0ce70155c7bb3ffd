package org.shearstack.io.benchlog;

import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** A header field split into a quantity and an optional unit ("speed [rpm]", "time_ms", "rpm"). */
record Column(Quantity quantity, String name, String unit) {
    /** What a column holds. */
    enum Quantity {
        TIME, SPEED, VOLTAGE, CURRENT, OTHER
    }

    private static final Pattern BRACKETED = Pattern.compile("^(.*?)\\s*[\\[(](.*?)[\\])]\\s*$");
    private static final Pattern SUFFIX = Pattern.compile("^(.*?)[_ ](s|ms|sec|rpm|hz|rad/s|v|a|ma|mv)$");

    static Column parse(String field) {
        String f = field.trim().toLowerCase(Locale.ROOT);
        String name = f;
        String unit = "";
        Matcher m = BRACKETED.matcher(f);
        Matcher sfx = SUFFIX.matcher(f);
        if (m.matches()) {
            name = m.group(1).trim();
            unit = m.group(2).trim();
        } else if (f.contains(" in ")) {
            name = f.substring(0, f.indexOf(" in ")).trim();
            unit = f.substring(f.indexOf(" in ") + 4).trim();
        } else if (sfx.matches()) {
            name = sfx.group(1).trim();
            unit = sfx.group(2);
        }
        if (unit.isEmpty()) {
            // a bare unit as the name: "rpm", "ms", "hz"
            if (SpeedUnit.fromSymbol(name).isPresent()) {
                return new Column(Quantity.SPEED, name, name);
            }
            if (LogTimeUnit.fromSymbol(name).isPresent()) {
                return new Column(Quantity.TIME, name, name);
            }
        }
        Quantity q = quantityOf(name);
        if (q == Quantity.OTHER && !unit.isEmpty()) {
            if (SpeedUnit.fromSymbol(unit).isPresent()) {
                q = Quantity.SPEED;
            } else if (LogTimeUnit.fromSymbol(unit).isPresent()) {
                q = Quantity.TIME;
            }
        }
        return new Column(q, name, unit);
    }

    private static Quantity quantityOf(String name) {
        switch (name) {
            case "t", "time", "timestamp", "elapsed", "elapsed time":
                return Quantity.TIME;
            case "speed", "rotor speed", "shaft speed", "omega", "w", "n", "rpm", "frequency", "freq",
                    "angular speed", "rotation", "rotational speed":
                return Quantity.SPEED;
            case "v", "u", "voltage", "volts", "generator voltage", "terminal voltage":
                return Quantity.VOLTAGE;
            case "i", "current", "amps", "generator current", "load current":
                return Quantity.CURRENT;
            default:
                return Quantity.OTHER;
        }
    }

    /** Scale from this column's unit to V or A (1 for V/A or no unit, 1e-3 for mV/mA); empty if unknown. */
    Optional<Double> electricalScale() {
        switch (unit) {
            case "", "v", "a":
                return Optional.of(1.0);
            case "mv", "ma":
                return Optional.of(1e-3);
            default:
                return Optional.empty();
        }
    }
}
