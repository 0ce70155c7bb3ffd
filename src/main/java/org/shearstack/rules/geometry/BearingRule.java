package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;

import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;
import org.shearstack.rules.geometry.BearingCatalog.Bearing;

/**
 * GEO-BEARING: the smallest journal the shaft needs and the bearing that fits it, from the ISO 15 table
 * ({@link BearingCatalog}) by journal diameter and speed factor n·d_m.
 */
public final class BearingRule extends GeoRule {

    /** n·d_m limit for shielded, grease-lubricated deep-groove ball bearings (physics.md §7, PTI: 150 000–400 000). */
    static final double SPEED_FACTOR_LIMIT = 400_000;
    /** Printed journal per disc diameter: an 80 mm rotor gets the 8 mm bore of the common 608 (common practice). */
    static final double PRINTED_JOURNAL_PER_DIAMETER = 0.1;

    public BearingRule() {
        super("GEO-BEARING", List.of(ROTOR_SHAFT, ROTOR_SHAFT_DIAMETER, ROTOR_DIAMETER, BEARINGS, TARGET_SPEED),
                List.of(SHAFT_MIN_JOURNAL, BEARING_DESIGNATION, BEARING_BORE, BEARING_OUTSIDE, BEARING_WIDTH,
                        BEARING_CHAMFER, BEARING_INNER_LAND));
    }

    static boolean isMetal(RuleInputs in) {
        return in.has(ROTOR_SHAFT) && in.text(ROTOR_SHAFT).trim().toLowerCase(Locale.ROOT).startsWith("metal");
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        boolean metal = isMetal(in);
        double minJournal;
        if (metal) {
            minJournal = in.get(ROTOR_SHAFT_DIAMETER);
            out.put(SHAFT_MIN_JOURNAL, minJournal, "the metal shaft's diameter", "spec");
        } else {
            minJournal = Math.min(25, Math.max(3, PRINTED_JOURNAL_PER_DIAMETER * in.get(ROTOR_DIAMETER)));
            out.put(SHAFT_MIN_JOURNAL, minJournal, "disc diameter / 10, between 3 and 25 mm, for a printed shaft",
                    "common practice: printed shafts need girth to stay stiff; an 80 mm rotor gets the common 608");
        }
        String asked = in.has(BEARINGS) ? in.text(BEARINGS).trim() : "auto";
        Bearing b;
        String formula;
        if (!asked.equalsIgnoreCase("auto")) {
            b = BearingCatalog.byDesignation(asked).orElseThrow(() -> new IllegalArgumentException(
                    "bearings: expected auto or one of " + BearingCatalog.all().stream().map(Bearing::designation)
                            .collect(Collectors.joining(", ")) + ", found '" + asked + "'"));
            formula = "the bearing named in the spec";
        } else {
            double rpm = in.has(TARGET_SPEED) ? in.get(TARGET_SPEED) * 60 / (2 * Math.PI) : 0;
            b = BearingCatalog.choose(minJournal, rpm, SPEED_FACTOR_LIMIT).orElseThrow(
                    () -> new IllegalArgumentException("no listed bearing has a bore of at least " + mm(minJournal)));
            formula = "smallest listed bore ≥ minimum journal; first of the series 60/62/6xx, 69, 68 whose "
                    + "n·d_m ≤ 400 000 at the target speed";
        }
        if (metal && b.boreMm() != minJournal) {
            throw new IllegalArgumentException("rotor.shaft: no listed bearing has a bore of exactly "
                    + mm(minJournal) + " for the metal shaft (nearest " + b.designation() + ", bore "
                    + mm(b.boreMm()) + ")");
        }
        String src = "ISO 15 boundary dimensions (standards.md §1: NTN CAT. 3015/E, DIN 625-1)";
        out.putText(BEARING_DESIGNATION, b.designation(), formula, src);
        out.put(BEARING_BORE, b.boreMm(), "bore d of " + b.designation(), src);
        out.put(BEARING_OUTSIDE, b.outsideMm(), "outside diameter D of " + b.designation(), src);
        out.put(BEARING_WIDTH, b.widthMm(), "width B of " + b.designation(), src);
        out.put(BEARING_CHAMFER, b.chamferMm(), "smallest ring chamfer r_s min of " + b.designation(), src);
        out.put(BEARING_INNER_LAND, b.boreMm() + (b.outsideMm() - b.boreMm()) / 3,
                "d + (D − d) / 3: the inner ring's face, where a spacer may press",
                "from memory: inner-ring shoulder about a third of the section (catalogue abutment tables)");
    }
}
