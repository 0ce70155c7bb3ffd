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
        List<Slab> slabs = new ArrayList<>();
        slabs.add(new Slab(0, -d.coverThickness() - z0, flat));
        slabs.add(new Slab(-d.coverThickness() - z0, d.packZ0() - z0, round));
        slabs.addAll(chamferedHex(d, ctx, middle, bore, d.packZ0() - z0, d.packZ1() - z0));
        slabs.add(new Slab(d.packZ1() - z0, d.driveCoverTop() - z0, round));
        slabs.add(new Slab(d.driveCoverTop() - z0, d.shaftZ1() - z0, flat));
        return LayeredSolid.of(ctx, slabs);
    }

    /**
     * The hexagon from {@code u0} to {@code u1}, its corners trimmed at the lower end, where it stands on the
     * narrower journal in print: each corner is cut square to its diagonal by a hexagon turned 30°, whose size
     * grows by one layer height per layer, so the corners rise at 45° (the 45° overhang rule of FFF printing,
     * common practice) and print without support. The flats are untouched, so every layer still keys the discs.
     * Only when the flats themselves stand on the journal (within one layer's step); otherwise the shoulder is
     * left square (a known gap: such designs get an overhang caution from the printability check).
     */
    static List<Slab> chamferedHex(Dims d, GeometryContext ctx, Region hex, Region bore, double u0, double u1) {
        List<Slab> out = new ArrayList<>();
        double layer = d.layerHeight();
        double corner = d.hexAcrossFlats() / Math.sqrt(3);
        double r = d.journal() / 2;
        double u = u0;
        if (d.hexAcrossFlats() / 2 > r + layer) {
            return List.of(new Slab(u0, u1, hex));
        }
        while (r + layer < corner && u + 2 * layer <= u1) {
            r += layer;
            Region cut = Region.regularPolygon(ctx, 0, 0, 6, 2 * r, 0);
            out.add(new Slab(u, u + layer, hex.intersect(cut).minus(bore)));
            u += layer;
        }
        out.add(new Slab(u, u1, hex));
        return out;
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
