package org.shearstack.rules;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/** Collects one rule's outputs and enforces the contract: declared keys only, each once, finite numbers. */
final class RunOutputs implements RuleOutputs {

    record Written(Key key, double number, String text, String formula, String source) {
    }

    private final Rule rule;
    private final Set<Key> declared;
    private final Set<String> done = new HashSet<>();
    private final List<Written> written = new ArrayList<>();

    RunOutputs(Rule rule) {
        this.rule = rule;
        this.declared = Set.copyOf(rule.writes());
    }

    @Override
    public void put(Key key, double value, String formula, String source) {
        accept(key);
        if (!Double.isFinite(value)) {
            throw new RuleFailedException(rule.id(), "wrote " + value + " for " + key, null);
        }
        written.add(new Written(key, value, null, nonNull(formula), nonNull(source)));
    }

    @Override
    public void putText(Key key, String value, String formula, String source) {
        accept(key);
        if (value == null) {
            throw new RuleFailedException(rule.id(), "wrote no text for " + key, null);
        }
        written.add(new Written(key, Double.NaN, value, nonNull(formula), nonNull(source)));
    }

    private void accept(Key key) {
        if (!declared.contains(key)) {
            throw new RuleFailedException(rule.id(), "wrote " + key + " (" + key.dimension()
                    + ") which it does not declare", null);
        }
        if (!done.add(key.name())) {
            throw new RuleFailedException(rule.id(), "wrote " + key + " twice", null);
        }
    }

    void checkComplete() {
        for (Key k : rule.writes()) {
            if (!done.contains(k.name())) {
                throw new RuleFailedException(rule.id(), "did not write " + k, null);
            }
        }
    }

    List<Written> written() {
        return written;
    }

    private static String nonNull(String s) {
        return s == null ? "" : s;
    }
}
