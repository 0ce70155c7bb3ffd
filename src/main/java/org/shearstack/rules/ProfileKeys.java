package org.shearstack.rules;

import static org.shearstack.spec.Dimension.*;

import java.util.List;

/**
 * Keys the engine seeds from the chosen printer and filament profiles (origin PROFILE). Lengths in mm,
 * angles in degrees, everything else SI. The spec's printer-adjust values do not replace these: rule
 * PRN-HOLE-COMPENSATION combines them into {@link PrinterRules#HOLE_COMPENSATION}.
 */
public final class ProfileKeys {

    public static final Key PRINTER_NAME = Key.of("printer.name", TEXT);
    public static final Key NOZZLE_DIAMETER = Key.of("printer.nozzle-diameter", LENGTH);
    public static final Key LINE_WIDTH = Key.of("printer.line-width", LENGTH);
    public static final Key LAYER_HEIGHT = Key.of("printer.layer-height", LENGTH);
    public static final Key FIRST_LAYER_HEIGHT = Key.of("printer.first-layer-height", LENGTH);
    public static final Key BED_X = Key.of("printer.bed-x", LENGTH);
    public static final Key BED_Y = Key.of("printer.bed-y", LENGTH);
    public static final Key BED_Z = Key.of("printer.bed-z", LENGTH);
    public static final Key HOLE_COMPENSATION = Key.of("printer.hole-compensation", LENGTH);
    public static final Key OUTER_COMPENSATION = Key.of("printer.outer-compensation", LENGTH);
    public static final Key COMPENSATION_SCATTER = Key.of("printer.compensation-scatter", LENGTH);
    public static final Key MIN_CLEARANCE = Key.of("printer.min-clearance", LENGTH);
    public static final Key MIN_WALL = Key.of("printer.min-wall", LENGTH);
    public static final Key MAX_OVERHANG = Key.of("printer.max-overhang", ANGLE);
    public static final Key MAX_BRIDGE = Key.of("printer.max-bridge", LENGTH);
    public static final Key VOLUMETRIC_FLOW = Key.of("printer.volumetric-flow", VOLUME_FLOW);

    public static final Key FILAMENT_NAME = Key.of("filament.name", TEXT);
    public static final Key DENSITY = Key.of("filament.density", org.shearstack.spec.Dimension.DENSITY);
    public static final Key ELASTIC_MODULUS = Key.of("filament.elastic-modulus", STRESS);
    public static final Key POISSON_RATIO = Key.of("filament.poisson-ratio", DIMENSIONLESS);
    public static final Key TENSILE_STRENGTH_XY = Key.of("filament.tensile-strength-xy", STRESS);
    public static final Key TENSILE_STRENGTH_Z = Key.of("filament.tensile-strength-z", STRESS);
    public static final Key SOFTENING_TEMPERATURE = Key.of("filament.softening-temperature", TEMPERATURE);

    private ProfileKeys() {
    }

    /** Every key seeded from profiles, in documentation order. */
    public static List<Key> all() {
        return List.of(PRINTER_NAME, NOZZLE_DIAMETER, LINE_WIDTH, LAYER_HEIGHT, FIRST_LAYER_HEIGHT, BED_X, BED_Y,
                BED_Z, HOLE_COMPENSATION, OUTER_COMPENSATION, COMPENSATION_SCATTER, MIN_CLEARANCE, MIN_WALL,
                MAX_OVERHANG, MAX_BRIDGE, VOLUMETRIC_FLOW, FILAMENT_NAME, DENSITY, ELASTIC_MODULUS, POISSON_RATIO,
                TENSILE_STRENGTH_XY, TENSILE_STRENGTH_Z, SOFTENING_TEMPERATURE);
    }

}
