package org.shearstack.view;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.geom.Bounds2;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Mesh;
import org.shearstack.geom.Region;
import org.shearstack.geom.Slab;

/**
 * The section through the axis of a layered solid: each slab's region is cut by the half-plane y &ge; 0
 * and the stack is meshed again, so the cut faces are the slabs' own closed side walls.
 */
public final class LayeredSection {

    private LayeredSection() {
    }

    /** The half y &ge; 0 of a solid already in the assembly frame (empty slabs dropped). */
    public static List<Slab> keptSlabs(LayeredSolid placed) {
        List<Slab> kept = new ArrayList<>();
        for (Slab slab : placed.slabs()) {
            if (slab.region().isEmpty()) {
                continue;
            }
            Bounds2 b = slab.region().bounds();
            if (b.maxYMm() <= 0) {
                continue;
            }
            Region half = Region.rectangle(placed.context(), b.minXMm() - 1, 0, b.maxXMm() + 1, b.maxYMm() + 1);
            Region cut = slab.region().intersect(half);
            if (!cut.isEmpty()) {
                kept.add(new Slab(slab.z0Mm(), slab.z1Mm(), cut));
            }
        }
        return kept;
    }

    /** The kept half meshed with the solid's own geometry context; an empty mesh when nothing is kept. */
    public static Mesh keptHalfMesh(LayeredSolid placed) {
        List<Slab> kept = keptSlabs(placed);
        if (kept.isEmpty()) {
            return Mesh.of(new double[0], new int[0]);
        }
        return LayeredSolid.of(placed.context(), kept).toMesh(placed.context());
    }
}
