package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

import org.shearstack.profile.Bearing;
import org.shearstack.profile.BearingTable;
import org.shearstack.rules.InputRejectedException;
import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/**
 * GEO-BEARING: the smallest journal the shaft needs and the bearing that fits it, from the profile's bearing
 * table (ISO 15) by journal diameter and speed factor n·d_m (the table's limit). Among bearings of one bore the
 * dimension series are preferred in the order 0, 2, 9, 8 (608 before 628, 698, 688): the common, sturdier
 * series first, the thin-section ones when speed asks for them.
 */
public final class BearingRule extends GeoRule {

    /** Printed journal per disc diameter: an 80 mm rotor gets the 8 mm bore of the common 608 (common practice). */
    static final double PRINTED_JOURNAL_PER_DIAMETER = 0.1;
    /** Dimension series in order of preference (the digit after the leading 6 of the designation). */
    static final String SERIES_PREFERENCE = "0298";

    private final BearingTable table;

    public BearingRule(BearingTable table) {
        super("GEO-BEARING", List.of(ROTOR_SHAFT, ROTOR_SHAFT_DIAMETER, ROTOR_DIAMETER, BEARINGS, TARGET_SPEED),
                List.of(SHAFT_MIN_JOURNAL, BEARING_DESIGNATION, BEARING_BORE, BEARING_OUTSIDE, BEARING_WIDTH,
                        BEARING_CHAMFER, BEARING_INNER_LAND));
        this.table = table;
    }

    static boolean isMetal(RuleInputs in) {
        return in.has(ROTOR_SHAFT) && in.text(ROTOR_SHAFT).trim().toLowerCase(Locale.ROOT).startsWith("metal");
    }

    /** Rank of a designation's dimension series in {@link #SERIES_PREFERENCE} (unknown series last). */
    static int seriesRank(String designation) {
        int i = designation.length() > 1 ? SERIES_PREFERENCE.indexOf(designation.charAt(1)) : -1;
        return i < 0 ? SERIES_PREFERENCE.length() : i;
    }

    /**
     * The preferred bearing for a journal of at least {@code minBoreMm}: the smallest listed bore that is
     * large enough, and among those the first by series preference whose n·d_m stays within the table's limit
     * at {@code speedRpm} (or the one with the smallest d_m when none does; a check rule then reports it).
     * {@code speedRpm} ≤ 0 means the speed is unknown.
     */
    static Optional<Bearing> choose(BearingTable table, double minBoreMm, double speedRpm) {
        Optional<Double> bore = table.bearings().stream().map(Bearing::boreMm).filter(d -> d >= minBoreMm - 1e-9)
                .min(Double::compare);
        if (bore.isEmpty()) {
            return Optional.empty();
        }
        List<Bearing> same = table.bearings().stream().filter(b -> b.boreMm() == bore.get())
                .sorted(Comparator.comparingInt((Bearing b) -> seriesRank(b.designation()))
                        .thenComparing(Bearing::designation))
                .toList();
        if (speedRpm <= 0) {
            return Optional.of(same.get(0));
        }
        double limit = table.speedFactorLimitRpmMm();
        return same.stream().filter(b -> speedRpm * b.meanDiameterMm() <= limit).findFirst()
                .or(() -> same.stream().min(Comparator.comparingDouble(Bearing::meanDiameterMm)));
    }

    /** The listed bearing with this designation (case-insensitive; a 2RS/ZZ suffix is ignored). */
    static Optional<Bearing> byDesignation(BearingTable table, String designation) {
        String base = designation.trim().toUpperCase(Locale.ROOT).replaceAll("(-?2RS|-?2Z|-?ZZ|-?RS|-?Z)$", "");
        return table.find(base);
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
        String known = table.bearings().stream().map(Bearing::designation).collect(Collectors.joining(", "));
        Bearing b;
        String formula;
        if (!asked.equalsIgnoreCase("auto")) {
            b = byDesignation(table, asked).orElseThrow(() -> new InputRejectedException(BEARINGS,
                    "auto or one of " + known, "'" + asked + "'"));
            formula = "the bearing named in the spec";
        } else {
            double rpm = in.has(TARGET_SPEED) ? in.get(TARGET_SPEED) * 60 / (2 * Math.PI) : 0;
            b = choose(table, minJournal, rpm).orElseThrow(() -> new InputRejectedException(
                    metal ? ROTOR_SHAFT_DIAMETER : ROTOR_DIAMETER,
                    "a size whose journal fits a listed bearing (largest bore "
                            + mm(table.bearings().stream().mapToDouble(Bearing::boreMm).max().orElse(0)) + ")",
                    "a journal of at least " + mm(minJournal)));
            formula = "smallest listed bore ≥ minimum journal; first of the series 60/62/6xx, 69, 68 whose "
                    + "n·d_m ≤ " + String.format(Locale.ROOT, "%.0f", table.speedFactorLimitRpmMm())
                    + " rpm·mm at the target speed";
        }
        if (metal && b.boreMm() != minJournal) {
            throw new InputRejectedException(ROTOR_SHAFT_DIAMETER,
                    "a shaft diameter equal to the bore of a listed bearing (" + known + ")",
                    mm(minJournal) + " (nearest bearing " + b.designation() + ", bore " + mm(b.boreMm()) + ")");
        }
        String src = table.standard() + " (" + table.source() + ")";
        out.putText(BEARING_DESIGNATION, b.designation(), formula, src);
        out.put(BEARING_BORE, b.boreMm(), "bore d of " + b.designation(), src);
        out.put(BEARING_OUTSIDE, b.outerMm(), "outside diameter D of " + b.designation(), src);
        boolean shieldedWider = !Double.isNaN(b.widthShieldedMm());
        out.put(BEARING_WIDTH, shieldedWider ? b.widthShieldedMm() : b.widthMm(),
                (shieldedWider ? "width of the shielded " : "width B of ") + b.designation()
                        + " (shielded bearings keep the grease in and the printing dust out)", src);
        out.put(BEARING_CHAMFER, b.chamferMinMm(), "smallest ring chamfer r_s min of " + b.designation(), src);
        out.put(BEARING_INNER_LAND, b.boreMm() + (b.outerMm() - b.boreMm()) / 3,
                "d + (D − d) / 3: the inner ring's face, where a spacer may press",
                "from memory: inner-ring shoulder about a third of the section (catalogue abutment tables)");
    }
}
