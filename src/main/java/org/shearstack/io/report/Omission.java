package org.shearstack.io.report;

/**
 * Something the report could not show, and why (a missing input, a part of the tool not present in this
 * build). Listed in the report instead of a placeholder.
 *
 * @param section  report section concerned ("performance", "parts", "preview")
 * @param reason   one sentence
 */
public record Omission(String section, String reason) {
}
