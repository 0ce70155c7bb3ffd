package org.shearstack.spec;

import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.shearstack.spec.Unit.PressureReference;

/**
 * Parses "number unit" text ("6 bar(g)", "0.75 mm", "15000 rpm") into a canonical {@link Quantity}.
 * Failures are values saying what was expected and what was found.
 */
public final class QuantityParser {

    private static final Pattern NUMBER_UNIT =
            Pattern.compile("([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*)");

    private QuantityParser() {
    }

    /** Either the quantity or the reason it is not one. */
    public record Parsed(Optional<Quantity> quantity, String expected, String found) {
        static Parsed ok(Quantity q) {
            return new Parsed(Optional.of(q), "", "");
        }

        static Parsed fail(String expected, String found) {
            return new Parsed(Optional.empty(), expected, found);
        }

        public boolean ok() {
            return quantity.isPresent();
        }
    }

    /**
     * @param text          as written
     * @param dimension     what the key expects
     * @param ambientPa     ambient pressure for gauge readings
     * @param absoluteByNature for keys such as the ambient pressure: bare units are absolute, gauge is wrong
     */
    public static Parsed parse(String text, Dimension dimension, double ambientPa, boolean absoluteByNature) {
        String expected = DimensionText.noun(dimension) + " with a unit, e.g. \"" + DimensionText.example(dimension) + "\"";
        if (dimension == Dimension.DIMENSIONLESS) {
            expected = "a plain number, e.g. \"0.9\"";
        } else if (dimension == Dimension.COUNT) {
            expected = "a whole number, e.g. \"3\"";
        }
        String t = text.strip();
        Matcher m = NUMBER_UNIT.matcher(t);
        if (!m.matches()) {
            return Parsed.fail(expected, quoted(text));
        }
        double number;
        try {
            number = Double.parseDouble(m.group(1));
        } catch (NumberFormatException e) {
            return Parsed.fail(expected, quoted(text));
        }
        if (!Double.isFinite(number)) {
            return Parsed.fail(expected, quoted(text) + " (too large)");
        }
        String symbol = m.group(2).strip();
        if (dimension == Dimension.COUNT) {
            if (!symbol.isEmpty() || number != Math.rint(number) || m.group(1).contains(".")
                    || m.group(1).toLowerCase(java.util.Locale.ROOT).contains("e")) {
                return Parsed.fail(expected, quoted(text));
            }
            return Parsed.ok(Quantity.of(number, dimension));
        }
        if (symbol.isEmpty() && dimension != Dimension.DIMENSIONLESS) {
            return Parsed.fail(expected, "no unit in " + quoted(text));
        }
        Optional<Unit> unit = Units.find(symbol, dimension);
        if (unit.isEmpty()) {
            List<Dimension> others = Units.dimensionsOf(symbol);
            if (!others.isEmpty()) {
                return Parsed.fail(expected, DimensionText.noun(others.get(0)) + " " + quoted(text));
            }
            return Parsed.fail(expected + " (units: " + String.join(", ", Units.symbols(dimension)) + ")",
                    "unknown unit " + quoted(symbol));
        }
        Unit u = unit.get();
        boolean gauge;
        if (absoluteByNature) {
            if (u.reference() == PressureReference.GAUGE) {
                return Parsed.fail("an absolute pressure, e.g. \"1.013 bar(a)\"", "a gauge pressure " + quoted(text));
            }
            gauge = false;
        } else {
            gauge = u.reference() == PressureReference.GAUGE || u.reference() == PressureReference.UNSTATED;
        }
        double canonical = u.toCanonical(number, gauge, ambientPa);
        if (!Double.isFinite(canonical)) {
            return Parsed.fail(expected, quoted(text) + " (too large)");
        }
        return Parsed.ok(Quantity.of(canonical, dimension));
    }

    static String quoted(String s) {
        return "\"" + s + "\"";
    }
}
