package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;

import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;
import org.shearstack.rules.geometry.FastenerCatalog.Fastener;

/**
 * GEO-FASTENERS: holes for the housing screws. Clearance holes ISO 273 medium; the anchor in the free cover is
 * a heat-set insert pilot, a hex nut pocket (ISO 4032 s max + allowance) or a tap-drill pilot (D − P).
 * Every modelled hole adds the printer's hole compensation.
 */
public final class FastenerRule extends GeoRule {

    public FastenerRule() {
        super("GEO-FASTENERS", List.of(FASTENER_SIZE, FASTENER_ANCHOR, HOLE_COMPENSATION, LAYER_HEIGHT),
                List.of(BOLT_CLEARANCE, BOLT_HEAD_DIAMETER, BOLT_ANCHOR_HOLE, BOLT_ANCHOR_DEPTH, BOLT_NUT_ACROSS_FLATS));
    }

    static Fastener fastener(RuleInputs in) {
        String size = in.has(FASTENER_SIZE) ? in.text(FASTENER_SIZE) : "M3";
        return FastenerCatalog.bySize(size).orElseThrow(() -> new IllegalArgumentException(
                "fasteners.size: expected one of " + FastenerCatalog.all().stream().map(Fastener::size)
                        .collect(Collectors.joining(", ")) + ", found '" + size + "'"));
    }

    static String anchor(RuleInputs in) {
        return in.has(FASTENER_ANCHOR) ? in.text(FASTENER_ANCHOR).trim().toLowerCase(Locale.ROOT) : "heat-set";
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        Fastener f = fastener(in);
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
                out.put(BOLT_NUT_ACROSS_FLATS, f.nutAcrossFlatsMm() + hc + 0.1,
                        "ISO 4032 s max + hole compensation + 0.1 mm", "ISO 4032 (standards.md §3.3); " + PRACTICE);
            }
            case "tapped" -> {
                out.put(BOLT_ANCHOR_HOLE, f.tapDrillMm() + hc, "tap drill D − P + hole compensation",
                        "standards.md §3.5 (75 % thread); printer profile");
                out.put(BOLT_ANCHOR_DEPTH, 0, "pilot runs through the cover", "geometry");
                out.put(BOLT_NUT_ACROSS_FLATS, 0, "no nut", "geometry");
            }
            default -> {
                out.put(BOLT_ANCHOR_HOLE, f.insertPilotMm() + hc, "heat-set insert pilot + hole compensation",
                        "vendor charts, common practice (standards.md §3.4)");
                out.put(BOLT_ANCHOR_DEPTH, Quanta.up(f.insertLengthMm() + 0.5, layer),
                        "insert length + 0.5 mm, raised to whole layers", "common practice (standards.md §3.4)");
                out.put(BOLT_NUT_ACROSS_FLATS, 0, "no nut", "geometry");
            }
        }
    }
}
