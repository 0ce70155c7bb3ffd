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
 */
public final class GeneratorBracket {

    static final int SPOKES = 4;
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

    public static LayeredSolid solid(Dims d, GeometryContext ctx) {
        double plate = d.bracketPlate();
        double standoff = d.bracketStandoff();
        double cupOuter = d.bracketSeat() + 2 * d.bracketWall();
        Region tube = Region.annulus(ctx, 0, 0, tubeOuter(d), tubeInner(d));
        List<Region> spokes = new ArrayList<>();
        double spokeW = 2 * d.bracketWall() + 2.0;
        for (int k = 0; k < SPOKES; k++) {
            Region bar = Region.rectangle(ctx, tubeInner(d) / 2 + d.bracketWall() / 2, -spokeW / 2,
                    flangeInner(d) / 2 + d.bracketWall(), spokeW / 2);
            spokes.add(bar.rotatedDeg(45 + 90.0 * k));
        }
        Region flange = Region.annulus(ctx, 0, 0, d.housingOutside(), flangeInner(d)).union(tube)
                .union(Region.unionAll(ctx, spokes))
                .minus(Shapes.holeCircle(ctx, d.boltCount(), d.boltCircle(), d.boltClearance(),
                        Shapes.boltStartDeg(d.boltCount())));
        List<Region> windows = new ArrayList<>();
        double windowDeg = 60;
        for (int k = 0; k < WINDOWS; k++) {
            windows.add(Region.arcBand(ctx, 0, 0, tubeInner(d) - 2, tubeOuter(d) + 2, 360.0 * k / WINDOWS, windowDeg));
        }
        Region windowed = tube.minus(Region.unionAll(ctx, windows));
        double screwHole = d.bracketScrewHole();
        Region motorPlate = Region.disc(ctx, 0, 0, Math.max(cupOuter, tubeOuter(d)))
                .minus(Region.boreCircle(ctx, 0, 0, d.bracketCentreHole()))
                .minus(Region.boreCircle(ctx, -d.motorSpacing() / 2, 0, screwHole))
                .minus(Region.boreCircle(ctx, d.motorSpacing() / 2, 0, screwHole));
        Region cup = Region.annulus(ctx, 0, 0, cupOuter, d.bracketSeat());
        double w0 = plate + 1.0;
        double w1 = standoff - 1.0;
        return LayeredSolid.of(ctx, List.of(new Slab(0, plate, flange), new Slab(plate, w0, tube),
                new Slab(w0, w1, windowed), new Slab(w1, standoff, tube),
                new Slab(standoff, standoff + plate, motorPlate),
                new Slab(standoff + plate, standoff + plate + d.bracketCup(), cup)));
    }
}
