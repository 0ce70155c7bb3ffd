package org.shearstack.spec;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * A parsed, checked spec: its name, the file it came from, and every entry by key path in file order.
 * Keys left out are simply absent.
 */
public record Spec(String name, String sourceFile, Map<String, SpecEntry> entries) {

    public Spec {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(sourceFile, "sourceFile");
        entries = Collections.unmodifiableMap(new LinkedHashMap<>(entries));
    }

    public Optional<SpecEntry> entry(String path) {
        return Optional.ofNullable(entries.get(path));
    }

    /** The quantity at path, if the spec gave a value (not auto, not text). */
    public Optional<Quantity> quantity(String path) {
        return entry(path).filter(SpecEntry.Value.class::isInstance).map(e -> ((SpecEntry.Value) e).quantity());
    }

    /** The text at path, if the spec gave a word or name there. */
    public Optional<String> text(String path) {
        return entry(path).filter(SpecEntry.Text.class::isInstance).map(e -> ((SpecEntry.Text) e).text());
    }

    /** A problem located at the entry for path (or at the top of the file when the path is absent). */
    public Problem problemAt(String path, String expected, String found, String message) {
        SpecEntry e = entries.get(path);
        return e == null
                ? new Problem(sourceFile, 1, 1, path, expected, found, message)
                : new Problem(sourceFile, e.line(), e.column(), path, expected, found, message);
    }
}
