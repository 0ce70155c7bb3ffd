package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;
import java.util.Locale;

import org.shearstack.profile.Fastener;
import org.shearstack.profile.FastenerTable;
import org.shearstack.profile.Gland;
import org.shearstack.profile.SealTable;
import org.shearstack.rules.InputRejectedException;
import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/**
 * GEO-HOUSING-LAYOUT: the radial layout of the housing ring and covers, from the axis outward: chamber,
 * wall, plenum (a vertical bore beside the chamber), wall, face O-ring groove around both, wall, bolt
 * circle, boss. Bolt count from a largest bolt pitch of 10 screw diameters (from memory: usual spacing of
 * flange bolts), at least four, even. Walls are whole line widths.
 */
public final class HousingLayoutRule extends GeoRule {

    static final double MAX_PITCH_DIAMETERS = 10;
    /** Cross-sections closer than this are the same ring (1.78 and 1.80 mm are distinct rows). */
    static final double CROSS_SECTION_MATCH_MM = 0.005;

    private final FastenerTable fasteners;
    private final SealTable seals;

    public HousingLayoutRule(FastenerTable fasteners, SealTable seals) {
        super("GEO-HOUSING-LAYOUT", BoltCount.withLoadKeys(List.of(CHAMBER_DIAMETER, PORT_FEED_DIAMETER,
                        PORT_PILOT_DIAMETER, LINE_WIDTH, SEAL, SEAL_SIZE, BOLT_CLEARANCE, BOLT_HEAD_DIAMETER,
                        BOLT_ANCHOR_HOLE, BOLT_NUT_ACROSS_FLATS, FASTENER_SIZE)),
                List.of(WALL, PLENUM_DIAMETER, PLENUM_RADIUS, SEAL_KIND, GROOVE_DEPTH, GROOVE_WIDTH,
                        GROOVE_INNER_DIAMETER, ORING_INNER_DIAMETER, CORD_LENGTH, ORING_DESIGNATION,
                        ORING_CROSS_SECTION, BOLT_CIRCLE, BOLT_COUNT, HOUSING_OUTSIDE));
        this.fasteners = fasteners;
        this.seals = seals;
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        double lw = in.get(LINE_WIDTH);
        double wall = Quanta.up(STRUCTURAL_WALL_MM, lw);
        out.put(WALL, wall, "1.2 mm raised to whole line widths", PRINT_RULES);
        double rc = in.get(CHAMBER_DIAMETER) / 2;
        double plenum = Quanta.upToMultiple(Math.max(4.0, in.get(PORT_FEED_DIAMETER)), 0.1);
        out.put(PLENUM_DIAMETER, plenum, "max(4 mm, feed hole), up to 0.1 mm", PRACTICE);
        double rp = rc + wall + plenum / 2;
        out.put(PLENUM_RADIUS, rp, "chamber radius + wall + plenum radius", "geometry");
        double sealInner = rp + plenum / 2 + wall;

        String seal = in.has(SEAL) ? in.text(SEAL).trim().toLowerCase(Locale.ROOT) : "none";
        double outerOfSeal;
        if (seal.startsWith("o-ring")) {
            double cs = in.get(SEAL_SIZE);
            Gland g = seals.find(cs, CROSS_SECTION_MATCH_MM).orElseThrow(() -> new InputRejectedException(SEAL_SIZE,
                    "an O-ring cross-section with a face gland in the seal table ("
                            + String.join(", ", seals.glands().stream()
                                    .map(x -> String.format(Locale.ROOT, "%.2f", x.crossSectionMm())).toList())
                            + " mm)", mm(cs)));
            String src = seals.standard() + " (" + seals.source() + ")";
            out.putText(SEAL_KIND, "o-ring", "face O-ring in a groove in each cover", src);
            out.put(GROOVE_DEPTH, g.depthMm(), "groove depth h for cross-section " + mm(cs), src);
            out.put(GROOVE_WIDTH, g.widthMm(), "groove width b for cross-section " + mm(cs), src);
            out.put(GROOVE_INNER_DIAMETER, 2 * sealInner, "2 × (plenum outer edge + wall)", "geometry");
            double grooveOuter = 2 * (sealInner + g.widthMm());
            double ringId = grooveOuter - 2 * cs;
            out.put(ORING_INNER_DIAMETER, ringId,
                    "groove outer diameter − 2 × cross-section: under internal pressure the ring bears on the groove OD",
                    "Canyon Components via standards.md §4.2 (0–3 % on the groove OD)");
            out.put(CORD_LENGTH, Math.PI * (ringId + cs), "π × (inner diameter + cross-section)", "geometry");
            // the ring the groove was sized for, carried to the bill of materials as chosen here
            out.put(ORING_CROSS_SECTION, g.crossSectionMm(), "cross-section of the gland row used", src);
            out.putText(ORING_DESIGNATION, String.format(Locale.ROOT, "%s × %s", num(ringId), num(g.crossSectionMm())),
                    "inner diameter × cross-section (mm)", "geometry; " + src);
            outerOfSeal = sealInner + g.widthMm();
        } else {
            String kind = seal.startsWith("gasket") ? "gasket" : "none";
            out.putText(SEAL_KIND, kind, kind.equals("gasket") ? "flat gasket land, no groove" : "no seal", "spec");
            out.put(GROOVE_DEPTH, 0, "no groove", "spec");
            out.put(GROOVE_WIDTH, 0, "no groove", "spec");
            out.put(GROOVE_INNER_DIAMETER, 0, "no groove", "spec");
            out.put(ORING_INNER_DIAMETER, 0, "no O-ring", "spec");
            out.put(CORD_LENGTH, 0, "no O-ring", "spec");
            out.put(ORING_CROSS_SECTION, 0, "no O-ring", "spec");
            out.putText(ORING_DESIGNATION, "", "no O-ring", "spec");
            outerOfSeal = sealInner - wall;
        }
        Fastener f = FastenerRule.fastener(fasteners, in);
        double holeR = Math.max(in.get(BOLT_CLEARANCE), in.get(BOLT_ANCHOR_HOLE)) / 2;
        double nutR = in.get(BOLT_NUT_ACROSS_FLATS) / Math.sqrt(3);
        double boss = Math.max(Math.max(in.get(BOLT_HEAD_DIAMETER) / 2 + lw, holeR + wall), nutR + wall);
        double rb = Quanta.upToMultiple(outerOfSeal + wall + Math.max(holeR, nutR), 0.1);
        // pressure acts out to an O-ring's groove; with a gasket or no seal, out to the bolt circle
        BoltCount bolts = BoltCount.of(in, f, rb, boss, seal.startsWith("o-ring") ? 2 * outerOfSeal : Double.NaN,
                MAX_PITCH_DIAMETERS);
        out.put(BOLT_CIRCLE, 2 * bolts.radiusMm(), bolts.circleFormula(), "geometry; " + PRINT_RULES);
        rb = bolts.radiusMm();
        out.put(BOLT_COUNT, bolts.count(), bolts.countFormula(), bolts.countSource());
        double outside = Math.max(2 * (rb + boss), 2 * (rp + in.get(PORT_PILOT_DIAMETER) / 2 + wall));
        out.put(HOUSING_OUTSIDE, Quanta.upToMultiple(outside, 0.5),
                "2 × (bolt circle radius + max(head radius + line width, hole or nut radius + wall)), up to 0.5 mm",
                "geometry; " + PRINT_RULES);
    }

    /** Up to two decimals, trailing zeros dropped ("2.62", "28.4", "30"). */
    static String num(double v) {
        String s = String.format(Locale.ROOT, "%.2f", v);
        return s.replaceAll("0+$", "").replaceAll("\\.$", "");
    }
}
