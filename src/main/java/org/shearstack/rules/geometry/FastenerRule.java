package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;

import org.shearstack.profile.Fastener;
import org.shearstack.profile.FastenerTable;
import org.shearstack.rules.InputRejectedException;
import org.shearstack.rules.Key;
import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/**
 * GEO-FASTENERS: holes for the housing screws. Clearance holes ISO 273 medium; the anchor in the free cover is
 * a heat-set insert pilot, a hex nut pocket (ISO 4032 s max + allowance) or a tap-drill pilot (D − P).
 * Every modelled hole adds the printer's hole compensation. Sizes come from the profile's fastener table.
 */
public final class FastenerRule extends GeoRule {

    /** A heat-set pocket is the insert's length + 0.5 mm (standards.md §3.4, common practice). */
    static final double INSERT_POCKET_EXTRA_MM = 0.5;

    private final FastenerTable table;

    public FastenerRule(FastenerTable table) {
        super("GEO-FASTENERS", List.of(FASTENER_SIZE, FASTENER_ANCHOR, HOLE_COMPENSATION, LAYER_HEIGHT),
                List.of(BOLT_CLEARANCE, BOLT_HEAD_DIAMETER, BOLT_ANCHOR_HOLE, BOLT_ANCHOR_DEPTH, BOLT_NUT_ACROSS_FLATS,
                        INSERT_LENGTH));
        this.table = table;
    }

    static Fastener fastener(FastenerTable table, RuleInputs in) {
        return size(table, in, FASTENER_SIZE, "M3");
    }

    /** The table's row for the size at {@code key} (case-insensitive), or bad input at that key. */
    static Fastener size(FastenerTable table, RuleInputs in, Key key, String fallback) {
        String size = in.has(key) ? in.text(key).trim() : fallback;
        return table.sizes().stream().filter(f -> f.size().equalsIgnoreCase(size)).findFirst()
                .orElseThrow(() -> new InputRejectedException(key, "one of " + table.sizes().stream()
                        .map(Fastener::size).collect(Collectors.joining(", ")), "'" + size + "'"));
    }

    /** The longest standard length of the table not above {@code maxMm}, else the shortest. */
    static double standardLengthAtMost(FastenerTable table, double maxMm) {
        return table.lengthsMm().stream().filter(l -> l <= maxMm + 1e-9).max(Double::compare)
                .orElse(table.lengthsMm().stream().min(Double::compare).orElseThrow());
    }

    static String anchor(RuleInputs in) {
        return in.has(FASTENER_ANCHOR) ? in.text(FASTENER_ANCHOR).trim().toLowerCase(Locale.ROOT) : "heat-set";
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        Fastener f = fastener(table, in);
        double hc = in.get(HOLE_COMPENSATION);
        double layer = in.get(LAYER_HEIGHT);
        out.put(BOLT_CLEARANCE, f.clearanceMediumMm() + hc, "ISO 273 medium clearance for " + f.size()
                + " + hole compensation", "ISO 273 (standards.md §3.1); printer profile");
        out.put(BOLT_HEAD_DIAMETER, f.headDiameterMm(), "ISO 4762 dk max (knurled) of " + f.size(),
                "ISO 4762 (standards.md §3.2)");
        switch (anchor(in)) {
            case "nut" -> {
                out.put(BOLT_ANCHOR_HOLE, f.clearanceMediumMm() + hc, "clearance hole above the nut pocket",
                        "ISO 273");
                out.put(BOLT_ANCHOR_DEPTH, Quanta.up(f.nutThicknessMm() + 0.2, layer),
                        "ISO 4032 m max + 0.2 mm, raised to whole layers", "ISO 4032 (standards.md §3.3); " + PRACTICE);
                out.put(INSERT_LENGTH, 0, "no insert", "geometry");
                out.put(BOLT_NUT_ACROSS_FLATS, f.nutFlatsMm() + hc + 0.1,
                        "ISO 4032 s max + hole compensation + 0.1 mm", "ISO 4032 (standards.md §3.3); " + PRACTICE);
            }
            case "tapped" -> {
                out.put(BOLT_ANCHOR_HOLE, f.tapDrillMm() + hc, "tap drill D − P + hole compensation",
                        "standards.md §3.5 (75 % thread); printer profile");
                out.put(BOLT_ANCHOR_DEPTH, 0, "pilot runs through the cover", "geometry");
                out.put(BOLT_NUT_ACROSS_FLATS, 0, "no nut", "geometry");
                out.put(INSERT_LENGTH, 0, "no insert", "geometry");
            }
            default -> {
                out.put(BOLT_ANCHOR_HOLE, f.insertPilotMm() + hc, "heat-set insert pilot + hole compensation",
                        "vendor charts, common practice (standards.md §3.4)");
                out.put(BOLT_ANCHOR_DEPTH, Quanta.up(f.insertDepthMm(), layer),
                        "insert pocket depth (insert length + 0.5 mm), raised to whole layers",
                        "common practice (standards.md §3.4), fastener table");
                out.put(BOLT_NUT_ACROSS_FLATS, 0, "no nut", "geometry");
                out.put(INSERT_LENGTH, f.insertDepthMm() - INSERT_POCKET_EXTRA_MM, "pocket depth − 0.5 mm",
                        "common practice (standards.md §3.4)");
            }
        }
    }
}
