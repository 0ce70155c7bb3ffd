package org.shearstack.spec;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * One key a spec may contain.
 *
 * @param path   dotted key path
 * @param keys   every key the field can produce: the path itself and sub-keys (path + suffix), with dimensions
 * @param parser turns the written scalar into entries
 * @param help   one line for the documentation
 */
public record SpecField(String path, Map<String, Dimension> keys, FieldParser parser, String help) {

    public SpecField {
        Objects.requireNonNull(path, "path");
        keys = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(keys));
    }

    static SpecField of(String path, Dimension d, FieldParser parser, String help) {
        return new SpecField(path, Map.of(path, d), parser, help);
    }

    static SpecField withSub(String path, Dimension d, String suffix, Dimension subD, FieldParser parser, String help) {
        Map<String, Dimension> k = new LinkedHashMap<>();
        k.put(path, d);
        k.put(path + suffix, subD);
        return new SpecField(path, k, parser, help);
    }
}
