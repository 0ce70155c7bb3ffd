package org.shearstack.part;

import java.util.List;

import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;
import org.shearstack.geom.Slab;

/**
 * The drop-in nozzle block (option): a wedge that is wider on the plenum side, so supply pressure pushes it
 * into its pocket; the channel runs through it across the disc-pack height. Printed flat, as tall as the ring.
 */
public final class NozzleInsert {

    private NozzleInsert() {
    }

    public static LayeredSolid solid(Dims d, GeometryContext ctx) {
        Region block = Shapes.nozzleBlock(ctx, d, 0)
                .minus(Region.boreCircle(ctx, 0, 0, d.chamberDiameter()))
                .minus(Region.boreCircle(ctx, d.plenumRadius(), 0, d.plenumDiameter()));
        Region slotted = block.minus(Shapes.nozzleChannel(ctx, d));
        return LayeredSolid.of(ctx, List.of(new Slab(0, d.packZ0(), block), new Slab(d.packZ0(), d.packZ1(), slotted),
                new Slab(d.packZ1(), d.chamberDepth(), block)));
    }
}
