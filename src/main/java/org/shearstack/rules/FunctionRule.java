package org.shearstack.rules;

import java.util.List;
import java.util.Objects;
import java.util.function.BiConsumer;

/**
 * A rule made of an id, its declared keys and a function: the short way to write a rule.
 * <pre>{@code
 * FunctionRule.of("GEO-HOUSING-CHAMBER", List.of(ROTOR_DIAMETER, CLEARANCE), List.of(CHAMBER),
 *     (in, out) -> out.put(CHAMBER, in.get(ROTOR_DIAMETER) + 2 * in.get(CLEARANCE),
 *         "disc diameter + 2 × radial clearance", "common practice"));
 * }</pre>
 */
public record FunctionRule(String id, List<Key> reads, List<Key> writes, BiConsumer<RuleInputs, RuleOutputs> body)
        implements Rule {

    public FunctionRule {
        Objects.requireNonNull(id, "id");
        reads = List.copyOf(reads);
        writes = List.copyOf(writes);
        Objects.requireNonNull(body, "body");
        if (!id.matches("[A-Z]+(-[A-Z0-9]+)+")) {
            throw new IllegalArgumentException("rule id must be upper-case words with hyphens, found '" + id + "'");
        }
    }

    public static FunctionRule of(String id, List<Key> reads, List<Key> writes,
                                  BiConsumer<RuleInputs, RuleOutputs> body) {
        return new FunctionRule(id, reads, writes, body);
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        body.accept(in, out);
    }

    @Override
    public String toString() {
        return id;
    }
}
