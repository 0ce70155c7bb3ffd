package org.shearstack.assembly;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.Region;
import org.shearstack.part.Dims;

/**
 * Interference and running clearances on the layered representation in the assembly frame. Two bodies
 * interfere where slabs overlapping in Z have regions overlapping in area.
 *
 * <p>A turning body sweeps, about the axis, each connected piece of a slab into the annulus between the piece's
 * nearest and farthest points from the axis; and the radii a connected piece of any slab covers form one
 * interval (the continuous image of a connected set). So a turning body meets a stationary one exactly where
 * these radial intervals overlap, and the same holds for a round body (a bearing) against anything: those pairs
 * are decided on 2D radial profiles ({@link RadialProfile}) without any polygon overlay. Only pairs of
 * non-round bodies that turn together or stand still together (a disc on the hexagonal hub, the nozzle insert
 * in its pocket) need an area overlay, and only for slabs whose heights and boxes overlap; equal region pairs
 * (eight identical discs on one hub) are computed once. The discs' radial clearance to the housing and their
 * axial end play to the covers are measured and compared with what the rules chose.
 */
public final class Interference {

    /** Overlap areas below this are contact, not interference (mm²; far below a printed feature). */
    public static final double AREA_TOLERANCE_MM2 = 1e-3;
    /** Heights overlapping by less than this are touching faces (mm). */
    public static final double Z_TOLERANCE_MM = 1e-6;
    /** Radial overlaps below this are contact (mm; a few grid cells, far below a printed feature). */
    public static final double RADIAL_TOLERANCE_MM = 2e-3;

    private Interference() {
    }

    /** Runs the checks: findings ASM-INTERFERENCE (fail), ASM-RADIAL-CLEARANCE and ASM-END-PLAY (ok or fail). */
    public static List<Finding> check(List<Body> bodies, Dims d, GeometryContext ctx) {
        List<RadialProfile> profiles = bodies.stream().map(b -> RadialProfile.of(b.solid())).toList();
        Map<AreaKey, Double> areas = new HashMap<>();
        List<Finding> out = new ArrayList<>();
        double radial = Double.POSITIVE_INFINITY;
        double axial = Double.POSITIVE_INFINITY;
        for (int i = 0; i < bodies.size(); i++) {
            for (int j = i + 1; j < bodies.size(); j++) {
                Body a = bodies.get(i);
                Body b = bodies.get(j);
                RadialProfile pa = profiles.get(i);
                RadialProfile pb = profiles.get(j);
                boolean mixed = a.rotating() != b.rotating();
                if (mixed || a.round() || b.round()) {
                    double depth = pa.radialOverlapMm(pb);
                    if (depth > RADIAL_TOLERANCE_MM) {
                        out.add(Findings.of("ASM-INTERFERENCE", Severity.FAIL,
                                a.name() + " and " + b.name() + (mixed ? " (turning)" : "") + " overlap by "
                                        + Findings.num(depth, 3) + " mm radially",
                                depth, 0, "mm", Double.NaN, a.name(), b.name(), "move or shrink one of the two parts"));
                    }
                } else if (pa.overlapsInZ(pb)) {
                    double area = overlapArea(pa, pb, areas);
                    if (area > AREA_TOLERANCE_MM2) {
                        out.add(Findings.of("ASM-INTERFERENCE", Severity.FAIL,
                                a.name() + " and " + b.name() + " overlap by " + Findings.num(area, 3)
                                        + " mm² of section",
                                area, 0, "mm2", Double.NaN, a.name(), b.name(), "move or shrink one of the two parts"));
                    }
                }
                if (mixed) {
                    Body rot = a.rotating() ? a : b;
                    Body fixed = a.rotating() ? b : a;
                    RadialProfile pr = a.rotating() ? pa : pb;
                    RadialProfile pf = a.rotating() ? pb : pa;
                    if (rot.family().equals("rotor")) {
                        if (fixed.family().equals("housing") || fixed.family().equals("nozzle")) {
                            radial = Math.min(radial, pr.radialGapMm(pf));
                        } else if (fixed.family().equals("cover")) {
                            axial = Math.min(axial, pr.axialGapMm(pf));
                        }
                    }
                }
            }
        }
        double chord = ctx.chordToleranceMm();
        out.add(clearance("ASM-RADIAL-CLEARANCE", "radial gap between the swept discs and the housing", radial,
                d.radialClearance() - 2 * chord, "disc rim"));
        // heights are snapped to the grid, so a measured gap may fall short of the rule's value by one grid step
        out.add(clearance("ASM-END-PLAY", "axial gap between the outer discs and the covers", axial,
                d.endPlay() - ctx.gridMm(), "disc pack"));
        return List.copyOf(out);
    }

    private static Finding clearance(String code, String what, double measured, double limit, String feature) {
        boolean ok = measured >= limit;
        return Findings.of(code, ok ? Severity.OK : Severity.FAIL,
                String.format(Locale.ROOT, "%s: %.3f mm (rules chose at least %.3f mm)", what, measured, limit),
                measured, limit, "mm", measured / limit, "assembly", feature,
                ok ? "" : "rebuild the kit; a part does not sit where the layout says");
    }

    /** Two regions by identity: placed copies of one part share their region objects. */
    private record AreaKey(Region a, Region b) {
        @Override
        public boolean equals(Object o) {
            return o instanceof AreaKey k && k.a == a && k.b == b;
        }

        @Override
        public int hashCode() {
            return System.identityHashCode(a) * 31 + System.identityHashCode(b);
        }
    }

    /** Largest overlap area of two slabs that overlap in Z and in their boxes. */
    private static double overlapArea(RadialProfile a, RadialProfile b, Map<AreaKey, Double> cache) {
        double worst = 0;
        for (RadialProfile.Band sa : a.bands()) {
            for (RadialProfile.Band sb : b.bands()) {
                if (sa.overlapsInZ(sb) && sa.boxOverlaps(sb)) {
                    double area = cache.computeIfAbsent(new AreaKey(sa.region(), sb.region()),
                            k -> k.a().intersect(k.b()).areaMm2());
                    worst = Math.max(worst, area);
                }
            }
        }
        return worst;
    }
}
