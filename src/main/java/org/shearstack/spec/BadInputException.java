package org.shearstack.spec;

import java.util.List;
import java.util.stream.Collectors;

/** The user's input is wrong; carries every located problem. The command line maps it to exit code 2. */
public final class BadInputException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final transient List<Problem> problems;

    public BadInputException(List<Problem> problems) {
        super(problems.stream().map(Problem::format).collect(Collectors.joining("\n")));
        if (problems.isEmpty()) {
            throw new IllegalArgumentException("bad input needs at least one problem");
        }
        this.problems = List.copyOf(problems);
    }

    public List<Problem> problems() {
        return problems;
    }
}
