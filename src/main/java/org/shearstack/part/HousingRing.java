package org.shearstack.part;

import java.util.List;

import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;
import org.shearstack.geom.Slab;

/**
 * The housing ring, printed flat, as tall as the chamber: the chamber bore, the plenum (a vertical bore
 * beside the chamber, fed from the free cover's inlet), the clearance holes of the housing screws, and the
 * nozzle slot from the plenum to the rotor rim across the disc-pack height. With the insert option the ring
 * has a wedge-shaped pocket instead and the nozzle lives in {@link NozzleInsert}. The seal grooves are in
 * the covers; the ring's faces are the sealing lands.
 */
public final class HousingRing {

    private HousingRing() {
    }

    static Region base(Dims d, GeometryContext ctx) {
        return Region.disc(ctx, 0, 0, d.housingOutside())
                .minus(Region.boreCircle(ctx, 0, 0, d.chamberDiameter()))
                .minus(Region.boreCircle(ctx, d.plenumRadius(), 0, d.plenumDiameter()))
                .minus(Shapes.holeCircle(ctx, d.boltCount(), d.boltCircle(), d.boltClearance(),
                        Shapes.boltStartDeg(d.boltCount())));
    }

    public static LayeredSolid solid(Dims d, GeometryContext ctx) {
        Region base = base(d, ctx);
        if (d.nozzleInsert()) {
            Region pocket = Shapes.nozzleBlock(ctx, d, d.insertFit());
            return LayeredSolid.extrusion(base.minus(pocket), 0, d.chamberDepth());
        }
        Region slotted = base.minus(Shapes.nozzleChannel(ctx, d));
        return LayeredSolid.of(ctx, List.of(new Slab(0, d.packZ0(), base), new Slab(d.packZ0(), d.packZ1(), slotted),
                new Slab(d.packZ1(), d.chamberDepth(), base)));
    }
}
