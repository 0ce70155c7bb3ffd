package org.shearstack.check.print;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.algorithm.construct.LargestEmptyCircle;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Point;
import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;
import org.shearstack.geom.Slab;

/**
 * Printability of one part in its print orientation, on its layered representation (DESIGN.md §2):
 * <ul>
 *   <li>WALL-THIN (caution): material a disc of two line widths cannot reach (morphological opening);</li>
 *   <li>PRINT-FEATURE-SMALL (fail): a whole connected feature narrower than the nozzle (a thin tip or edge of a
 *       larger body is only a WALL-THIN caution: the slicer drops it, the part still prints);</li>
 *   <li>GAP-NARROW (caution): openings a disc of the printer's minimum gap closes (morphological closing);</li>
 *   <li>OVERHANG (caution): area of a slab beyond what the slab below carries (one layer's step at the
 *       overhang limit plus half a line width), touching its support on one side;</li>
 *   <li>BRIDGE-LONG (caution): unsupported area held on two or more sides, wider than the bridge limit;</li>
 *   <li>PRINT-FLOATING (fail): unsupported area touching no support at all;</li>
 *   <li>FIRST-LAYER-SMALL (caution): bed contact below the limit or below a fifth of the largest section.</li>
 * </ul>
 * Widths of thin pieces are 2 × area / perimeter; overhang reach and bridge span come from the largest circle
 * in the unsupported piece clear of the support (JTS LargestEmptyCircle). Each finding carries the piece's
 * location (x, y at an interior point, z at the slab bottom). At most {@link #MAX_PER_CODE} findings per code, the worst first.
 */
public final class Printability {

    /** Findings kept per code and part; the last one says how many more there were. */
    public static final int MAX_PER_CODE = 5;

    private Printability() {
    }

    public static List<Finding> check(String part, LayeredSolid solid, PrintLimits limits) {
        Map<String, List<Finding>> byCode = new LinkedHashMap<>();
        List<Slab> slabs = solid.slabs();
        Region previousChecked = null;
        for (int i = 0; i < slabs.size(); i++) {
            Slab s = slabs.get(i);
            if (previousChecked == null || !s.region().equals(previousChecked)) {
                walls(part, s, limits, byCode);
                gaps(part, s, limits, byCode);
                previousChecked = s.region();
            }
            if (i > 0) {
                Slab below = slabs.get(i - 1);
                Region support = below.z1Mm() == s.z0Mm() ? below.region() : Region.empty(s.region().context());
                if (!s.region().equals(support)) {
                    overhangs(part, s, support, limits, byCode);
                }
            }
        }
        if (!slabs.isEmpty()) {
            firstLayer(part, slabs, limits, byCode);
        }
        List<Finding> out = new ArrayList<>();
        for (List<Finding> list : byCode.values()) {
            list.sort(Comparator.comparing(Finding::severity).reversed().thenComparing(Finding::margin));
            if (list.size() > MAX_PER_CODE) {
                int more = list.size() - MAX_PER_CODE;
                List<Finding> kept = new ArrayList<>(list.subList(0, MAX_PER_CODE));
                Finding last = kept.remove(MAX_PER_CODE - 1);
                kept.add(new Finding(last.code(), last.severity(), last.message() + " (and " + more + " more like it)",
                        last.measured(), last.limit(), last.unit(), last.margin(), last.part(), last.feature(),
                        last.ruleId(), last.remedy(), last.where()));
                list = kept;
            }
            out.addAll(list);
        }
        return out;
    }

    private static void walls(String part, Slab s, PrintLimits l, Map<String, List<Finding>> out) {
        double w = l.minWallMm();
        Region r = s.region();
        Region thin = r.minus(r.offset(-w / 2).offset(w / 2));
        Geometry body = thin.isEmpty() ? null : r.geometry();
        for (Piece p : pieces(thin, w)) {
            boolean whole = wholeComponent(body, p);
            if (whole && p.width < l.nozzleMm()) {
                add(out, Findings.at("PRINT-FEATURE-SMALL", Severity.FAIL,
                        "A feature " + Findings.num(p.width, 2) + " mm wide is narrower than the "
                                + Findings.num(l.nozzleMm(), 2) + " mm nozzle and will not print.",
                        p.width, l.nozzleMm(), "mm", p.width / l.nozzleMm(), part, "feature narrower than the nozzle",
                        "widen it to at least " + Findings.num(w, 2) + " mm (two line widths) or remove it",
                        p.x, p.y, s.z0Mm()));
            } else {
                String below = p.width < l.nozzleMm() ? "; narrower than the nozzle, it will print thinner or not at all"
                        : "";
                add(out, Findings.at("WALL-THIN", Severity.CAUTION,
                        "A wall " + Findings.num(p.width, 2) + " mm thick is thinner than two line widths ("
                                + Findings.num(w, 2) + " mm, common practice minimum)" + below + ".",
                        p.width, w, "mm", p.width / w, part, "thin wall",
                        "thicken it to " + Findings.num(w, 2) + " mm or more (three lines, "
                                + Findings.num(3 * l.lineWidthMm(), 2) + " mm, for load-bearing walls)",
                        p.x, p.y, s.z0Mm()));
            }
        }
    }

    /** True when the thin piece is (nearly) all of the connected part of the slab it lies in. */
    private static boolean wholeComponent(Geometry body, Piece p) {
        for (int i = 0; i < body.getNumGeometries(); i++) {
            Geometry c = body.getGeometryN(i);
            if (c.getEnvelopeInternal().intersects(p.geometry.getEnvelopeInternal()) && c.intersects(p.geometry)) {
                return p.geometry.getArea() >= 0.95 * c.getArea();
            }
        }
        return false;
    }

    private static void gaps(String part, Slab s, PrintLimits l, Map<String, List<Finding>> out) {
        double g = l.minGapMm();
        if (g <= 0) {
            return;
        }
        Region r = s.region();
        Region narrow = r.offset(g / 2).offset(-g / 2).minus(r);
        for (Piece p : pieces(narrow, g)) {
            add(out, Findings.at("GAP-NARROW", Severity.CAUTION,
                    "A gap " + Findings.num(p.width, 2) + " mm wide is narrower than the printer's minimum "
                            + Findings.num(g, 2) + " mm and may close up.",
                    p.width, g, "mm", p.width / g, part, "narrow gap", "open it to at least " + Findings.num(g, 2) + " mm",
                    p.x, p.y, s.z0Mm()));
        }
    }

    private static void overhangs(String part, Slab s, Region support, PrintLimits l, Map<String, List<Finding>> out) {
        Region carried = support.offset(l.carriedStepMm());
        Region unsupported = s.region().minus(carried);
        if (unsupported.isEmpty()) {
            return;
        }
        Geometry g = unsupported.geometry();
        Geometry carriedEdge = carried.isEmpty() ? null : carried.offset(l.lineWidthMm() / 4).geometry();
        for (int i = 0; i < g.getNumGeometries(); i++) {
            Geometry piece = g.getGeometryN(i);
            if (piece.getArea() < l.lineWidthMm() * l.lineWidthMm()) {
                continue;
            }
            Piece p = Piece.of(piece);
            Geometry touch = carriedEdge == null ? null : piece.intersection(carriedEdge);
            int contacts = touch == null || touch.isEmpty() ? 0 : touch.getNumGeometries();
            if (contacts == 0) {
                add(out, Findings.at("PRINT-FLOATING", Severity.FAIL,
                        "An area of " + Findings.num(piece.getArea(), 3) + " mm² starts in mid-air at z = "
                                + Findings.num(s.z0Mm(), 4) + " mm with nothing below it.",
                        piece.getArea(), 0, "mm2", 0, part, "unsupported island",
                        "add support, or turn the part so this face prints on the bed", p.x, p.y, s.z0Mm()));
            } else if (contacts >= 2) {
                double span = 2 * reach(piece, carried.geometry());
                if (span > l.maxBridgeMm()) {
                    add(out, Findings.at("BRIDGE-LONG", Severity.CAUTION,
                            "A bridge spans about " + Findings.num(span, 3) + " mm, beyond the "
                                    + Findings.num(l.maxBridgeMm(), 3) + " mm the printer bridges cleanly.",
                            span, l.maxBridgeMm(), "mm", l.maxBridgeMm() / span, part, "bridge",
                            "add a support pillar or rib, or shorten the span", p.x, p.y, s.z0Mm()));
                }
            } else if (p.width > l.lineWidthMm()) {
                double reach = reach(piece, carried.geometry()) + l.carriedStepMm();
                add(out, Findings.at("OVERHANG", Severity.CAUTION,
                        "An overhang reaches about " + Findings.num(reach, 3) + " mm beyond the layer below at z = "
                                + Findings.num(s.z0Mm(), 4) + " mm (limit " + Findings.num(l.maxOverhangDeg(), 2)
                                + "° from vertical).",
                        reach, l.carriedStepMm(), "mm", l.carriedStepMm() / reach, part, "overhang",
                        "chamfer it at " + Findings.num(l.maxOverhangDeg(), 2) + "° or less, or add support",
                        p.x, p.y, s.z0Mm()));
            }
        }
    }

    private static void firstLayer(String part, List<Slab> slabs, PrintLimits l, Map<String, List<Finding>> out) {
        Slab first = slabs.get(0);
        double contact = first.region().areaMm2();
        double largest = slabs.stream().mapToDouble(s -> s.region().areaMm2()).max().orElse(contact);
        boolean small = contact < l.minFirstLayerAreaMm2() || contact < 0.2 * largest;
        if (small) {
            Point c = first.region().geometry().getCentroid();
            add(out, Findings.at("FIRST-LAYER-SMALL", Severity.CAUTION,
                    "Bed contact " + Findings.num(contact, 3) + " mm² against a largest section of "
                            + Findings.num(largest, 3) + " mm²: the part may come loose or topple (engineering"
                            + " judgement: at least " + Findings.num(l.minFirstLayerAreaMm2(), 2)
                            + " mm² and a fifth of the largest section).",
                    contact, Math.max(l.minFirstLayerAreaMm2(), 0.2 * largest), "mm2",
                    contact / Math.max(l.minFirstLayerAreaMm2(), 0.2 * largest), part, "first layer",
                    "print it on its largest flat face, or add a brim", c.getX(), c.getY(), first.z0Mm()));
        }
    }

    /**
     * How far the piece reaches from the carried region: the radius of the largest circle centred in the piece
     * that stays clear of the carried region's boundary (JTS LargestEmptyCircle).
     */
    private static double reach(Geometry piece, Geometry carried) {
        LargestEmptyCircle lec = new LargestEmptyCircle(carried.getBoundary(), piece, 0.05);
        return lec.getRadiusLine().getLength();
    }

    private static void add(Map<String, List<Finding>> out, Finding f) {
        out.computeIfAbsent(f.code(), k -> new ArrayList<>()).add(f);
    }

    /** Pieces of a residue worth reporting: longer than the probe and wider than a sliver. */
    private static List<Piece> pieces(Region residue, double probeMm) {
        List<Piece> out = new ArrayList<>();
        if (residue.isEmpty()) {
            return out;
        }
        Geometry g = residue.geometry();
        for (int i = 0; i < g.getNumGeometries(); i++) {
            Geometry piece = g.getGeometryN(i);
            var env = piece.getEnvelopeInternal();
            double extent = Math.max(env.getWidth(), env.getHeight());
            // corner slivers of an opening or closing measure about (1 − π/4) r² and span about r
            if (extent < probeMm || piece.getArea() < 0.25 * probeMm * probeMm) {
                continue;
            }
            out.add(Piece.of(piece));
        }
        return out;
    }

    /**
     * A located piece and its width: 2 × area / perimeter, exact for strips and rings of constant width (the
     * residues of an opening or closing are such strips), a little low for short stubs. Located at an interior
     * point.
     */
    private record Piece(double width, double x, double y, Geometry geometry) {
        static Piece of(Geometry piece) {
            Point c = piece.getInteriorPoint();
            return new Piece(2 * piece.getArea() / piece.getLength(), c.getX(), c.getY(), piece);
        }
    }
}
