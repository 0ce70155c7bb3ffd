package org.shearstack.part;

import java.util.ArrayList;
import java.util.List;

import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;
import org.shearstack.geom.Slab;

/**
 * A rotor disc, printed flat: an annulus with a hexagonal drive bore and round exhaust ports near the hub
 * (a multiple of six, so they line up on the hexagon in any position). With integral spacers, the disc
 * carries its spacer as a boss on its upper face.
 */
public final class RotorDisc {

    private RotorDisc() {
    }

    /** The disc's plane region. */
    public static Region face(Dims d, GeometryContext ctx) {
        return Region.disc(ctx, 0, 0, d.discDiameter()).minus(Shapes.hexagon(ctx, d.discBoreAcrossFlats()))
                .minus(Shapes.ports(ctx, d.portCount(), d.portCircleDiameter(), d.portDiameter()));
    }

    public static LayeredSolid solid(Dims d, GeometryContext ctx, boolean withBoss) {
        List<Slab> slabs = new ArrayList<>();
        slabs.add(new Slab(0, d.discThickness(), face(d, ctx)));
        if (withBoss) {
            slabs.add(new Slab(d.discThickness(), d.discThickness() + d.spacerThickness(), Spacer.face(d, ctx)));
        }
        return LayeredSolid.of(ctx, slabs);
    }
}
