package org.shearstack.spec;

import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;

/** Static factories for the kinds of spec values: quantities, counts, choices, names and compounds. */
public final class FieldParsers {

    private static final String AUTO = "auto";

    private FieldParsers() {
    }

    /** A quantity of one dimension in a range; "auto" allowed when {@code autoAllowed}. */
    public static FieldParser quantity(Dimension d, Range range, boolean autoAllowed) {
        return (text, c) -> {
            if (autoAllowed && AUTO.equals(text.strip())) {
                c.auto();
                return;
            }
            c.quantity(text, d, range, false).ifPresent(q -> c.value("", q));
        };
    }

    /** An absolute pressure by nature (ambient): bare units are absolute, gauge units are refused. */
    public static FieldParser absolutePressure(Range range) {
        return (text, c) -> c.quantity(text, Dimension.PRESSURE, range, true).ifPresent(q -> c.value("", q));
    }

    /** One of the listed words; "auto" is one of them only when listed. */
    public static FieldParser choice(String... words) {
        List<String> options = List.of(words);
        return (text, c) -> {
            String t = text.strip();
            if (!options.contains(t)) {
                c.fail("one of " + String.join(", ", options), QuantityParser.quoted(text));
            } else if (AUTO.equals(t)) {
                c.auto();
            } else {
                c.text("", t);
            }
        };
    }

    /** "true" or "false". */
    public static FieldParser bool() {
        return (text, c) -> {
            String t = text.strip().toLowerCase(Locale.ROOT);
            if (t.equals("true") || t.equals("false")) {
                c.text("", t);
            } else {
                c.fail("true or false", QuantityParser.quoted(text));
            }
        };
    }

    /** Free text matching a pattern, described in words; "auto" allowed when asked. */
    public static FieldParser name(String regex, String words, boolean autoAllowed) {
        Pattern p = Pattern.compile(regex);
        return (text, c) -> {
            String t = text.strip();
            if (autoAllowed && AUTO.equals(t)) {
                c.auto();
            } else if (p.matcher(t).matches()) {
                c.text("", t);
            } else {
                c.fail(words, QuantityParser.quoted(text));
            }
        };
    }

    /**
     * "VALUE at CONDITION": the value under the key, the condition under key + suffix, e.g.
     * "90 L/min at 6 bar(g)" or "9 V at 6000 rpm".
     */
    public static FieldParser valueAt(Dimension valueDim, Range valueRange, String suffix, Dimension atDim,
                                      Range atRange) {
        return (text, c) -> {
            String[] parts = text.strip().split("\\s+at\\s+", -1);
            if (parts.length != 2) {
                c.fail(DimensionText.noun(valueDim) + " at " + DimensionText.noun(atDim) + ", e.g. \""
                        + DimensionText.example(valueDim) + " at " + DimensionText.example(atDim) + "\"",
                        QuantityParser.quoted(text));
                return;
            }
            var v = c.quantity(parts[0], valueDim, valueRange, false);
            var a = c.quantity(parts[1], atDim, atRange, false);
            if (v.isPresent() && a.isPresent()) {
                c.value("", v.get());
                c.value(suffix, a.get());
            }
        };
    }

    /**
     * A word, optionally followed by a length: {@code kinds} lists the words that take a length
     * (stored under key + suffix), {@code bare} the words that stand alone.
     * "metal 8 mm" → text "metal" and a length; "printed" → text "printed".
     */
    public static FieldParser wordWithLength(List<String> kinds, List<String> bare, String suffix, Range lengthRange,
                                             String example) {
        return (text, c) -> {
            String t = text.strip();
            if (bare.contains(t)) {
                c.text("", t);
                return;
            }
            int space = t.indexOf(' ');
            String word = space < 0 ? t : t.substring(0, space);
            if (!kinds.contains(word)) {
                c.fail(describe(kinds, bare, example), QuantityParser.quoted(text));
                return;
            }
            if (space < 0) {
                c.fail(describe(kinds, bare, example), "no size in " + QuantityParser.quoted(text));
                return;
            }
            c.quantity(t.substring(space + 1), Dimension.LENGTH, lengthRange, false).ifPresent(q -> {
                c.text("", word);
                c.value(suffix, q);
            });
        };
    }

    private static String describe(List<String> kinds, List<String> bare, String example) {
        StringBuilder b = new StringBuilder();
        for (String k : kinds) {
            b.append(b.length() == 0 ? "" : " | ").append(k).append(" <length>");
        }
        for (String w : bare) {
            b.append(b.length() == 0 ? "" : " | ").append(w);
        }
        return b + " (e.g. \"" + example + "\")";
    }
}
