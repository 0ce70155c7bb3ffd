package org.shearstack.part;

import java.util.ArrayList;
import java.util.List;

import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;
import org.shearstack.geom.Slab;

/**
 * The printed hub shaft, printed standing on its free end: a D-flat stub for the speed-sensor target, the
 * free journal, the hexagon that drives the discs (its ends are the shoulders the end spacers bear on), the
 * drive journal and a D-flat drive end for the coupling; hollow along its axis. With a metal shaft the printed
 * part is only the hexagonal sleeve ({@link #sleeve}).
 */
public final class HubShaft {

    private HubShaft() {
    }

    public static LayeredSolid solid(Dims d, GeometryContext ctx) {
        Region bore = d.shaftBore() > 0 ? Region.boreCircle(ctx, 0, 0, d.shaftBore()) : Region.empty(ctx);
        return stack(d, ctx, Shapes.hexagon(ctx, d.hexAcrossFlats()).minus(bore), bore);
    }

    /**
     * The metal shaft of the metal-shaft option as a solid for the assembly and the interference check
     * (hardware, not printed): round, with the same D-flats at both ends.
     */
    public static LayeredSolid metalShaftModel(Dims d, GeometryContext ctx) {
        return stack(d, ctx, Region.disc(ctx, 0, 0, d.journal()), Region.empty(ctx));
    }

    private static LayeredSolid stack(Dims d, GeometryContext ctx, Region middle, Region bore) {
        double z0 = d.shaftZ0();
        Region flat = Shapes.dShaft(ctx, d.journal(), d.flatDepth()).minus(bore);
        Region round = Region.disc(ctx, 0, 0, d.journal()).minus(bore);
        Region hex = middle;
        double[] z = {d.shaftZ0(), -d.coverThickness(), d.packZ0(), d.packZ1(), d.driveCoverTop(), d.shaftZ1()};
        Region[] r = {flat, round, hex, round, flat};
        List<Slab> slabs = new ArrayList<>();
        for (int i = 0; i < r.length; i++) {
            slabs.add(new Slab(z[i] - z0, z[i + 1] - z0, r[i]));
        }
        return LayeredSolid.of(ctx, slabs);
    }

    /** Metal-shaft option: the printed hexagonal sleeve that carries the discs. */
    public static LayeredSolid sleeve(Dims d, GeometryContext ctx) {
        Region r = Shapes.hexagon(ctx, d.hexAcrossFlats()).minus(Region.boreCircle(ctx, 0, 0, d.sleeveBore()));
        return LayeredSolid.extrusion(r, 0, d.packHeight());
    }

    /** Length of the metal shaft (hardware) in the metal-shaft option. */
    public static double metalShaftLength(Dims d) {
        return d.shaftZ1() - d.shaftZ0();
    }
}
