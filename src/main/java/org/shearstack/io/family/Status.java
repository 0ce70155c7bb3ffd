package org.shearstack.io.family;

/** What became of one variant of a family. */
public enum Status {
    /** Resolved, checked and generated; every check passed. */
    PASS("pass"),
    /** Generated; some check is a caution (or the rotor could not be checked). */
    CAUTION("caution"),
    /** Generated; some check FAILED. */
    FAIL("fail"),
    /** The variant's values do not make a design (a located problem). */
    BAD_INPUT("bad input"),
    /** The run broke (an internal error or the disk refused). */
    ERROR("error"),
    /** Not run: the family was stopped first. */
    NOT_RUN("not run");

    private final String word;

    Status(String word) {
        this.word = word;
    }

    /** The word the table shows. */
    public String word() {
        return word;
    }

    /** True for the outcomes that count as failures (a FAIL check, bad input or an error). */
    public boolean failed() {
        return this == FAIL || this == BAD_INPUT || this == ERROR;
    }

    /** The status of a report verdict word ("pass", "caution", "fail"). */
    public static Status ofVerdict(String verdict) {
        return switch (verdict) {
            case "pass" -> PASS;
            case "caution" -> CAUTION;
            case "fail" -> FAIL;
            default -> throw new IllegalArgumentException("unknown verdict " + verdict);
        };
    }
}
