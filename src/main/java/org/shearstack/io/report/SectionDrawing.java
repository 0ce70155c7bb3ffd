package org.shearstack.io.report;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.shearstack.geom.Bounds2;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;
import org.shearstack.geom.Ring;
import org.shearstack.geom.Slab;

/**
 * Drawings of one part from its layered solid, as inline SVG: a plan view (the outline of the lowest slab seen
 * from above, holes included) and a section through the axis in the XZ plane (each slab cut along y = 0), with
 * the overall width and height dimensioned. Thin parts get a stated vertical exaggeration so their section
 * stays readable.
 */
public final class SectionDrawing {

    static final double PLAN_PX = 150;
    static final double SECTION_WIDTH_PX = 270;
    static final double MIN_SECTION_HEIGHT_PX = 36;
    static final double MAX_SECTION_HEIGHT_PX = 200;
    static final double PAD = 22;

    private SectionDrawing() {
    }

    /** One rectangle of the section: x from x0 to x1 (mm) between z0 and z1 (mm). */
    public record Cell(double x0Mm, double x1Mm, double z0Mm, double z1Mm) {
    }

    /**
     * Where the section is cut: through the axis (y = 0) when the part spans it, else through the middle of its
     * footprint (parts that do not sit on the axis, such as a nozzle block).
     */
    public static double cutYMm(LayeredSolid solid) {
        Bounds2 b = bounds(solid);
        return b.minYMm() <= 0 && b.maxYMm() >= 0 ? 0 : (b.minYMm() + b.maxYMm()) / 2;
    }

    /** The section: for each slab, the x intervals of its region on the line y = {@link #cutYMm}. */
    public static List<Cell> section(LayeredSolid solid) {
        double cutY = cutYMm(solid);
        List<Cell> cells = new ArrayList<>();
        for (Slab slab : solid.slabs()) {
            Region r = slab.region();
            if (r.isEmpty()) {
                continue;
            }
            Bounds2 b = r.bounds();
            Geometry g = r.geometry();
            LineString cut = g.getFactory().createLineString(new Coordinate[] {
                new Coordinate(b.minXMm() - 1, cutY), new Coordinate(b.maxXMm() + 1, cutY)});
            Geometry inter = g.intersection(cut);
            for (int i = 0; i < inter.getNumGeometries(); i++) {
                Geometry part = inter.getGeometryN(i);
                if (part instanceof LineString ls && ls.getLength() > 0) {
                    double x0 = Math.min(ls.getStartPoint().getX(), ls.getEndPoint().getX());
                    double x1 = Math.max(ls.getStartPoint().getX(), ls.getEndPoint().getX());
                    cells.add(new Cell(x0, x1, slab.z0Mm(), slab.z1Mm()));
                }
            }
        }
        cells.sort((p, q) -> p.z0Mm() != q.z0Mm() ? Double.compare(p.z0Mm(), q.z0Mm())
                : Double.compare(p.x0Mm(), q.x0Mm()));
        return List.copyOf(cells);
    }

    /** Plan view and section side by side, as one SVG element. */
    public static String svg(String partName, LayeredSolid solid) {
        if (solid.isEmpty()) {
            return "";
        }
        Bounds2 all = bounds(solid);
        double widthMm = Math.max(all.widthMm(), all.heightMm());
        double planScale = PLAN_PX / widthMm;
        double sx = SECTION_WIDTH_PX / all.widthMm();
        double heightMm = solid.maxZMm() - solid.minZMm();
        double sz = sx;
        double exaggeration = 1;
        if (heightMm * sz < MIN_SECTION_HEIGHT_PX) {
            exaggeration = Math.ceil(MIN_SECTION_HEIGHT_PX / (heightMm * sz));
            sz *= exaggeration;
        } else if (heightMm * sz > MAX_SECTION_HEIGHT_PX) {
            sx = sz = MAX_SECTION_HEIGHT_PX / heightMm;
        }
        double secW = all.widthMm() * sx;
        double secH = heightMm * sz;
        double planH = all.heightMm() * planScale;
        double w = PAD + PLAN_PX + 2 * PAD + secW + PAD + 60;
        double h = Math.max(planH, secH) + 2 * PAD + 34;
        StringBuilder b = new StringBuilder(4096);
        b.append("<svg class=\"drawing\" width=\"").append(px(w))
                .append("\" height=\"").append(px(h)).append("\" viewBox=\"0 0 ").append(px(w)).append(' ')
                .append(px(h)).append("\" role=\"img\" aria-label=\"").append(Xml.esc(partName))
                .append(": plan and section\">\n");
        // plan view: y up in the drawing
        double planX0 = PAD;
        double planY0 = PAD + 14;
        b.append("<text class=\"dlabel\" x=\"").append(px(planX0)).append("\" y=\"").append(px(PAD))
                .append("\">plan (from above)</text>\n");
        Slab base = solid.slabs().get(0);
        b.append("<path class=\"plan\" fill-rule=\"evenodd\" d=\"");
        for (Ring ring : base.region().rings()) {
            for (int i = 0; i < ring.size(); i++) {
                double x = planX0 + (ring.xMm(i) - all.minXMm()) * planScale;
                double y = planY0 + (all.maxYMm() - ring.yMm(i)) * planScale;
                b.append(i == 0 ? 'M' : 'L').append(px(x)).append(' ').append(px(y)).append(' ');
            }
            b.append("Z ");
        }
        b.append("\"/>\n");
        double cutYMm = cutYMm(solid);
        double cutY = planY0 + (all.maxYMm() - cutYMm) * planScale;
        b.append("<line class=\"cutline\" x1=\"").append(px(planX0 - 6)).append("\" y1=\"").append(px(cutY))
                .append("\" x2=\"").append(px(planX0 + all.widthMm() * planScale + 6)).append("\" y2=\"")
                .append(px(cutY)).append("\"/>\n");
        // section
        double secX0 = PAD + PLAN_PX + 2 * PAD;
        double secBottom = planY0 + secH;
        b.append("<text class=\"dlabel\" x=\"").append(px(secX0)).append("\" y=\"").append(px(PAD))
                .append("\">section A-A (y = ").append(Num.fixed(cutYMm, 1)).append(" mm)").append(exaggeration > 1
                        ? ", height drawn " + Num.fixed(exaggeration, 0) + "x" : "").append("</text>\n");
        for (Cell c : section(solid)) {
            double x = secX0 + (c.x0Mm() - all.minXMm()) * sx;
            double y = secBottom - (c.z1Mm() - solid.minZMm()) * sz;
            b.append("<rect class=\"cut\" x=\"").append(px(x)).append("\" y=\"").append(px(y)).append("\" width=\"")
                    .append(px((c.x1Mm() - c.x0Mm()) * sx)).append("\" height=\"")
                    .append(px((c.z1Mm() - c.z0Mm()) * sz)).append("\"/>\n");
        }
        // dimensions: overall width below, overall height at the right
        double dimY = secBottom + 16;
        b.append(dimLine(secX0, dimY, secX0 + secW, dimY)).append("<text class=\"dim\" x=\"")
                .append(px(secX0 + secW / 2)).append("\" y=\"").append(px(dimY + 13))
                .append("\" text-anchor=\"middle\">").append(Num.fixed(all.widthMm(), 2)).append(" mm</text>\n");
        double dimX = secX0 + secW + 12;
        b.append(dimLine(dimX, secBottom, dimX, secBottom - secH)).append("<text class=\"dim\" x=\"")
                .append(px(dimX + 5)).append("\" y=\"").append(px(secBottom - secH / 2 + 4)).append("\">")
                .append(Num.fixed(heightMm, 2)).append(" mm</text>\n");
        b.append("</svg>");
        return b.toString();
    }

    private static String dimLine(double x0, double y0, double x1, double y1) {
        return "<line class=\"dimline\" x1=\"" + px(x0) + "\" y1=\"" + px(y0) + "\" x2=\"" + px(x1) + "\" y2=\"" + px(y1)
                + "\"/>";
    }

    private static Bounds2 bounds(LayeredSolid solid) {
        double minX = Double.POSITIVE_INFINITY;
        double minY = Double.POSITIVE_INFINITY;
        double maxX = Double.NEGATIVE_INFINITY;
        double maxY = Double.NEGATIVE_INFINITY;
        for (Slab s : solid.slabs()) {
            if (s.region().isEmpty()) {
                continue;
            }
            Bounds2 b = s.region().bounds();
            minX = Math.min(minX, b.minXMm());
            minY = Math.min(minY, b.minYMm());
            maxX = Math.max(maxX, b.maxXMm());
            maxY = Math.max(maxY, b.maxYMm());
        }
        return new Bounds2(minX, minY, maxX, maxY);
    }

    private static String px(double v) {
        return Num.fixed(v, 1);
    }
}
