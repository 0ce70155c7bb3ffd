package org.shearstack.rules;

import java.util.List;

/**
 * The rule set is inconsistent: a cycle, a key written by two rules, or one key name used with two
 * dimensions. A programming error; the message names every key and rule involved.
 */
public final class RuleGraphException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final List<String> keys;

    public RuleGraphException(String message, List<String> keys) {
        super(message);
        this.keys = List.copyOf(keys);
    }

    /** The key names involved, for tests and tooling. */
    public List<String> keys() {
        return keys;
    }
}
