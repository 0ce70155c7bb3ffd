package org.shearstack.profile;

/**
 * The text of one profile file and how to name it in messages.
 *
 * @param label e.g. "profiles/printers/generic-0.4.yaml" (shipped) or the user file's path
 * @param stem  file name without ".yaml"
 */
record ProfileFile(String label, String stem, String text) {
}
