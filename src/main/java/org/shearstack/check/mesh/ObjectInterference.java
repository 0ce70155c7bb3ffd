package org.shearstack.check.mesh;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Point;
import org.shearstack.assembly.Interference;
import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.geom.Bounds2;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;
import org.shearstack.geom.Slab;

/**
 * Interference between placed objects, on their layered representations in one frame: two objects overlap where
 * slabs sharing a band of heights have regions overlapping in area. Pairs whose boxes (heights and plan bounds) do
 * not meet are pruned, and within a pair so is every band whose two regions' boxes do not meet; only the rest
 * are intersected. The overlap volume is the sum of overlap area × band height. Faces that only touch (a box
 * standing on another, two boxes side by side) overlap in no area and pass.
 */
public final class ObjectInterference {

    private ObjectInterference() {
    }

    /** An object's name and its layered solid, in the shared (build) frame. */
    public record Placed(String name, LayeredSolid solid) {
    }

    /**
     * MESH-INTERFERENCE findings: one FAIL per overlapping pair, or one OK saying how many pairs were compared when
     * none overlap (nothing for fewer than two objects).
     */
    public static List<Finding> check(List<Placed> objects) {
        List<Finding> out = new ArrayList<>();
        if (objects.size() < 2) {
            return out;
        }
        List<Box> boxes = objects.stream().map(p -> Box.of(p.solid())).toList();
        int compared = 0;
        int pruned = 0;
        for (int i = 0; i < objects.size(); i++) {
            for (int j = i + 1; j < objects.size(); j++) {
                if (!boxes.get(i).meets(boxes.get(j))) {
                    pruned++;
                    continue;
                }
                compared++;
                Overlap o = overlap(objects.get(i).solid(), objects.get(j).solid());
                if (o.volumeMm3 > 0) {
                    String a = objects.get(i).name();
                    String b = objects.get(j).name();
                    out.add(Findings.at("MESH-INTERFERENCE", Severity.FAIL, a + " and " + b + " overlap: about "
                            + Findings.num(o.volumeMm3, 4) + " mm³ of shared material between z "
                            + Findings.num(o.z0Mm, 5) + " and " + Findings.num(o.z1Mm, 5) + " mm (largest overlap "
                            + Findings.num(o.worstAreaMm2, 4) + " mm² of section).",
                            o.volumeMm3, 0, "mm3", Double.NaN, a, "overlaps " + b,
                            "move one of the two objects apart, or shrink one where they meet",
                            o.xMm, o.yMm, o.worstZMm));
                }
            }
        }
        if (out.isEmpty()) {
            out.add(Findings.of("MESH-INTERFERENCE", Severity.OK, objects.size() + " objects placed by the build: no two"
                    + " overlap (" + compared + " pairs intersected layer by layer, " + pruned
                    + " pairs apart by their bounding boxes).", 0, 0, "mm3", Double.NaN, "", "assembly", ""));
        }
        return out;
    }

    private static Overlap overlap(LayeredSolid a, LayeredSolid b) {
        List<Slab> sa = a.slabs();
        List<Slab> sb = b.slabs();
        Overlap o = new Overlap();
        int i = 0;
        int j = 0;
        while (i < sa.size() && j < sb.size()) {
            Slab x = sa.get(i);
            Slab y = sb.get(j);
            double z0 = Math.max(x.z0Mm(), y.z0Mm());
            double z1 = Math.min(x.z1Mm(), y.z1Mm());
            if (z1 - z0 > Interference.Z_TOLERANCE_MM && boundsMeet(x.region().bounds(), y.region().bounds())) {
                Region common = x.region().intersect(y.region());
                double area = common.areaMm2();
                if (area > Interference.AREA_TOLERANCE_MM2) {
                    o.add(area, z0, z1, common.geometry());
                }
            }
            if (x.z1Mm() <= y.z1Mm()) {
                i++;
            } else {
                j++;
            }
        }
        return o;
    }

    private static boolean boundsMeet(Bounds2 p, Bounds2 q) {
        return p.minXMm() < q.maxXMm() && q.minXMm() < p.maxXMm() && p.minYMm() < q.maxYMm() && q.minYMm() < p.maxYMm();
    }

    /** The accumulated overlap of one pair. */
    private static final class Overlap {
        double volumeMm3;
        double z0Mm = Double.POSITIVE_INFINITY;
        double z1Mm = Double.NEGATIVE_INFINITY;
        double worstAreaMm2;
        double worstZMm;
        double xMm;
        double yMm;

        void add(double areaMm2, double z0, double z1, Geometry common) {
            volumeMm3 += areaMm2 * (z1 - z0);
            z0Mm = Math.min(z0Mm, z0);
            z1Mm = Math.max(z1Mm, z1);
            if (areaMm2 > worstAreaMm2) {
                worstAreaMm2 = areaMm2;
                worstZMm = z0;
                Point p = common.getInteriorPoint();
                xMm = p.getX();
                yMm = p.getY();
            }
        }
    }

    /** Heights and plan bounds of a solid. */
    private record Box(double minX, double minY, double maxX, double maxY, double minZ, double maxZ) {
        static Box of(LayeredSolid s) {
            double minX = Double.POSITIVE_INFINITY;
            double minY = Double.POSITIVE_INFINITY;
            double maxX = Double.NEGATIVE_INFINITY;
            double maxY = Double.NEGATIVE_INFINITY;
            for (Slab slab : s.slabs()) {
                Bounds2 b = slab.region().bounds();
                minX = Math.min(minX, b.minXMm());
                minY = Math.min(minY, b.minYMm());
                maxX = Math.max(maxX, b.maxXMm());
                maxY = Math.max(maxY, b.maxYMm());
            }
            return s.isEmpty() ? new Box(0, 0, 0, 0, 0, 0)
                    : new Box(minX, minY, maxX, maxY, s.minZMm(), s.maxZMm());
        }

        boolean meets(Box o) {
            return !(maxX <= o.minX || o.maxX <= minX || maxY <= o.minY || o.maxY <= minY
                    || maxZ - o.minZ <= Interference.Z_TOLERANCE_MM || o.maxZ - minZ <= Interference.Z_TOLERANCE_MM);
        }
    }
}
