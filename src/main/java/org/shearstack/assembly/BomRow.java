package org.shearstack.assembly;

/**
 * One line of the bill of materials. Printed rows carry volume, mass and print time per copy; hardware rows
 * carry a description and a standard.
 *
 * @param kind        "printed" or "hardware"
 * @param item        part name or hardware item
 * @param count       how many
 * @param description size, standard, length
 * @param volumeMm3   per copy (printed), 0 for hardware
 * @param massG       per copy from the filament density (printed), 0 for hardware
 * @param printTimeS  per copy from the printer's volumetric flow (printed), 0 for hardware
 */
public record BomRow(String kind, String item, int count, String description, double volumeMm3, double massG,
        double printTimeS) {
}
