package org.shearstack.rules;

/** Where a rule writes its results, each with the reason in words and the source it rests on. */
public interface RuleOutputs {

    /**
     * @param key     one of the rule's declared writes
     * @param value   in the key's canonical unit
     * @param formula the formula or reasoning in words, e.g. "disc diameter + 2 × radial clearance"
     * @param source  where it comes from: a standard, a book with equation, or "common practice"
     */
    void put(Key key, double value, String formula, String source);

    void putText(Key key, String value, String formula, String source);
}
