package org.shearstack.spec;

import java.util.Objects;

/**
 * A parsed value in the canonical unit of its dimension (see {@link Dimension#canonicalUnit()}).
 * Pressures are absolute.
 */
public record Quantity(double value, Dimension dimension) {

    public Quantity {
        Objects.requireNonNull(dimension, "dimension");
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("quantity must be finite, found " + value);
        }
    }

    public static Quantity of(double value, Dimension dimension) {
        return new Quantity(value, dimension);
    }

    @Override
    public String toString() {
        return QuantityFormat.format(value, dimension);
    }
}
