package org.shearstack.part;

import java.util.Optional;

import org.shearstack.rules.Key;

/**
 * Read access to a resolved design, as the part recipes need it (numbers in canonical units, texts). The
 * resolved design implements it with method references: {@code DesignValues.of(design::get, design::text,
 * design::has)}.
 */
public interface DesignValues {

    double get(Key key);

    String text(Key key);

    boolean has(Key key);

    default Optional<Double> find(Key key) {
        return has(key) ? Optional.of(get(key)) : Optional.empty();
    }

    /** Adapts three functions (for example a resolved design's getters). */
    static DesignValues of(java.util.function.ToDoubleFunction<Key> get, java.util.function.Function<Key, String> text,
            java.util.function.Predicate<Key> has) {
        return new DesignValues() {
            @Override
            public double get(Key key) {
                return get.applyAsDouble(key);
            }

            @Override
            public String text(Key key) {
                return text.apply(key);
            }

            @Override
            public boolean has(Key key) {
                return has.test(key);
            }
        };
    }
}
