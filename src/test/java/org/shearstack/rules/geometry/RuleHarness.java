package org.shearstack.rules.geometry;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.shearstack.rules.Key;
import org.shearstack.rules.Rule;
import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/**
 * A tiny stand-in for the engine, for rule tests: runs rules in dependency order over a map of inputs,
 * refuses undeclared reads and writes, two writers of one key, and a rule that leaves a declared key unwritten.
 */
public final class RuleHarness {

    public final Map<Key, Double> numbers = new LinkedHashMap<>();
    public final Map<Key, String> texts = new LinkedHashMap<>();
    public final Map<Key, String> formulas = new HashMap<>();
    public final Map<Key, String> writers = new HashMap<>();

    public RuleHarness put(Key k, double v) {
        numbers.put(k, v);
        return this;
    }

    public RuleHarness text(Key k, String v) {
        texts.put(k, v);
        return this;
    }

    public RuleHarness run(List<Rule> rules) {
        Map<Key, Rule> writerOf = new HashMap<>();
        for (Rule r : rules) {
            for (Key k : r.writes()) {
                Rule prev = writerOf.put(k, r);
                if (prev != null) {
                    throw new AssertionError("two rules write " + k + ": " + prev.id() + ", " + r.id());
                }
            }
        }
        List<Rule> pending = new ArrayList<>(rules);
        Set<Key> done = new HashSet<>();
        while (!pending.isEmpty()) {
            Rule next = null;
            for (Rule r : pending) {
                if (r.reads().stream().allMatch(k -> !writerOf.containsKey(k) || done.contains(k)
                        || (numbers.containsKey(k) || texts.containsKey(k)) && !writerOf.containsKey(k))) {
                    next = r;
                    break;
                }
            }
            if (next == null) {
                throw new AssertionError("cycle among " + pending.stream().map(Rule::id).toList());
            }
            pending.remove(next);
            apply(next);
            done.addAll(next.writes());
        }
        return this;
    }

    private void apply(Rule rule) {
        Set<Key> reads = Set.copyOf(rule.reads());
        Set<Key> writes = Set.copyOf(rule.writes());
        Set<Key> written = new HashSet<>();
        RuleInputs in = new RuleInputs() {
            private void check(Key k) {
                if (!reads.contains(k)) {
                    throw new AssertionError(rule.id() + " read undeclared " + k);
                }
            }

            @Override
            public double get(Key k) {
                check(k);
                Double v = numbers.get(k);
                if (v == null) {
                    throw new IllegalStateException(rule.id() + ": missing " + k);
                }
                return v;
            }

            @Override
            public String text(Key k) {
                check(k);
                String v = texts.get(k);
                if (v == null) {
                    throw new IllegalStateException(rule.id() + ": missing " + k);
                }
                return v;
            }

            @Override
            public boolean has(Key k) {
                check(k);
                return numbers.containsKey(k) || texts.containsKey(k);
            }

            @Override
            public Optional<Double> find(Key k) {
                check(k);
                return Optional.ofNullable(numbers.get(k));
            }
        };
        RuleOutputs out = new RuleOutputs() {
            @Override
            public void put(Key k, double v, String formula, String source) {
                if (!writes.contains(k)) {
                    throw new AssertionError(rule.id() + " wrote undeclared " + k);
                }
                if (!Double.isFinite(v)) {
                    throw new AssertionError(rule.id() + " wrote non-finite " + k);
                }
                numbers.put(k, v);
                formulas.put(k, formula + " [" + source + "]");
                writers.put(k, rule.id());
                written.add(k);
            }

            @Override
            public void putText(Key k, String v, String formula, String source) {
                if (!writes.contains(k)) {
                    throw new AssertionError(rule.id() + " wrote undeclared " + k);
                }
                texts.put(k, v);
                formulas.put(k, formula + " [" + source + "]");
                writers.put(k, rule.id());
                written.add(k);
            }
        };
        rule.apply(in, out);
        if (!written.equals(writes)) {
            Set<Key> missing = new HashSet<>(writes);
            missing.removeAll(written);
            throw new AssertionError(rule.id() + " left unwritten " + missing);
        }
    }

    public double get(Key k) {
        return numbers.get(k);
    }
}
