package org.shearstack.spec;

import java.util.Objects;

/**
 * One located problem with the user's input. Lines and columns count from 1; 0 means unknown.
 *
 * @param file     the file as the user named it
 * @param line     1-based line
 * @param column   1-based column
 * @param keyPath  dotted key path ("supply.pressure"), or "" when the problem is not under a key
 * @param expected what was expected, e.g. "a pressure with a unit, e.g. \"6 bar(g)\""
 * @param found    what was found, e.g. "a length \"6 mm\""
 * @param message  an extra hint ("did you mean rotor.diameter?"), or ""
 */
public record Problem(String file, int line, int column, String keyPath, String expected, String found, String message) {

    public Problem {
        Objects.requireNonNull(file, "file");
        keyPath = keyPath == null ? "" : keyPath;
        expected = expected == null ? "" : expected;
        found = found == null ? "" : found;
        message = message == null ? "" : message;
    }

    /**
     * {@code file:line:column: key.path: expected ..., found ...[; message]}; without a line (0, e.g. a
     * command-line option) just {@code file: ...}.
     */
    public String format() {
        StringBuilder b = new StringBuilder();
        b.append(file);
        if (line > 0) {
            b.append(':').append(line).append(':').append(column);
        }
        b.append(": ");
        if (!keyPath.isEmpty()) {
            b.append(keyPath).append(": ");
        }
        if (!expected.isEmpty()) {
            b.append("expected ").append(expected).append(", found ").append(found);
            if (!message.isEmpty()) {
                b.append("; ").append(message);
            }
        } else {
            b.append(message);
        }
        return b.toString();
    }

    @Override
    public String toString() {
        return format();
    }
}
