package org.shearstack.spec;

import java.util.List;
import java.util.Optional;

/** What a field parser sees of one scalar, and where it puts its entries or problems. */
public final class FieldContext {

    private final String file;
    private final String path;
    private final String written;
    private final int line;
    private final int column;
    private final double ambientPa;
    private final List<SpecEntry> entries;
    private final List<Problem> problems;

    FieldContext(String file, String path, String written, int line, int column, double ambientPa,
                 List<SpecEntry> entries, List<Problem> problems) {
        this.file = file;
        this.path = path;
        this.written = written;
        this.line = line;
        this.column = column;
        this.ambientPa = ambientPa;
        this.entries = entries;
        this.problems = problems;
    }

    public String path() {
        return path;
    }

    public String written() {
        return written;
    }

    public double ambientPa() {
        return ambientPa;
    }

    /** Records a quantity under the field's path plus suffix ("" for the field itself, ".pressure" for a sub-key). */
    public void value(String suffix, Quantity q) {
        entries.add(new SpecEntry.Value(path + suffix, q, written, line, column));
    }

    public void text(String suffix, String text) {
        entries.add(new SpecEntry.Text(path + suffix, text, written, line, column));
    }

    public void auto() {
        entries.add(new SpecEntry.Auto(path, written, line, column));
    }

    public void fail(String expected, String found) {
        fail(expected, found, "");
    }

    public void fail(String expected, String found, String message) {
        problems.add(new Problem(file, line, column, path, expected, found, message));
    }

    /**
     * Parses part of the scalar as a quantity and checks its range; on failure records a problem and
     * returns empty.
     */
    public Optional<Quantity> quantity(String text, Dimension d, Range range, boolean absoluteByNature) {
        QuantityParser.Parsed p = QuantityParser.parse(text, d, ambientPa, absoluteByNature);
        if (!p.ok()) {
            fail(p.expected(), p.found());
            return Optional.empty();
        }
        Quantity q = p.quantity().get();
        if (!range.contains(q.value(), ambientPa)) {
            fail(DimensionText.noun(d) + " " + range.words(), QuantityParser.quoted(text.strip()));
            return Optional.empty();
        }
        return Optional.of(q);
    }
}
