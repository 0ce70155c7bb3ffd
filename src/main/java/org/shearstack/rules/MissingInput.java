package org.shearstack.rules;

/**
 * A rule could not run because a key it needs has no value (the spec left it out and nothing derives it).
 *
 * @param key    the key without a value
 * @param ruleId the rule that needed it
 */
public record MissingInput(Key key, String ruleId) {
}
