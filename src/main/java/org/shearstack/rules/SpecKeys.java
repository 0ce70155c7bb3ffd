package org.shearstack.rules;

import static org.shearstack.spec.Dimension.*;

import java.util.List;

/**
 * Keys of values a spec can give, one constant per key of {@link org.shearstack.spec.SpecSchema} (a test
 * keeps the two in step). A rule that writes one of these keys is overridden when the user pins it.
 * Pressures are absolute Pa, lengths mm, speeds rad/s.
 */
public final class SpecKeys {

    public static final Key NAME = Key.of("name", TEXT);
    public static final Key SUPPLY_PRESSURE = Key.of("supply.pressure", PRESSURE);
    public static final Key SUPPLY_TEMPERATURE = Key.of("supply.temperature", TEMPERATURE);
    public static final Key SUPPLY_AMBIENT = Key.of("supply.ambient", PRESSURE);
    public static final Key SUPPLY_BLOWDOWN_TANK = Key.of("supply.blowdown.tank", VOLUME);
    public static final Key SUPPLY_BLOWDOWN_FROM = Key.of("supply.blowdown.from", PRESSURE);
    public static final Key SUPPLY_BLOWDOWN_TO = Key.of("supply.blowdown.to", PRESSURE);
    public static final Key SUPPLY_BLOWDOWN_TIME = Key.of("supply.blowdown.time", TIME);
    public static final Key SUPPLY_CONDUCTANCE = Key.of("supply.conductance", CONDUCTANCE);
    public static final Key SUPPLY_CRITICAL_RATIO = Key.of("supply.critical-ratio", DIMENSIONLESS);
    public static final Key SUPPLY_FREE_AIR_FLOW = Key.of("supply.free-air-flow", VOLUME_FLOW);
    public static final Key SUPPLY_FREE_AIR_FLOW_PRESSURE = Key.of("supply.free-air-flow.pressure", PRESSURE);
    public static final Key SUPPLY_COMPRESSOR_DELIVERY = Key.of("supply.compressor-delivery", VOLUME_FLOW);
    public static final Key NOZZLE_KIND = Key.of("nozzle.kind", TEXT);
    public static final Key NOZZLE_COUNT = Key.of("nozzle.count", COUNT);
    public static final Key NOZZLE_DISCHARGE_COEFFICIENT = Key.of("nozzle.discharge-coefficient", DIMENSIONLESS);
    public static final Key NOZZLE_INSERT = Key.of("nozzle.insert", TEXT);
    public static final Key NOZZLE_THROAT_AREA = Key.of("nozzle.throat-area", AREA);
    public static final Key NOZZLE_JET_ANGLE = Key.of("nozzle.jet-angle", ANGLE);
    public static final Key PRINTER = Key.of("printer", TEXT);
    public static final Key PRINTER_ADJUST_HOLE_COMPENSATION = Key.of("printer-adjust.hole-compensation", LENGTH);
    public static final Key PRINTER_ADJUST_OUTER_COMPENSATION = Key.of("printer-adjust.outer-compensation", LENGTH);
    public static final Key FILAMENT = Key.of("filament", TEXT);
    public static final Key CALIBRATION = Key.of("calibration", TEXT);
    public static final Key ROTOR_DIAMETER = Key.of("rotor.diameter", LENGTH);
    public static final Key ROTOR_DISCS = Key.of("rotor.discs", COUNT);
    public static final Key ROTOR_DISC_THICKNESS = Key.of("rotor.disc-thickness", LENGTH);
    public static final Key ROTOR_GAP = Key.of("rotor.gap", LENGTH);
    public static final Key ROTOR_EXHAUST_DIAMETER = Key.of("rotor.exhaust-diameter", LENGTH);
    public static final Key ROTOR_SHAFT = Key.of("rotor.shaft", TEXT);
    public static final Key ROTOR_SHAFT_DIAMETER = Key.of("rotor.shaft.diameter", LENGTH);
    public static final Key ROTOR_SPACERS = Key.of("rotor.spacers", TEXT);
    public static final Key ROTOR_BALANCE_GRADE = Key.of("rotor.balance-grade", TEXT);
    public static final Key HOUSING_CHAMBER_DIAMETER = Key.of("housing.chamber-diameter", LENGTH);
    public static final Key BEARINGS = Key.of("bearings", TEXT);
    public static final Key FASTENERS_SIZE = Key.of("fasteners.size", TEXT);
    public static final Key FASTENERS_ANCHOR = Key.of("fasteners.anchor", TEXT);
    public static final Key SEAL = Key.of("seal", TEXT);
    public static final Key SEAL_SIZE = Key.of("seal.size", LENGTH);
    public static final Key INLET_PORT = Key.of("inlet-port", TEXT);
    public static final Key INLET_PORT_SIZE = Key.of("inlet-port.size", LENGTH);
    public static final Key GENERATOR_BODY_DIAMETER = Key.of("generator.body-diameter", LENGTH);
    public static final Key GENERATOR_BODY_LENGTH = Key.of("generator.body-length", LENGTH);
    public static final Key GENERATOR_SHAFT_DIAMETER = Key.of("generator.shaft-diameter", LENGTH);
    public static final Key GENERATOR_MOUNT_SCREWS = Key.of("generator.mount-screws", TEXT);
    public static final Key GENERATOR_MOUNT_SPACING = Key.of("generator.mount-spacing", LENGTH);
    public static final Key GENERATOR_OPEN_CIRCUIT_VOLTAGE = Key.of("generator.open-circuit-voltage", VOLTAGE);
    public static final Key GENERATOR_OPEN_CIRCUIT_VOLTAGE_SPEED = Key.of("generator.open-circuit-voltage.speed", ANGULAR_SPEED);
    public static final Key GENERATOR_WINDING_RESISTANCE = Key.of("generator.winding-resistance", RESISTANCE);
    public static final Key GENERATOR_LOAD = Key.of("generator.load", RESISTANCE);
    public static final Key TARGETS_OBJECTIVE = Key.of("targets.objective", TEXT);
    public static final Key TARGETS_SPEED = Key.of("targets.speed", ANGULAR_SPEED);
    public static final Key TARGETS_SAFETY_FACTOR = Key.of("targets.safety-factor", DIMENSIONLESS);
    public static final Key OUTPUT_CHORD_TOLERANCE = Key.of("output.chord-tolerance", LENGTH);

    private SpecKeys() {
    }

    /** Every spec key in schema order. */
    public static List<Key> all() {
        return List.of(NAME,
                SUPPLY_PRESSURE,
                SUPPLY_TEMPERATURE,
                SUPPLY_AMBIENT,
                SUPPLY_BLOWDOWN_TANK,
                SUPPLY_BLOWDOWN_FROM,
                SUPPLY_BLOWDOWN_TO,
                SUPPLY_BLOWDOWN_TIME,
                SUPPLY_CONDUCTANCE,
                SUPPLY_CRITICAL_RATIO,
                SUPPLY_FREE_AIR_FLOW,
                SUPPLY_FREE_AIR_FLOW_PRESSURE,
                SUPPLY_COMPRESSOR_DELIVERY,
                NOZZLE_KIND,
                NOZZLE_COUNT,
                NOZZLE_DISCHARGE_COEFFICIENT,
                NOZZLE_INSERT,
                NOZZLE_THROAT_AREA,
                NOZZLE_JET_ANGLE,
                PRINTER,
                PRINTER_ADJUST_HOLE_COMPENSATION,
                PRINTER_ADJUST_OUTER_COMPENSATION,
                FILAMENT,
                CALIBRATION,
                ROTOR_DIAMETER,
                ROTOR_DISCS,
                ROTOR_DISC_THICKNESS,
                ROTOR_GAP,
                ROTOR_EXHAUST_DIAMETER,
                ROTOR_SHAFT,
                ROTOR_SHAFT_DIAMETER,
                ROTOR_SPACERS,
                ROTOR_BALANCE_GRADE,
                HOUSING_CHAMBER_DIAMETER,
                BEARINGS,
                FASTENERS_SIZE,
                FASTENERS_ANCHOR,
                SEAL,
                SEAL_SIZE,
                INLET_PORT,
                INLET_PORT_SIZE,
                GENERATOR_BODY_DIAMETER,
                GENERATOR_BODY_LENGTH,
                GENERATOR_SHAFT_DIAMETER,
                GENERATOR_MOUNT_SCREWS,
                GENERATOR_MOUNT_SPACING,
                GENERATOR_OPEN_CIRCUIT_VOLTAGE,
                GENERATOR_OPEN_CIRCUIT_VOLTAGE_SPEED,
                GENERATOR_WINDING_RESISTANCE,
                GENERATOR_LOAD,
                TARGETS_OBJECTIVE,
                TARGETS_SPEED,
                TARGETS_SAFETY_FACTOR,
                OUTPUT_CHORD_TOLERANCE);
    }
}
