package org.shearstack.geom;

import java.util.Objects;

/**
 * One layer band of a {@link LayeredSolid}: a 2D region extruded between two heights (mm). The heights are
 * snapped to the region's grid.
 */
public record Slab(double z0Mm, double z1Mm, Region region) {

    public Slab {
        Objects.requireNonNull(region, "region");
        if (!Double.isFinite(z0Mm) || !Double.isFinite(z1Mm)) {
            throw new IllegalArgumentException("slab heights: expected finite values, found " + z0Mm + ", " + z1Mm);
        }
        GeometryContext ctx = region.context();
        z0Mm = ctx.snap(z0Mm);
        z1Mm = ctx.snap(z1Mm);
        if (!(z1Mm > z0Mm)) {
            throw new IllegalArgumentException("slab: expected z1 > z0 on the grid, found z0 " + z0Mm + " mm, z1 "
                    + z1Mm + " mm");
        }
    }

    public double heightMm() {
        return z1Mm - z0Mm;
    }

    /** Area × height in mm³. */
    public double volumeMm3() {
        return region.areaMm2() * heightMm();
    }

    /** The same heights with another region. */
    public Slab withRegion(Region other) {
        return new Slab(z0Mm, z1Mm, other);
    }
}
