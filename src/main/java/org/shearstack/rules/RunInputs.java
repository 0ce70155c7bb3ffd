package org.shearstack.rules;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.shearstack.spec.QuantityFormat;

/** The inputs one rule sees during one run: only its declared reads; records what it read. */
final class RunInputs implements RuleInputs {

    /** Signals a required input without a value; caught by the engine, which skips the rule. */
    static final class Absent extends RuntimeException {
        private static final long serialVersionUID = 1L;
        final transient Key key;

        Absent(Key key) {
            super(key.name(), null, false, false);
            this.key = key;
        }
    }

    private final Rule rule;
    private final Engine.Store store;
    private final Set<Key> declared;
    private final Set<String> read = new LinkedHashSet<>();

    RunInputs(Rule rule, Engine.Store store) {
        this.rule = rule;
        this.store = store;
        this.declared = Set.copyOf(rule.reads());
    }

    private Key declared(Key key) {
        if (!declared.contains(key)) {
            throw new RuleFailedException(rule.id(), "read " + key + " (" + key.dimension()
                    + ") which it does not declare", null);
        }
        read.add(key.name());
        return key;
    }

    @Override
    public double get(Key key) {
        Key k = store.stored(declared(key));
        if (k == null || !store.numbers.containsKey(k)) {
            throw new Absent(key);
        }
        return store.numbers.get(k);
    }

    @Override
    public String text(Key key) {
        Key k = store.stored(declared(key));
        if (k == null || !store.texts.containsKey(k)) {
            throw new Absent(key);
        }
        return store.texts.get(k);
    }

    @Override
    public boolean has(Key key) {
        return store.stored(declared(key)) != null;
    }

    @Override
    public Optional<Double> find(Key key) {
        Key k = store.stored(declared(key));
        return k == null ? Optional.empty() : Optional.ofNullable(store.numbers.get(k));
    }

    /** The inputs actually read, in declaration order, with their values formatted. */
    List<Derivation.Input> recordedInputs() {
        List<Derivation.Input> inputs = new ArrayList<>();
        for (Key k : rule.reads()) {
            if (!read.contains(k.name())) {
                continue;
            }
            Key stored = store.stored(k);
            String shown;
            if (stored == null) {
                shown = "(absent)";
            } else if (store.texts.containsKey(stored)) {
                shown = store.texts.get(stored);
            } else {
                shown = QuantityFormat.format(store.numbers.get(stored), stored.dimension());
            }
            inputs.add(new Derivation.Input(k, shown));
        }
        return inputs;
    }
}
