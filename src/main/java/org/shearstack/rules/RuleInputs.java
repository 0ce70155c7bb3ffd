package org.shearstack.rules;

import java.util.Optional;

/** Read access a rule gets: only the keys it declared. Numbers are in the key's canonical unit. */
public interface RuleInputs {

    double get(Key key);

    String text(Key key);

    /** True when the key holds a value (inputs from the spec may be absent, for example an optional generator). */
    boolean has(Key key);

    Optional<Double> find(Key key);
}
