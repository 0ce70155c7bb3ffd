package org.shearstack.rules;

/**
 * Thrown by a rule when the user's inputs admit no answer (for example no listed bearing fits a pinned
 * shaft). The engine turns it into a located problem at {@code key} (exit code 2), not an internal error.
 */
public final class InputRejectedException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final transient Key key;
    private final String expected;
    private final String found;

    public InputRejectedException(Key key, String expected, String found) {
        super(key + ": expected " + expected + ", found " + found);
        this.key = key;
        this.expected = expected;
        this.found = found;
    }

    public Key key() {
        return key;
    }

    public String expected() {
        return expected;
    }

    public String found() {
        return found;
    }
}
