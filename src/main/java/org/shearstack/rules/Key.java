package org.shearstack.rules;

import java.util.Objects;
import org.shearstack.spec.Dimension;

/**
 * The name of a quantity in a design, with its dimension. Spec inputs use the spec's key path
 * ("supply.pressure", "rotor.diameter"); derived quantities use the same dotted, lower-case, hyphenated
 * style ("housing.chamber-diameter"). A value pinned in the spec and a value derived by a rule share
 * one key, which is how a pin overrides a rule.
 */
public record Key(String name, Dimension dimension) implements Comparable<Key> {

    public Key {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(dimension, "dimension");
        if (!name.matches("[a-z0-9]+(-[a-z0-9]+)*(\\.[a-z0-9]+(-[a-z0-9]+)*)*")) {
            throw new IllegalArgumentException("key name must be dotted lower-case words, found '" + name + "'");
        }
    }

    public static Key of(String name, Dimension dimension) {
        return new Key(name, dimension);
    }

    @Override
    public int compareTo(Key other) {
        return name.compareTo(other.name);
    }

    @Override
    public String toString() {
        return name;
    }
}
