package org.shearstack.spec;

import static org.shearstack.spec.Dimension.*;
import static org.shearstack.spec.FieldParsers.*;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;

/**
 * Every key a spec may contain, in one table: its dimension, the allowed range and the stated defaults.
 * Sections are the key paths that hold mappings. To add a key, add one line here (and document it in the
 * README's spec section).
 */
public final class SpecSchema {

    /** Standard atmosphere, ISO 2533:1975: 101 325 Pa. Default ambient pressure. */
    public static final double STANDARD_ATMOSPHERE_PA = 101_325.0;

    /**
     * The top-level section that describes a family of variants ({@link FamilySection}). The spec reader
     * leaves it to {@link FamilySection#read}; a single design ignores it.
     */
    public static final String FAMILY_SECTION = "family";

    private static final double BAR = 1e5;
    private static final String PROFILE_NAME = "[A-Za-z0-9][A-Za-z0-9._/\\\\:-]*";
    private static final Map<String, SpecField> FIELDS = build();
    private static final Set<String> SECTIONS = Set.of("supply", "supply.blowdown", "nozzle", "printer-adjust",
            "rotor", "housing", "fasteners", "generator", "targets", "output");
    private static final List<SpecDefault> DEFAULTS = List.of(
            SpecDefault.number("supply.ambient", PRESSURE, STANDARD_ATMOSPHERE_PA,
                    "standard atmosphere, ISO 2533:1975 (101.325 kPa)"),
            SpecDefault.number("supply.temperature", TEMPERATURE, 293.15,
                    "20 degC, the ISO 554 standard atmosphere for testing"),
            SpecDefault.number("nozzle.count", COUNT, 1, "one nozzle unless asked (common practice)"),
            SpecDefault.text("nozzle.insert", "false", "nozzle printed in the housing unless asked"),
            SpecDefault.text("printer", "generic-0.4", "the shipped generic 0.4 mm nozzle printer"),
            SpecDefault.text("filament", "petg", "PETG: stiff, tough and easy to print (common practice)"),
            SpecDefault.text("rotor.shaft", "printed", "printed hub shaft unless a metal shaft is given"),
            SpecDefault.text("rotor.spacers", "separate", "separate keyed spacers unless asked"),
            SpecDefault.text("rotor.balance-grade", "G6.3", "ISO 21940-11 grade G6.3, usual for small turbines"),
            SpecDefault.text("fasteners.size", "M3", "M3, the most common hobby screw size (common practice)"),
            SpecDefault.text("fasteners.anchor", "heat-set", "heat-set inserts (common practice for printed parts)"),
            SpecDefault.text("seal", "none", "no seal unless asked"),
            SpecDefault.text("targets.objective", "power", "power at the design speed unless asked"),
            SpecDefault.number("targets.safety-factor", DIMENSIONLESS, 3,
                    "3 on strength at the highest speed the air can reach (common practice for printed rotors)"),
            SpecDefault.number("output.chord-tolerance", LENGTH, 0.01, "0.01 mm, below a printer's resolution"));

    private SpecSchema() {
    }

    private static Map<String, SpecField> build() {
        List<SpecField> f = new ArrayList<>();
        Range positiveLength = Range.aboveUpTo(0, 1000, "above 0 mm and at most 1000 mm");
        Range gaugePressure = Range.gaugeAboveUpTo(0, 16 * BAR, "above 0 and at most 16 bar(g)");
        f.add(SpecField.of("name", TEXT, name("[A-Za-z0-9][A-Za-z0-9._-]{0,63}",
                "a name of letters, digits, '.', '_' or '-' (at most 64)", false), "design name, also the output folder"));
        // supply
        f.add(SpecField.of("supply.pressure", PRESSURE, quantity(PRESSURE, gaugePressure, false),
                "regulator setting at the turbine inlet"));
        f.add(SpecField.of("supply.temperature", TEMPERATURE,
                quantity(TEMPERATURE, Range.between(233.15, 373.15, "between -40 and 100 degC"), false),
                "supply air temperature"));
        f.add(SpecField.of("supply.ambient", PRESSURE,
                absolutePressure(Range.between(0.5 * BAR, 1.1 * BAR, "between 0.5 and 1.1 bar(a)")),
                "ambient (absolute) pressure; bare units are absolute here"));
        f.add(SpecField.of("supply.blowdown.tank", VOLUME,
                quantity(VOLUME, Range.aboveUpTo(0, 10, "above 0 and at most 10 m3"), false), "receiver volume"));
        f.add(SpecField.of("supply.blowdown.from", PRESSURE, quantity(PRESSURE, gaugePressure, false),
                "tank pressure when timing starts"));
        f.add(SpecField.of("supply.blowdown.to", PRESSURE,
                quantity(PRESSURE, Range.gaugeAboveUpTo(-0.5 * BAR, 16 * BAR, "above -0.5 and at most 16 bar(g)"), false),
                "tank pressure when timing stops"));
        f.add(SpecField.of("supply.blowdown.time", TIME,
                quantity(TIME, Range.aboveUpTo(0, 3600, "above 0 s and at most 1 h"), false), "elapsed time"));
        f.add(SpecField.of("supply.conductance", CONDUCTANCE,
                quantity(CONDUCTANCE, Range.aboveUpTo(0, 1e-6, "above 0 and at most 100 dm3/(s*bar)"), false),
                "ISO 6358 sonic conductance C of the supply path"));
        f.add(SpecField.of("supply.critical-ratio", DIMENSIONLESS,
                quantity(DIMENSIONLESS, new Range(0, true, 1, false, false, "from 0 up to but not including 1") , false),
                "ISO 6358 critical pressure ratio b"));
        f.add(SpecField.withSub("supply.free-air-flow", VOLUME_FLOW, ".pressure", PRESSURE,
                valueAt(VOLUME_FLOW, Range.aboveUpTo(0, 1, "above 0 and at most 60000 L/min"), ".pressure", PRESSURE,
                        gaugePressure), "free-air flow delivered at a pressure"));
        f.add(SpecField.of("supply.compressor-delivery", VOLUME_FLOW,
                quantity(VOLUME_FLOW, Range.aboveUpTo(0, 1, "above 0 and at most 60000 L/min"), false),
                "compressor free-air delivery"));
        // nozzle
        f.add(SpecField.of("nozzle.kind", TEXT, choice("converging", "converging-diverging", "auto"), "nozzle kind"));
        f.add(SpecField.of("nozzle.count", COUNT, quantity(COUNT, Range.between(1, 8, "from 1 to 8"), false),
                "number of nozzles"));
        f.add(SpecField.of("nozzle.discharge-coefficient", DIMENSIONLESS,
                quantity(DIMENSIONLESS, Range.aboveUpTo(0, 1, "above 0 and at most 1"), true), "discharge coefficient"));
        f.add(SpecField.of("nozzle.insert", TEXT, bool(), "make the nozzle a drop-in block"));
        f.add(SpecField.of("nozzle.throat-area", AREA,
                quantity(AREA, Range.aboveUpTo(0, 500, "above 0 and at most 500 mm2"), true), "total throat area"));
        f.add(SpecField.of("nozzle.jet-angle", ANGLE,
                quantity(ANGLE, Range.between(0, 45, "between 0 and 45 deg"), true), "jet angle to the rotor tangent"));
        f.add(SpecField.of("calibration", TEXT, name(PROFILE_NAME,
                "a calibration file written by 'shearstack calibrate' (FILE.yaml, relative to the spec)", false),
                "bench calibration of the performance model"));
        // printer and filament
        f.add(SpecField.of("printer", TEXT, name(PROFILE_NAME, "a printer profile name or file", false),
                "printer profile"));
        f.add(SpecField.of("printer-adjust.hole-compensation", LENGTH,
                quantity(LENGTH, Range.between(-1, 2, "between -1 and 2 mm"), false),
                "how much smaller holes print than modelled (on diameter)"));
        f.add(SpecField.of("printer-adjust.outer-compensation", LENGTH,
                quantity(LENGTH, Range.between(-1, 1, "between -1 and 1 mm"), false),
                "how much larger outer dimensions print than modelled"));
        f.add(SpecField.of("filament", TEXT, name(PROFILE_NAME, "a filament profile name or file", false),
                "filament profile"));
        // rotor and housing
        f.add(SpecField.of("rotor.diameter", LENGTH,
                quantity(LENGTH, Range.between(20, 300, "between 20 and 300 mm"), true), "disc outer diameter"));
        f.add(SpecField.of("rotor.discs", COUNT, quantity(COUNT, Range.between(2, 60, "from 2 to 60"), true),
                "number of discs"));
        f.add(SpecField.of("rotor.disc-thickness", LENGTH,
                quantity(LENGTH, Range.aboveUpTo(0, 5, "above 0 and at most 5 mm"), true), "disc thickness"));
        f.add(SpecField.of("rotor.gap", LENGTH,
                quantity(LENGTH, Range.aboveUpTo(0, 5, "above 0 and at most 5 mm"), true), "face-to-face gap"));
        f.add(SpecField.of("rotor.exhaust-diameter", LENGTH, quantity(LENGTH, positiveLength, true),
                "outer diameter of the exhaust port ring"));
        f.add(SpecField.withSub("rotor.shaft", TEXT, ".diameter", LENGTH,
                wordWithLength(List.of("metal"), List.of("printed"), ".diameter",
                        Range.between(2, 25, "between 2 and 25 mm"), "metal 8 mm"), "printed or metal shaft"));
        f.add(SpecField.of("rotor.spacers", TEXT, choice("separate", "integral"), "separate or integral spacers"));
        f.add(SpecField.of("rotor.balance-grade", TEXT, name("G(0\\.4|1|2\\.5|6\\.3|16|40)",
                "an ISO 21940-11 grade G0.4, G1, G2.5, G6.3, G16 or G40", false), "balance grade"));
        f.add(SpecField.of("housing.chamber-diameter", LENGTH, quantity(LENGTH, positiveLength, true),
                "housing chamber (bore) diameter"));
        // hardware
        f.add(SpecField.of("bearings", TEXT, name("[A-Za-z0-9][A-Za-z0-9-]{0,15}",
                "auto or a bearing designation such as 608", true), "bearing designation"));
        f.add(SpecField.of("fasteners.size", TEXT, name("M\\d+(\\.\\d+)?", "a metric size such as M3", false),
                "screw size"));
        f.add(SpecField.of("fasteners.anchor", TEXT, choice("heat-set", "nut", "tapped"), "how screws hold"));
        f.add(SpecField.withSub("seal", TEXT, ".size", LENGTH,
                wordWithLength(List.of("o-ring", "gasket"), List.of("none"), ".size",
                        Range.aboveUpTo(0, 10, "above 0 and at most 10 mm"), "o-ring 1.5 mm"),
                "o-ring cross-section, gasket thickness or none"));
        f.add(SpecField.withSub("inlet-port", TEXT, ".size", LENGTH,
                wordWithLength(List.of("push-in"), List.of("G1/8", "G1/4", "M5"), ".size",
                        Range.between(3, 16, "between 3 and 16 mm"), "push-in 6 mm"), "inlet port"));
        // generator
        Range genLength = Range.aboveUpTo(0, 200, "above 0 and at most 200 mm");
        f.add(SpecField.of("generator.body-diameter", LENGTH, quantity(LENGTH, genLength, false), "motor body diameter"));
        f.add(SpecField.of("generator.body-length", LENGTH, quantity(LENGTH, genLength, false), "motor body length"));
        f.add(SpecField.of("generator.shaft-diameter", LENGTH,
                quantity(LENGTH, Range.aboveUpTo(0, 12, "above 0 and at most 12 mm"), false), "motor shaft diameter"));
        f.add(SpecField.of("generator.mount-screws", TEXT, name("M\\d+(\\.\\d+)?", "a metric size such as M2.5", false),
                "motor face screws"));
        f.add(SpecField.of("generator.mount-spacing", LENGTH, quantity(LENGTH, genLength, false),
                "distance between the face screws"));
        f.add(SpecField.withSub("generator.open-circuit-voltage", VOLTAGE, ".speed", ANGULAR_SPEED,
                valueAt(VOLTAGE, Range.aboveUpTo(0, 1000, "above 0 and at most 1000 V"), ".speed", ANGULAR_SPEED,
                        Range.aboveUpTo(0, 200_000 * 2 * Math.PI / 60, "above 0 and at most 200000 rpm")),
                "open-circuit voltage at a speed"));
        f.add(SpecField.of("generator.winding-resistance", RESISTANCE,
                quantity(RESISTANCE, Range.aboveUpTo(0, 1e4, "above 0 and at most 10 kohm"), false),
                "winding resistance"));
        f.add(SpecField.of("generator.load", RESISTANCE,
                quantity(RESISTANCE, Range.aboveUpTo(0, 1e6, "above 0 and at most 1000 kohm"), true),
                "load resistance"));
        // targets and output
        f.add(SpecField.of("targets.objective", TEXT, choice("power", "efficiency"), "what to optimise"));
        f.add(SpecField.of("targets.speed", ANGULAR_SPEED,
                quantity(ANGULAR_SPEED, Range.aboveUpTo(0, 200_000 * 2 * Math.PI / 60, "above 0 and at most 200000 rpm"),
                        true), "design operating speed"));
        f.add(SpecField.of("targets.safety-factor", DIMENSIONLESS,
                quantity(DIMENSIONLESS, Range.between(1, 20, "between 1 and 20"), false), "safety factor on stress"));
        f.add(SpecField.of("output.chord-tolerance", LENGTH,
                quantity(LENGTH, Range.between(0.001, 1, "between 0.001 and 1 mm"), false), "mesh chord tolerance"));
        Map<String, SpecField> m = new LinkedHashMap<>();
        for (SpecField field : f) {
            m.put(field.path(), field);
        }
        return Collections.unmodifiableMap(m);
    }

    /** The field written at this path, if the path is a key (not a section). */
    public static Optional<SpecField> field(String path) {
        return Optional.ofNullable(FIELDS.get(path));
    }

    public static boolean isSection(String path) {
        return SECTIONS.contains(path);
    }

    /** Every field in documentation order. */
    public static List<SpecField> fields() {
        return List.copyOf(FIELDS.values());
    }

    /** Every key path a spec can produce (fields and their sub-keys) with its dimension. */
    public static Map<String, Dimension> allKeys() {
        Map<String, Dimension> m = new LinkedHashMap<>();
        for (SpecField f : FIELDS.values()) {
            m.putAll(f.keys());
        }
        return m;
    }

    /** Every path a user may write, keys and sections, sorted: the candidates for "did you mean". */
    public static Set<String> writablePaths() {
        Set<String> s = new TreeSet<>(FIELDS.keySet());
        s.addAll(SECTIONS);
        s.add(FAMILY_SECTION);
        return s;
    }

    public static List<SpecDefault> defaults() {
        return DEFAULTS;
    }
}
