package org.shearstack.spec;

import java.util.List;
import java.util.Optional;

/** The outcome of reading a spec: a spec when there are no problems, otherwise every problem found. */
public record SpecResult(Optional<Spec> spec, List<Problem> problems) {

    public SpecResult {
        problems = List.copyOf(problems);
        if (spec.isPresent() != problems.isEmpty()) {
            throw new IllegalArgumentException("a result has either a spec or problems");
        }
    }

    public static SpecResult of(Spec spec) {
        return new SpecResult(Optional.of(spec), List.of());
    }

    public static SpecResult failed(List<Problem> problems) {
        return new SpecResult(Optional.empty(), problems);
    }

    public boolean ok() {
        return spec.isPresent();
    }

    /** The spec, or a {@link BadInputException} carrying every problem. */
    public Spec orThrow() {
        return spec.orElseThrow(() -> new BadInputException(problems));
    }
}
