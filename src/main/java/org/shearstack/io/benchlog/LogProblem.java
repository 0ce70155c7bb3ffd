package org.shearstack.io.benchlog;

import java.util.Locale;

/**
 * A located problem in a bench log: where (file, 1-based line and column, 0 when not applicable),
 * what was expected and what was found.
 */
public record LogProblem(String file, int line, int column, String expected, String found) {
    /** "file:line:column: expected X, found Y". */
    public String message() {
        StringBuilder s = new StringBuilder(file);
        if (line > 0) {
            s.append(':').append(line);
            if (column > 0) {
                s.append(':').append(column);
            }
        }
        s.append(": expected ").append(expected);
        if (!found.isEmpty()) {
            s.append(", found ").append(found);
        }
        return s.toString();
    }

    @Override
    public String toString() {
        return message();
    }

    static String quote(String text) {
        String t = text.length() > 40 ? text.substring(0, 40) + "…" : text;
        return String.format(Locale.ROOT, "'%s'", t);
    }
}
