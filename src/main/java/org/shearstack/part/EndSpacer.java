package org.shearstack.part;

import java.util.List;

import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;
import org.shearstack.geom.Slab;

/**
 * An end spacer on the journal between an outer disc and a bearing's inner ring. Printed with its wide face
 * on the bed (it bears on the disc inside the port ring) and a narrow land on top that touches only the
 * bearing's inner ring.
 */
public final class EndSpacer {

    private EndSpacer() {
    }

    /** Outside diameter of the wide part: just inside the disc ports. */
    public static double outside(Dims d) {
        return 2 * d.portInnerRadius();
    }

    public static LayeredSolid solid(Dims d, GeometryContext ctx) {
        double t = d.endSpacerThickness();
        double land = Math.min(d.endSpacerLandHeight(), t / 2);
        Region wide = Region.annulus(ctx, 0, 0, outside(d), d.endSpacerBore());
        if (d.endSpacerLand() >= outside(d)) {
            return LayeredSolid.extrusion(wide, 0, t);
        }
        Region narrow = Region.annulus(ctx, 0, 0, d.endSpacerLand(), d.endSpacerBore());
        return LayeredSolid.of(ctx, List.of(new Slab(0, t - land, wide), new Slab(t - land, t, narrow)));
    }
}
