package org.shearstack.part;

import java.util.ArrayList;
import java.util.List;

import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;
import org.shearstack.geom.Slab;

/**
 * The generator bracket, printed flange down: a flange ring on the housing screws joined by spokes to a
 * windowed stand-off tube around the coupling, a plate with the motor's centre hole and face-screw holes,
 * and a cup that holds the cylindrical motor body coaxially. The flange stays outside the drive cover's
 * exhaust openings.
 *
 * <p>Printed without supports (the 45° overhang rule and bridges shorter than the printer's limit, common
 * practice for FFF printing, standards.md §7): below the plate the tube flares out to the plate's rim and
 * closes in towards the centre hole, both at 45°, one layer height per layer; the motor screws enter from
 * the coupling side with countersunk heads in 45° seats cut into that cone (each seat opens into the bore, so
 * no sliver of cone is left), and the windows in the tube are short enough to bridge.
 */
public final class GeneratorBracket {

    static final int SPOKES = 4;
    /** Longest window arc, below the common 10 mm bridge limit (standards.md §7, common practice). */
    static final double WINDOW_ARC_MM = 8;
    static final int WINDOWS = 3;

    private GeneratorBracket() {
    }

    public static double tubeInner(Dims d) {
        return d.couplingDiameter() + 2.0;
    }

    public static double tubeOuter(Dims d) {
        return tubeInner(d) + 2 * d.bracketWall();
    }

    public static double flangeInner(Dims d) {
        return Math.max(d.coverExhaustOuter() + 2.0, tubeOuter(d) + 2.0);
    }

    /** Radius of the plate's rim. */
    static double plateRadius(Dims d) {
        return Math.max(d.bracketSeat() + 2 * d.bracketWall(), tubeOuter(d)) / 2;
    }

    /** Radius where the 45° cone under the plate meets it: one layer beyond the centre hole. */
    static double coneEnd(Dims d) {
        return d.bracketCentreHole() / 2 + d.layerHeight();
    }

    /** Depth below the plate of the countersunk heads' top faces. */
    static double headTop(Dims d) {
        return Math.max(d.motorSpacing() / 2 + d.bracketCountersink() / 2 - coneEnd(d),
                (d.bracketCountersink() - d.bracketScrewHole()) / 2 + d.layerHeight());
    }

    /** Height of the bottom of the cone under the plate. */
    static double coneBottom(Dims d) {
        double bands = Math.ceil(Math.max(plateRadius(d) - tubeOuter(d) / 2, tubeInner(d) / 2 - coneEnd(d))
                / d.layerHeight() - 1e-9);
        return d.bracketStandoff() - bands * d.layerHeight();
    }

    /** Whether the tube below the cone is tall enough for windows (at least 2 mm of them). */
    static boolean hasWindows(Dims d) {
        return coneBottom(d) - 1.0 - (d.bracketPlate() + 1.0) >= 2.0;
    }

    /**
     * The genus of the bracket: spaces between the spokes, the bore along the axis, the two motor-screw holes
     * (they open into the tube), the housing-screw holes, and the windows when there are any.
     */
    public static int genus(Dims d) {
        return SPOKES + 1 + 2 + d.boltCount() + (hasWindows(d) ? WINDOWS : 0);
    }

    public static LayeredSolid solid(Dims d, GeometryContext ctx) {
        double plate = d.bracketPlate();
        double standoff = d.bracketStandoff();
        double layer = d.layerHeight();
        double rti = tubeInner(d) / 2;
        double rto = tubeOuter(d) / 2;
        double rp = plateRadius(d);
        Region tube = Region.annulus(ctx, 0, 0, 2 * rto, 2 * rti);
        List<Region> spokes = new ArrayList<>();
        double spokeW = 2 * d.bracketWall() + 2.0;
        for (int k = 0; k < SPOKES; k++) {
            Region bar = Region.rectangle(ctx, rti + d.bracketWall() / 2, -spokeW / 2,
                    flangeInner(d) / 2 + d.bracketWall(), spokeW / 2);
            spokes.add(bar.rotatedDeg(45 + 90.0 * k));
        }
        Region flange = Region.annulus(ctx, 0, 0, d.housingOutside(), flangeInner(d)).union(tube)
                .union(Region.unionAll(ctx, spokes))
                .minus(Shapes.holeCircle(ctx, d.boltCount(), d.boltCircle(), d.boltClearance(),
                        Shapes.boltStartDeg(d.boltCount())));
        // the cone under the plate, bottom band first
        List<Slab> cone = new ArrayList<>();
        int bands = (int) Math.ceil(Math.max(rp - rto, rti - coneEnd(d)) / layer - 1e-9);
        double coneBottom = standoff - bands * layer;
        for (int k = bands - 1; k >= 0; k--) {
            double outer = Math.max(rto, rp - (k + 1) * layer);
            double inner = Math.min(rti, coneEnd(d) + k * layer);
            Region band = Region.annulus(ctx, 0, 0, 2 * outer, 2 * inner).minus(screwCuts(d, ctx, k * layer));
            cone.add(new Slab(standoff - (k + 1) * layer, standoff - k * layer, band));
        }
        List<Slab> slabs = new ArrayList<>();
        slabs.add(new Slab(0, plate, flange));
        double w0 = plate + 1.0;
        double w1 = coneBottom - 1.0;
        if (hasWindows(d)) {
            List<Region> windows = new ArrayList<>();
            double sweep = Math.min(60, Math.toDegrees(WINDOW_ARC_MM / rto));
            for (int k = 0; k < WINDOWS; k++) {
                windows.add(Region.arcBand(ctx, 0, 0, 2 * rti - 2, 2 * rto + 2, 360.0 * k / WINDOWS, sweep));
            }
            slabs.add(new Slab(plate, w0, tube));
            slabs.add(new Slab(w0, w1, tube.minus(Region.unionAll(ctx, windows))));
            slabs.add(new Slab(w1, coneBottom, tube));
        } else if (coneBottom > plate) {
            slabs.add(new Slab(plate, coneBottom, tube));
        }
        slabs.addAll(cone);
        Region motorPlate = Region.disc(ctx, 0, 0, 2 * rp)
                .minus(Region.boreCircle(ctx, 0, 0, d.bracketCentreHole()))
                .minus(screwCuts(d, ctx, -1));
        double cupOuter = d.bracketSeat() + 2 * d.bracketWall();
        Region cup = Region.annulus(ctx, 0, 0, cupOuter, d.bracketSeat());
        slabs.add(new Slab(standoff, standoff + plate, motorPlate));
        slabs.add(new Slab(standoff + plate, standoff + plate + d.bracketCup(), cup));
        return LayeredSolid.of(ctx, slabs);
    }

    /**
     * The motor screws' holes at depth {@code yMm} below the plate (negative: in the plate): the clearance hole,
     * widening at 45° into the countersink whose widest circle is at the heads' top face, and that circle below.
     */
    static Region screwCuts(Dims d, GeometryContext ctx, double yMm) {
        double hole = d.bracketScrewHole();
        double sink = d.bracketCountersink();
        double seatTop = headTop(d) - (sink - hole) / 2;
        double dia = yMm <= seatTop ? hole : Math.min(sink, hole + 2 * (yMm - seatTop));
        double s = d.motorSpacing() / 2;
        Region holes = Region.boreCircle(ctx, -s, 0, dia).union(Region.boreCircle(ctx, s, 0, dia));
        if (yMm < 0) {
            return holes;
        }
        // below the plate each seat opens into the bore along a slot as wide as the seat, so no sliver of cone
        // is left between seat and bore
        return holes.union(Region.rectangle(ctx, -s, -dia / 2, s, dia / 2));
    }
}
