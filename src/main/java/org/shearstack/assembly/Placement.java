package org.shearstack.assembly;

import java.util.ArrayList;
import java.util.List;

import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;
import org.shearstack.geom.Slab;
import org.shearstack.geom.Transform;

/**
 * Where one copy of a part sits in the assembly frame, from its print orientation: optionally turned upside
 * down (half turn about X), then turned about the axis, then moved along it. Parts of a turbine only ever
 * need these three, which keep a layered solid layered.
 *
 * @param flipped     half turn about X first (y → −y, z → −z)
 * @param rotationDeg then a rotation about +Z, degrees
 * @param dzMm        then a move along Z
 */
public record Placement(boolean flipped, double rotationDeg, double dzMm) {

    public static Placement at(double dzMm) {
        return new Placement(false, 0, dzMm);
    }

    public static Placement flippedAt(double dzMm) {
        return new Placement(true, 0, dzMm);
    }

    public Placement rotated(double deg) {
        return new Placement(flipped, rotationDeg + deg, dzMm);
    }

    /** The same placement moved further along Z (exploded views). */
    public Placement raised(double dMm) {
        return new Placement(flipped, rotationDeg, dzMm + dMm);
    }

    public Transform transform() {
        Transform t = flipped ? Transform.flipOverX() : Transform.identity();
        return t.then(Transform.rotationZDeg(rotationDeg)).then(Transform.translation(0, 0, dzMm));
    }

    /** The solid in the assembly frame (slab regions turned, heights moved). */
    public LayeredSolid apply(LayeredSolid s) {
        List<Slab> out = new ArrayList<>();
        for (Slab slab : s.slabs()) {
            Region r = flipped ? slab.region().mirroredAcrossXAxis() : slab.region();
            r = r.rotatedDeg(rotationDeg);
            double z0 = flipped ? -slab.z1Mm() : slab.z0Mm();
            double z1 = flipped ? -slab.z0Mm() : slab.z1Mm();
            out.add(new Slab(z0 + dzMm, z1 + dzMm, r));
        }
        return LayeredSolid.of(s.context(), out);
    }
}
