package org.shearstack.assembly;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;
import org.shearstack.geom.Slab;
import org.shearstack.part.Dims;

/**
 * Interference and running clearances on the layered representation in the assembly frame. Two bodies
 * interfere where slabs overlapping in Z have regions overlapping in area. A rotating body is swept about
 * the axis (each slab becomes the annulus between its nearest and farthest points from the axis) before it
 * is compared with a stationary one; rotating bodies are compared with each other as they are (they turn
 * together). The discs' radial clearance to the housing and their axial end play to the covers are measured
 * and compared with what the rules chose.
 */
public final class Interference {

    /** Overlap areas below this are contact, not interference (mm²; far below a printed feature). */
    public static final double AREA_TOLERANCE_MM2 = 1e-3;
    /** Heights overlapping by less than this are touching faces (mm). */
    public static final double Z_TOLERANCE_MM = 1e-6;

    private Interference() {
    }

    /** Runs the checks: findings ASM-INTERFERENCE (fail), ASM-RADIAL-CLEARANCE and ASM-END-PLAY (ok or fail). */
    public static List<Finding> check(List<Body> bodies, Dims d, GeometryContext ctx) {
        List<Body> swept = bodies.stream().map(b -> b.rotating() ? sweep(b, ctx) : b).toList();
        List<Finding> out = new ArrayList<>();
        double radial = Double.POSITIVE_INFINITY;
        double axial = Double.POSITIVE_INFINITY;
        for (int i = 0; i < bodies.size(); i++) {
            for (int j = i + 1; j < bodies.size(); j++) {
                Body a = bodies.get(i);
                Body b = bodies.get(j);
                boolean mixed = a.rotating() != b.rotating();
                Body sa = mixed ? swept.get(i) : a;
                Body sb = mixed ? swept.get(j) : b;
                double area = overlapArea(sa.solid(), sb.solid());
                if (area > AREA_TOLERANCE_MM2) {
                    out.add(Findings.of("ASM-INTERFERENCE", Severity.FAIL,
                            a.name() + " and " + b.name() + (mixed ? " (turning)" : "") + " overlap by "
                                    + Findings.num(area, 3) + " mm² of section",
                            area, 0, "mm2", Double.NaN, a.name(), b.name(), "move or shrink one of the two parts"));
                }
                if (mixed) {
                    Body rot = a.rotating() ? sa : sb;
                    Body fixed = a.rotating() ? sb : sa;
                    if (rot.family().equals("rotor")) {
                        if (fixed.family().equals("housing") || fixed.family().equals("nozzle")) {
                            radial = Math.min(radial, radialGap(rot.solid(), fixed.solid()));
                        } else if (fixed.family().equals("cover")) {
                            axial = Math.min(axial, axialGap(rot.solid(), fixed.solid()));
                        }
                    }
                }
            }
        }
        double chord = ctx.chordToleranceMm();
        out.add(clearance("ASM-RADIAL-CLEARANCE", "radial gap between the swept discs and the housing", radial,
                d.radialClearance() - 2 * chord, "disc rim"));
        out.add(clearance("ASM-END-PLAY", "axial gap between the outer discs and the covers", axial,
                d.endPlay() - Z_TOLERANCE_MM, "disc pack"));
        return List.copyOf(out);
    }

    private static Finding clearance(String code, String what, double measured, double limit, String feature) {
        boolean ok = measured >= limit;
        return Findings.of(code, ok ? Severity.OK : Severity.FAIL,
                String.format(Locale.ROOT, "%s: %.3f mm (rules chose at least %.3f mm)", what, measured, limit),
                measured, limit, "mm", measured / limit, "assembly", feature,
                ok ? "" : "rebuild the kit; a part does not sit where the layout says");
    }

    /** The solid turned about the Z axis: each slab becomes an annulus (or disc) covering its sweep. */
    static Body sweep(Body b, GeometryContext ctx) {
        List<Slab> slabs = new ArrayList<>();
        for (Slab s : b.solid().slabs()) {
            Geometry g = s.region().geometry();
            double rMax = 0;
            for (Coordinate c : g.getCoordinates()) {
                rMax = Math.max(rMax, Math.hypot(c.x, c.y));
            }
            double rMin = s.region().containsPoint(0, 0) ? 0
                    : g.distance(ctx.factory().createPoint(new Coordinate(0, 0)));
            Region r = Region.disc(ctx, 0, 0, 2 * rMax);
            if (rMin > ctx.gridMm() * 4) {
                r = r.minus(Region.disc(ctx, 0, 0, 2 * rMin));
            }
            slabs.add(new Slab(s.z0Mm(), s.z1Mm(), r));
        }
        return new Body(b.name(), b.family(), true, LayeredSolid.of(ctx, slabs));
    }

    /** Largest overlap area of two slabs that overlap in Z. */
    static double overlapArea(LayeredSolid a, LayeredSolid b) {
        if (a.maxZMm() <= b.minZMm() + Z_TOLERANCE_MM || b.maxZMm() <= a.minZMm() + Z_TOLERANCE_MM) {
            return 0;
        }
        double worst = 0;
        for (Slab sa : a.slabs()) {
            for (Slab sb : b.slabs()) {
                if (Math.min(sa.z1Mm(), sb.z1Mm()) - Math.max(sa.z0Mm(), sb.z0Mm()) > Z_TOLERANCE_MM
                        && sa.region().geometry().getEnvelopeInternal().intersects(sb.region().geometry().getEnvelopeInternal())) {
                    worst = Math.max(worst, sa.region().intersect(sb.region()).areaMm2());
                }
            }
        }
        return worst;
    }

    static double radialGap(LayeredSolid rot, LayeredSolid fixed) {
        double gap = Double.POSITIVE_INFINITY;
        for (Slab sa : rot.slabs()) {
            for (Slab sb : fixed.slabs()) {
                if (Math.min(sa.z1Mm(), sb.z1Mm()) - Math.max(sa.z0Mm(), sb.z0Mm()) > Z_TOLERANCE_MM) {
                    gap = Math.min(gap, sa.region().geometry().distance(sb.region().geometry()));
                }
            }
        }
        return gap;
    }

    static double axialGap(LayeredSolid rot, LayeredSolid fixed) {
        double gap = Double.POSITIVE_INFINITY;
        for (Slab sa : rot.slabs()) {
            for (Slab sb : fixed.slabs()) {
                if (sa.region().intersect(sb.region()).areaMm2() > AREA_TOLERANCE_MM2) {
                    double g = Math.max(sb.z0Mm() - sa.z1Mm(), sa.z0Mm() - sb.z1Mm());
                    gap = Math.min(gap, Math.max(0, g));
                }
            }
        }
        return gap;
    }
}
