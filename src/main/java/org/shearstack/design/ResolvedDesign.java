package org.shearstack.design;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Optional;
import java.util.SortedSet;
import java.util.TreeMap;
import java.util.TreeSet;
import org.shearstack.rules.Derivation;
import org.shearstack.rules.Key;
import org.shearstack.spec.Dimension;

/**
 * Every value of a design after the rules ran, each with its derivation. Immutable. Numbers are in the
 * canonical unit of their key's dimension (lengths mm, pressures Pa absolute, speeds rad/s).
 */
public final class ResolvedDesign {

    private final String name;
    private final String sourceFile;
    private final Map<String, Key> keys;
    private final Map<String, Double> numbers;
    private final Map<String, String> texts;
    private final Map<String, Derivation> derivations;
    private final Map<String, Overridden> overridden;

    private ResolvedDesign(String name, String sourceFile, Map<String, Key> keys, Map<String, Double> numbers,
                           Map<String, String> texts, Map<String, Derivation> derivations,
                           Map<String, Overridden> overridden) {
        this.name = name;
        this.sourceFile = sourceFile;
        this.keys = keys;
        this.numbers = numbers;
        this.texts = texts;
        this.derivations = derivations;
        this.overridden = overridden;
    }

    /**
     * Builds a design from its values (copied). Every value needs a derivation.
     *
     * @param overridden for pinned keys: what the rule would have written, had the user not pinned it
     */
    public static ResolvedDesign of(String name, String sourceFile, Map<Key, Double> numbers, Map<Key, String> texts,
                                    Map<Key, Derivation> derivations, Map<Key, Overridden> overridden) {
        Map<String, Key> k = new TreeMap<>();
        Map<String, Double> n = new TreeMap<>();
        Map<String, String> t = new TreeMap<>();
        numbers.forEach((key, v) -> {
            k.put(key.name(), key);
            n.put(key.name(), v);
        });
        texts.forEach((key, v) -> {
            if (k.put(key.name(), key) != null) {
                throw new IllegalArgumentException(key + " holds both a number and a text");
            }
            t.put(key.name(), v);
        });
        Map<String, Derivation> d = new LinkedHashMap<>();
        for (String keyName : k.keySet()) {
            Derivation der = derivations.get(k.get(keyName));
            if (der == null) {
                throw new IllegalArgumentException(keyName + " has no derivation");
            }
            d.put(keyName, der);
        }
        Map<String, Overridden> o = new TreeMap<>();
        overridden.forEach((key, v) -> o.put(key.name(), v));
        return new ResolvedDesign(name, sourceFile, Collections.unmodifiableMap(k), Collections.unmodifiableMap(n),
                Collections.unmodifiableMap(t), Collections.unmodifiableMap(d), Collections.unmodifiableMap(o));
    }

    /** The design's name (from the spec). */
    public String name() {
        return name;
    }

    /** The spec file it was resolved from, as the user named it. */
    public String sourceFile() {
        return sourceFile;
    }

    /** The number at key in canonical units; throws when absent or text (use {@link #find} for optional keys). */
    public double get(Key key) {
        Double v = numbers.get(checked(key).name());
        if (v == null) {
            throw new NoSuchElementException("design " + name + " has no number for " + key
                    + (texts.containsKey(key.name()) ? " (it holds text)" : ""));
        }
        return v;
    }

    /** The text at key; throws when absent. */
    public String text(Key key) {
        String v = texts.get(checked(key).name());
        if (v == null) {
            throw new NoSuchElementException("design " + name + " has no text for " + key);
        }
        return v;
    }

    public boolean has(Key key) {
        return keys.containsKey(key.name());
    }

    public Optional<Double> find(Key key) {
        return Optional.ofNullable(numbers.get(checked(key).name()));
    }

    public Optional<String> findText(Key key) {
        return Optional.ofNullable(texts.get(checked(key).name()));
    }

    /** Why key has its value. */
    public Derivation derivation(Key key) {
        Derivation d = derivations.get(checked(key).name());
        if (d == null) {
            throw new NoSuchElementException("design " + name + " has no value for " + key);
        }
        return d;
    }

    /** For a pinned key: the derivation the rule produced and the pin replaced. */
    public Optional<Overridden> overridden(Key key) {
        return Optional.ofNullable(overridden.get(key.name()));
    }

    /** Every key with a value, sorted by name. */
    public SortedSet<Key> keys() {
        return Collections.unmodifiableSortedSet(new TreeSet<>(keys.values()));
    }

    /** The key with this name, if the design has it (for the command line, where users type names). */
    public Optional<Key> key(String keyName) {
        return Optional.ofNullable(keys.get(keyName));
    }

    /** The value formatted for people, e.g. "62.5 mm", "7.013 bar(a)", or the text. */
    public String display(Key key) {
        return texts.containsKey(key.name()) ? texts.get(key.name())
                : org.shearstack.spec.QuantityFormat.format(get(key), keys.get(key.name()).dimension());
    }

    /** The derivation tree of key as indented text. */
    public String explain(Key key) {
        return ExplainText.tree(this, key);
    }

    private Key checked(Key key) {
        Key stored = keys.get(key.name());
        if (stored != null && stored.dimension() != key.dimension()
                && !(stored.dimension() == Dimension.TEXT || key.dimension() == Dimension.TEXT)) {
            throw new IllegalArgumentException(key.name() + " is " + stored.dimension() + ", asked as "
                    + key.dimension());
        }
        return key;
    }

    @Override
    public String toString() {
        return "ResolvedDesign[" + name + ", " + keys.size() + " values]";
    }
}
