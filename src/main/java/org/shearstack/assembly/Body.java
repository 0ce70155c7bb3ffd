package org.shearstack.assembly;

import org.shearstack.geom.LayeredSolid;

/**
 * One solid in the assembly frame for the interference check: a placed copy of a printed part or a piece of
 * hardware (bearing, metal shaft).
 *
 * @param name     part name and copy number, e.g. "rotor-disc #3"
 * @param family   part family ("rotor", "housing", "cover", "bearing", ...)
 * @param rotating turns with the rotor
 * @param round    every slab is a set of concentric annuli about the axis (a bearing): the check may compare
 *                 it with anything on radial profiles alone
 * @param solid    layered solid in the assembly frame
 */
public record Body(String name, String family, boolean rotating, boolean round, LayeredSolid solid) {

    /** A body that is not known to be round. */
    public Body(String name, String family, boolean rotating, LayeredSolid solid) {
        this(name, family, rotating, false, solid);
    }
}
