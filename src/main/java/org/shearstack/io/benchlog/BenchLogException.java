package org.shearstack.io.benchlog;

import java.util.List;
import java.util.stream.Collectors;

/** A bench log that cannot be used; carries every located problem found. */
public final class BenchLogException extends Exception {
    private final transient List<LogProblem> problems;

    public BenchLogException(List<LogProblem> problems) {
        super(problems.stream().map(LogProblem::message).collect(Collectors.joining("\n")));
        this.problems = List.copyOf(problems);
    }

    public BenchLogException(LogProblem problem) {
        this(List.of(problem));
    }

    public List<LogProblem> problems() {
        return problems;
    }
}
