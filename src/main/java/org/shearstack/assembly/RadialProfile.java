package org.shearstack.assembly;

import java.util.ArrayList;
import java.util.List;

import org.locationtech.jts.algorithm.Distance;
import org.locationtech.jts.algorithm.PointLocation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;
import org.shearstack.geom.Slab;

/**
 * A placed solid seen from the axis: per slab its heights, box, region and, for every connected piece of the
 * region, the interval of radii the piece covers: from its nearest point to the axis (0 when it surrounds the
 * axis) to its farthest vertex. A turning piece sweeps exactly the annulus of that interval.
 *
 * @param bands the slabs, bottom to top
 */
record RadialProfile(List<Band> bands) {

    /** One slab: heights, region, box and radial intervals {r0, r1, r0, r1, ...} of its pieces (mm). */
    record Band(double z0Mm, double z1Mm, Region region, Envelope box, double[] radii) {

        boolean overlapsInZ(Band o) {
            return Math.min(z1Mm, o.z1Mm) - Math.max(z0Mm, o.z0Mm) > Interference.Z_TOLERANCE_MM;
        }

        boolean boxOverlaps(Band o) {
            return box.intersects(o.box);
        }

        /** Largest depth by which a radial interval of this band overlaps one of the other's (≤ 0: apart). */
        double radialOverlapMm(Band o) {
            double worst = Double.NEGATIVE_INFINITY;
            for (int i = 0; i < radii.length; i += 2) {
                for (int k = 0; k < o.radii.length; k += 2) {
                    worst = Math.max(worst, Math.min(radii[i + 1], o.radii[k + 1]) - Math.max(radii[i], o.radii[k]));
                }
            }
            return worst;
        }
    }

    static RadialProfile of(LayeredSolid solid) {
        List<Band> bands = new ArrayList<>();
        for (Slab s : solid.slabs()) {
            Geometry g = s.region().geometry();
            double[] radii = new double[2 * g.getNumGeometries()];
            for (int p = 0; p < g.getNumGeometries(); p++) {
                Polygon poly = (Polygon) g.getGeometryN(p);
                radii[2 * p] = nearest(poly);
                radii[2 * p + 1] = farthest(poly.getExteriorRing());
            }
            bands.add(new Band(s.z0Mm(), s.z1Mm(), s.region(), g.getEnvelopeInternal(), radii));
        }
        return new RadialProfile(List.copyOf(bands));
    }

    boolean overlapsInZ(RadialProfile o) {
        return !bands.isEmpty() && !o.bands.isEmpty()
                && Math.min(maxZ(), o.maxZ()) - Math.max(minZ(), o.minZ()) > Interference.Z_TOLERANCE_MM;
    }

    private double minZ() {
        return bands.get(0).z0Mm();
    }

    private double maxZ() {
        return bands.get(bands.size() - 1).z1Mm();
    }

    /** Largest radial overlap depth over slabs overlapping in Z (0 when nothing overlaps). */
    double radialOverlapMm(RadialProfile o) {
        if (!overlapsInZ(o)) {
            return 0;
        }
        double worst = 0;
        for (Band a : bands) {
            for (Band b : o.bands) {
                if (a.overlapsInZ(b)) {
                    worst = Math.max(worst, a.radialOverlapMm(b));
                }
            }
        }
        return worst;
    }

    /** Smallest radial gap between pieces of slabs overlapping in Z (0 where they overlap; ∞ if none face). */
    double radialGapMm(RadialProfile o) {
        double gap = Double.POSITIVE_INFINITY;
        for (Band a : bands) {
            for (Band b : o.bands) {
                if (a.overlapsInZ(b)) {
                    gap = Math.min(gap, Math.max(0, -a.radialOverlapMm(b)));
                }
            }
        }
        return gap;
    }

    /** Smallest axial gap between slabs whose radial intervals overlap (material above material). */
    double axialGapMm(RadialProfile o) {
        double gap = Double.POSITIVE_INFINITY;
        for (Band a : bands) {
            for (Band b : o.bands) {
                if (a.radialOverlapMm(b) > Interference.RADIAL_TOLERANCE_MM) {
                    double g = Math.max(b.z0Mm() - a.z1Mm(), a.z0Mm() - b.z1Mm());
                    gap = Math.min(gap, Math.max(0, g));
                }
            }
        }
        return gap;
    }

    private static double nearest(Polygon poly) {
        Coordinate o = new Coordinate(0, 0);
        Coordinate[] shell = poly.getExteriorRing().getCoordinates();
        boolean inside = PointLocation.isInRing(o, shell);
        for (int h = 0; inside && h < poly.getNumInteriorRing(); h++) {
            inside = !PointLocation.isInRing(o, poly.getInteriorRingN(h).getCoordinates());
        }
        if (inside) {
            return 0;
        }
        double d = ringDistance(o, shell);
        for (int h = 0; h < poly.getNumInteriorRing(); h++) {
            d = Math.min(d, ringDistance(o, poly.getInteriorRingN(h).getCoordinates()));
        }
        return d;
    }

    private static double ringDistance(Coordinate o, Coordinate[] ring) {
        double d = Double.POSITIVE_INFINITY;
        for (int i = 0; i + 1 < ring.length; i++) {
            d = Math.min(d, Distance.pointToSegment(o, ring[i], ring[i + 1]));
        }
        return d;
    }

    private static double farthest(LineString shell) {
        double r = 0;
        Coordinate[] cs = shell.getCoordinates();
        for (Coordinate c : cs) {
            r = Math.max(r, Math.hypot(c.x, c.y));
        }
        return r;
    }
}
