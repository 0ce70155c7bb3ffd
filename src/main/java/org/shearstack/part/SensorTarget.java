package org.shearstack.part;

import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;

/**
 * The speed-sensor target on the free end: a thin disc with a D bore and a flat face for reflective tape or an
 * optical tachometer, with one rim notch as a once-per-revolution mark.
 */
public final class SensorTarget {

    private SensorTarget() {
    }

    public static LayeredSolid solid(Dims d, GeometryContext ctx) {
        double od = d.targetDiameter();
        double notch = Math.max(2.0, 4 * d.lineWidth());
        Region r = Region.disc(ctx, 0, 0, od).minus(Shapes.dBore(ctx, d.journal() + d.holeCompensation() + 0.1, d.flatDepth()))
                .minus(Region.centredRectangle(ctx, od / 2, 0, 2 * notch, notch));
        return LayeredSolid.extrusion(r, 0, d.targetThickness());
    }
}
