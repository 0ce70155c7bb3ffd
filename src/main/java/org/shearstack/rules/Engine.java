package org.shearstack.rules;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.shearstack.design.Overridden;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.spec.QuantityFormat;

/**
 * Runs a set of rules over seed values. Construction orders the rules by dependency and rejects cycles,
 * keys with two writers and keys used with two dimensions ({@link RuleGraphException}, naming the keys).
 * {@link #resolve} seeds the values, turns spec seeds a rule would write into pins, runs every rule in
 * order, keeps pins in place of the rule's output (recording both), and returns an immutable design.
 * An engine holds no mutable state and may be reused.
 */
public final class Engine {

    private final List<Rule> ordered;
    private final Map<String, Rule> writerOf;

    private Engine(List<Rule> ordered) {
        this.ordered = ordered;
        Map<String, Rule> w = new HashMap<>();
        for (Rule r : ordered) {
            for (Key k : r.writes()) {
                w.put(k.name(), r);
            }
        }
        this.writerOf = w;
    }

    /** An engine for these rules; throws {@link RuleGraphException} when they cannot be ordered. */
    public static Engine of(List<Rule> rules) {
        return new Engine(RuleGraph.order(List.copyOf(rules)));
    }

    /** The rules in the order they run. */
    public List<Rule> order() {
        return ordered;
    }

    /** True when some rule writes this key (so a spec value for it is a pin). */
    public boolean derives(Key key) {
        return writerOf.containsKey(key.name());
    }

    /**
     * Resolves a design. A DEFAULT seed for a key some rule writes is dropped (the rule decides); a PROFILE
     * seed for such a key is a programming error.
     */
    public Resolution resolve(String name, String sourceFile, List<Seed> seeds) {
        Store store = new Store();
        Set<String> pinned = new HashSet<>();
        for (Seed s : seeds) {
            boolean derived = derives(s.key());
            if (derived && s.origin() == Derivation.Origin.DEFAULT) {
                continue;
            }
            if (derived && s.origin() != Derivation.Origin.SPEC && s.origin() != Derivation.Origin.CALIBRATED) {
                throw new RuleGraphException(s.origin() + " value " + s.key() + " is also written by rule "
                        + writerOf.get(s.key().name()).id(), List.of(s.key().name()));
            }
            Derivation.Origin as = derived ? Derivation.Origin.PINNED : s.origin();
            if (derived) {
                pinned.add(s.key().name());
            }
            if (s.isText()) {
                store.putText(s.key(), s.text(), s.derivation(as));
            } else {
                store.putNumber(s.key(), s.number(), s.derivation(as));
            }
        }
        Map<Key, Overridden> overridden = new LinkedHashMap<>();
        List<MissingInput> missing = new ArrayList<>();
        List<InputRejectedException> rejected = new ArrayList<>();
        for (Rule rule : ordered) {
            RunOutputs out = new RunOutputs(rule);
            RunInputs in = new RunInputs(rule, store);
            try {
                rule.apply(in, out);
            } catch (RunInputs.Absent absent) {
                if (store.skippedWriters.stream().noneMatch(k -> k.equals(absent.key.name()))) {
                    missing.add(new MissingInput(absent.key, rule.id()));
                }
                rule.writes().forEach(k -> store.skippedWriters.add(k.name()));
                continue;
            } catch (InputRejectedException e) {
                rejected.add(e);
                rule.writes().forEach(k -> store.skippedWriters.add(k.name()));
                continue;
            } catch (RuleFailedException e) {
                throw e;
            } catch (RuntimeException e) {
                throw new RuleFailedException(rule.id(), "failed: " + e, e);
            }
            out.checkComplete();
            List<Derivation.Input> inputs = in.recordedInputs();
            for (RunOutputs.Written w : out.written()) {
                Derivation d = new Derivation(w.key(), Derivation.Origin.RULE, rule.id(), inputs, w.formula(), w.source());
                if (pinned.contains(w.key().name())) {
                    String shown = w.text() != null ? w.text() : QuantityFormat.format(w.number(), w.key().dimension());
                    overridden.put(w.key(), new Overridden(d, shown, w.number()));
                } else if (w.text() != null) {
                    store.putText(w.key(), w.text(), d);
                } else {
                    store.putNumber(w.key(), w.number(), d);
                }
            }
        }
        ResolvedDesign design = ResolvedDesign.of(name, sourceFile, store.numbers, store.texts, store.derivations,
                overridden);
        return new Resolution(design, missing, rejected);
    }

    /** The mutable value store of one run; never escapes {@link #resolve}. */
    static final class Store {
        final Map<Key, Double> numbers = new LinkedHashMap<>();
        final Map<Key, String> texts = new LinkedHashMap<>();
        final Map<Key, Derivation> derivations = new LinkedHashMap<>();
        final Map<String, Key> byName = new HashMap<>();
        final Set<String> skippedWriters = new HashSet<>();

        void putNumber(Key k, double v, Derivation d) {
            add(k, d);
            numbers.put(k, v);
        }

        void putText(Key k, String v, Derivation d) {
            add(k, d);
            texts.put(k, v);
        }

        private void add(Key k, Derivation d) {
            Key previous = byName.put(k.name(), k);
            if (previous != null) {
                throw new RuleGraphException("key " + k.name() + " seeded twice", List.of(k.name()));
            }
            derivations.put(k, d);
        }

        Key stored(Key asked) {
            return byName.get(asked.name());
        }
    }
}
