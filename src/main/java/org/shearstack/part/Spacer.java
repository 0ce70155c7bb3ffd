package org.shearstack.part;

import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;

/**
 * A keyed spacer between two discs: hexagonal bore like the discs, outside diameter on the port circle, so
 * the ports notch its rim and its webs back the disc spokes.
 */
public final class Spacer {

    private Spacer() {
    }

    public static Region face(Dims d, GeometryContext ctx) {
        return Region.disc(ctx, 0, 0, d.spacerOutside()).minus(Shapes.hexagon(ctx, d.discBoreAcrossFlats()))
                .minus(Shapes.ports(ctx, d.portCount(), d.portCircleDiameter(), d.portDiameter()));
    }

    public static LayeredSolid solid(Dims d, GeometryContext ctx) {
        return LayeredSolid.extrusion(face(d, ctx), 0, d.spacerThickness());
    }
}
