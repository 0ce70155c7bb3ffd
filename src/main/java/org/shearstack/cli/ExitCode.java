package org.shearstack.cli;

/** The process exit codes, in one place. */
public enum ExitCode {
    /** Everything worked. */
    OK(0),
    /** An internal error: a bug, or the machine refused (disk full). */
    INTERNAL_ERROR(1),
    /** The user's input is wrong; located messages were printed and nothing was written. */
    BAD_INPUT(2),
    /** A design was produced but a check FAILED; see the report. */
    CHECK_FAILED(3);

    private final int code;

    ExitCode(int code) {
        this.code = code;
    }

    public int code() {
        return code;
    }
}
