package org.shearstack.part;

import java.util.List;

import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;
import org.shearstack.geom.Slab;

/**
 * The three-piece Oldham coupling (a published mechanism): two hubs, each with a tongue across its face,
 * and a centre disc with a slot on each face at right angles, so the hubs may be offset sideways. The turbine
 * hub has a D bore for the shaft's flat; the generator hub a light-press bore for the motor shaft. Hubs print
 * body down, tongue up; the disc prints flat.
 */
public final class Coupling {

    private Coupling() {
    }

    public static LayeredSolid turbineHub(Dims d, GeometryContext ctx) {
        return hub(d, ctx, Shapes.dBore(ctx, d.turbineBore(), d.flatDepth()), d.couplingDiameter());
    }

    public static LayeredSolid generatorHub(Dims d, GeometryContext ctx) {
        return hub(d, ctx, Region.boreCircle(ctx, 0, 0, d.generatorBore()), d.generatorHubDiameter());
    }

    /** A hub of diameter {@code od}; the generator's is smaller, so it turns inside the motor screws' heads. */
    private static LayeredSolid hub(Dims d, GeometryContext ctx, Region bore, double od) {
        Region body = Region.disc(ctx, 0, 0, od).minus(bore);
        Region tongue = Region.disc(ctx, 0, 0, od).intersect(Region.centredRectangle(ctx, 0, 0, od + 2, d.tongueWidth()))
                .minus(bore);
        return LayeredSolid.of(ctx, List.of(new Slab(0, d.couplingHub(), body),
                new Slab(d.couplingHub(), d.couplingHub() + d.tongueHeight(), tongue)));
    }

    /** The centre disc: slot along X on the bottom face, along Y on the top face. */
    public static LayeredSolid centreDisc(Dims d, GeometryContext ctx) {
        double od = d.couplingDiameter();
        double slot = d.tongueWidth() + d.couplingClearance();
        double depth = d.tongueHeight() + 0.5;
        Region disc = Region.disc(ctx, 0, 0, od);
        Region slotX = Region.centredRectangle(ctx, 0, 0, od + 2, slot);
        Region slotY = Region.centredRectangle(ctx, 0, 0, slot, od + 2);
        double t = d.couplingDisc();
        return LayeredSolid.of(ctx, List.of(new Slab(0, depth, disc.minus(slotX)), new Slab(depth, t - depth, disc),
                new Slab(t - depth, t, disc.minus(slotY))));
    }
}
