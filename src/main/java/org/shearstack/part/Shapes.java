package org.shearstack.part;

import java.util.ArrayList;
import java.util.List;

import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.Region;

/** 2D features shared by several parts: keyed bores, port rings, D-flats, hole circles, the nozzle channel. */
public final class Shapes {

    private Shapes() {
    }

    /** The hexagonal drive: flats face 0°, 60°, ...; corners at 30°, 90°, ... */
    public static Region hexagon(GeometryContext ctx, double acrossFlatsMm) {
        return Region.regularPolygon(ctx, 0, 0, 6, acrossFlatsMm, 30);
    }

    /** Round exhaust ports (holes, circumscribed) centred at 0°, 360/n°, ... on the port circle. */
    public static Region ports(GeometryContext ctx, int count, double circleDiameterMm, double portDiameterMm) {
        return holeCircle(ctx, count, circleDiameterMm, portDiameterMm, 0);
    }

    /** Holes (circumscribed) on a circle, the first at {@code startDeg}. */
    public static Region holeCircle(GeometryContext ctx, int count, double circleDiameterMm, double holeDiameterMm,
            double startDeg) {
        List<Region> holes = new ArrayList<>(count);
        double r = circleDiameterMm / 2;
        for (int k = 0; k < count; k++) {
            double a = startDeg + 360.0 * k / count;
            holes.add(Region.boreCircle(ctx, r * cosDeg(a), r * sinDeg(a), holeDiameterMm));
        }
        return Region.unionAll(ctx, holes);
    }

    /** Cosine of an angle in degrees, exact at multiples of 90°. */
    public static double cosDeg(double deg) {
        double m = ((deg % 360) + 360) % 360;
        if (m == 0) {
            return 1;
        } else if (m == 90 || m == 270) {
            return 0;
        } else if (m == 180) {
            return -1;
        }
        return Math.cos(Math.toRadians(deg));
    }

    /** Sine of an angle in degrees, exact at multiples of 90°. */
    public static double sinDeg(double deg) {
        return cosDeg(deg - 90);
    }

    /** Angle of the first housing bolt: half a pitch from the plenum at 0° so the inlet stays clear. */
    public static double boltStartDeg(int boltCount) {
        return 180.0 / boltCount;
    }

    /** A round shaft section with a flat at x = r − flatDepth (material). */
    public static Region dShaft(GeometryContext ctx, double diameterMm, double flatDepthMm) {
        double r = diameterMm / 2;
        return Region.disc(ctx, 0, 0, diameterMm).intersect(Region.rectangle(ctx, -r - 1, -r - 1, r - flatDepthMm, r + 1));
    }

    /** A D-shaped bore to cut: round bore with a flat at x = bore/2 − flatDepth. */
    public static Region dBore(GeometryContext ctx, double boreMm, double flatDepthMm) {
        double r = boreMm / 2 / Math.cos(Math.PI / ctx.segmentCount(boreMm / 2)) + 0.5;
        return Region.boreCircle(ctx, 0, 0, boreMm).intersect(Region.rectangle(ctx, -r, -r, boreMm / 2 - flatDepthMm, r));
    }

    /**
     * The nozzle channel in the housing's plane: a straight strip from the plenum centre (plenumRadius, 0) to
     * the point E where it meets the chamber wall at {@code angleDeg} to the rotor tangent (counter-clockwise
     * rotation), inlet width at the plenum, throat width at E for a converging nozzle, or throat before E and
     * exit width at E for a converging–diverging one; continued into the chamber so the cut is clean.
     */
    public static Region nozzleChannel(GeometryContext ctx, Dims d) {
        NozzleLine n = NozzleLine.of(d);
        double[] pts;
        double ext = Math.max(1.0, d.exitWidth());
        // past the exit the cut flares at 35° a side, so the housing wall ends in a blunt corner rather than a
        // knife edge along the chamber (features under the nozzle width do not print, common practice)
        double flare = 2 * ext * Math.tan(Math.toRadians(35));
        if (d.exitWidth() > d.throatWidth() * (1 + 1e-9)) {
            double diverge = Math.max(3 * (d.exitWidth() - d.throatWidth()), 1.0);
            diverge = Math.min(diverge, 0.5 * n.lengthMm());
            pts = strip(n, new double[] {0, n.lengthMm() - diverge, n.lengthMm(), n.lengthMm() + ext},
                    new double[] {d.inletWidth(), d.throatWidth(), d.exitWidth(), d.exitWidth() + flare});
        } else {
            pts = strip(n, new double[] {0, n.lengthMm(), n.lengthMm() + ext},
                    new double[] {d.inletWidth(), d.throatWidth(), d.throatWidth() + flare});
        }
        return Region.polygon(ctx, pts);
    }

    /** The insert block around the channel: wider at the plenum so pressure wedges it in place. */
    public static Region nozzleBlock(GeometryContext ctx, Dims d, double growMm) {
        NozzleLine n = NozzleLine.of(d);
        double w0 = d.inletWidth() + 4 * d.wall() + 2 * growMm;
        double w1 = Math.max(d.exitWidth(), d.throatWidth()) + 4 * d.wall() + 2 * growMm;
        double start = -growMm;
        double end = n.lengthMm() + Math.max(2.0, w1);
        return Region.polygon(ctx, strip(n, new double[] {start, end}, new double[] {Math.max(w0, w1 + 0.5), w1}));
    }

    private static double[] strip(NozzleLine n, double[] s, double[] w) {
        double[] pts = new double[4 * s.length];
        for (int i = 0; i < s.length; i++) {
            double cx = n.px() + s[i] * n.jx();
            double cy = n.py() + s[i] * n.jy();
            pts[2 * i] = cx - w[i] / 2 * n.jy();
            pts[2 * i + 1] = cy + w[i] / 2 * n.jx();
            int back = 2 * s.length - 1 - i;
            pts[2 * back] = cx + w[i] / 2 * n.jy();
            pts[2 * back + 1] = cy - w[i] / 2 * n.jx();
        }
        return pts;
    }

    /** The jet's centre line: from the plenum centre P along unit direction j for length L to the exit E. */
    public record NozzleLine(double px, double py, double jx, double jy, double lengthMm, double exitAngleDeg) {

        public static NozzleLine of(Dims d) {
            double rc = d.chamberDiameter() / 2;
            double rp = d.plenumRadius();
            double alpha = Math.toRadians(d.nozzleAngleDeg());
            // E on the chamber circle at angle theta with cos(theta + alpha) = rc cos(alpha) / rp
            double theta = Math.acos(Math.min(1, rc * Math.cos(alpha) / rp)) - alpha;
            double ex = rc * Math.cos(theta);
            double ey = rc * Math.sin(theta);
            double len = Math.hypot(ex - rp, ey);
            return new NozzleLine(rp, 0, (ex - rp) / len, ey / len, len, Math.toDegrees(theta));
        }
    }
}
