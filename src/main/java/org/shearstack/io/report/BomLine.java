package org.shearstack.io.report;

/**
 * One line of the bill of materials.
 *
 * @param item          what it is ("rotor-disc", "608 bearing")
 * @param kind          "printed" or "hardware"
 * @param count         how many
 * @param detail        size, material or standard
 * @param massG         total mass in grams for printed parts, NaN for hardware
 * @param printTimeMin  estimated print time in minutes for printed parts, NaN for hardware
 */
public record BomLine(String item, String kind, int count, String detail, double massG, double printTimeMin) {
}
