package org.shearstack.check;

/** How serious a finding is. Ordered from harmless to blocking. */
public enum Severity {
    OK,
    CAUTION,
    FAIL;

    /** The more serious of two severities. */
    public Severity worst(Severity other) {
        return compareTo(other) >= 0 ? this : other;
    }
}
