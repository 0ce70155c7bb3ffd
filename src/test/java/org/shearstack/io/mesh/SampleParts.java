package org.shearstack.io.mesh;

import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Mesh;
import org.shearstack.geom.Region;

/** Small kernel parts of our own for writer tests. */
final class SampleParts {

    static final GeometryContext CTX = GeometryContext.standard();

    private SampleParts() {
    }

    /** A 20/8 mm washer, 2 mm thick, with a 12 mm counterbore 0.5 mm deep on top. */
    static Mesh washer() {
        Region body = Region.annulus(CTX, 0, 0, 20, 8);
        Region top = Region.annulus(CTX, 0, 0, 20, 12);
        return LayeredSolid.builder(CTX).slab(0, 1.5, body).slab(1.5, 2, top).build().toMesh(CTX);
    }

    /** A 40 mm disc, 1 mm thick, with 6 ports on a 24 mm circle and a hex bore. */
    static Mesh portedDisc() {
        Region ports = Region.boreCircle(CTX, 12, 0, 4).patternPolar(6);
        Region disc = Region.disc(CTX, 0, 0, 40).minus(ports).minus(Region.regularPolygon(CTX, 0, 0, 6, 5, 0));
        return LayeredSolid.extrusion(disc, 0, 1).toMesh(CTX);
    }

    /** A stepped shaft with crossing window bands: rings that cross between slabs. */
    static Mesh steppedBoss() {
        Region a = Region.disc(CTX, 0, 0, 16).minus(Region.boreCircle(CTX, 0, 0, 5));
        Region windows = Region.arcBand(CTX, 0, 0, 5, 16, 10, 50).patternPolar(3);
        Region b = a.minus(windows);
        Region c = Region.disc(CTX, 0.3, 0.2, 12).minus(Region.boreCircle(CTX, 0, 0, 5));
        return LayeredSolid.builder(CTX).slab(0, 2, a).slab(2, 3.25, b).slab(3.25, 6, c).build().toMesh(CTX);
    }
}
