package org.shearstack.rules;

/** A rule threw or broke its contract (wrote an undeclared key, skipped a write, wrote NaN). Internal error. */
public final class RuleFailedException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final String ruleId;

    public RuleFailedException(String ruleId, String message, Throwable cause) {
        super("rule " + ruleId + ": " + message, cause);
        this.ruleId = ruleId;
    }

    public String ruleId() {
        return ruleId;
    }
}
