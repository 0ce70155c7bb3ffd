package org.shearstack.io.report;

/**
 * A labelled value for people: the design key it comes from, its number in the unit shown, and the text.
 *
 * @param key      design key ("rotor.diameter"), or a descriptive name when not a key
 * @param label    short label ("disc diameter")
 * @param value    the number in {@code unit}
 * @param unit     the unit shown ("mm")
 * @param display  the formatted value with its unit
 */
public record KeyDimension(String key, String label, double value, String unit, String display) {
}
