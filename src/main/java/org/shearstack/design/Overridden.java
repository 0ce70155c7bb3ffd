package org.shearstack.design;

import org.shearstack.rules.Derivation;

/**
 * What a rule computed for a key the user pinned: kept so checks and {@code explain} can show both.
 *
 * @param derivation the rule's derivation
 * @param value      the rule's value formatted for people ("58.3 mm")
 * @param number     the rule's value in canonical units (NaN for text)
 */
public record Overridden(Derivation derivation, String value, double number) {
}
