package org.shearstack.geom;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class LayeredSolidTest {

    private final GeometryContext ctx = GeometryContext.standard();

    @Test
    void washerIsOneShellOfGenusOneWithTheFacetedVolume() {
        Region washer = Region.annulus(ctx, 0, 0, 20, 8);
        LayeredSolid solid = LayeredSolid.extrusion(washer, 0, 2);
        Mesh mesh = solid.toMesh(ctx);
        MeshReport r = MeshCheck.validate(mesh);
        assertTrue(r.isValidSolid(), r.summary());
        assertEquals(1, r.shellCount());
        assertEquals(List.of(1), r.genusPerShell());
        // exact faceted volume: area of the inscribed n-gon (n/2 R² sin(2π/n)) minus the circumscribed
        // m-gon (m r² tan(π/m)), times the height; elementary polygon areas.
        int n = ctx.segmentCount(10);
        int m = ctx.segmentCount(4);
        double expected = 2 * (n / 2.0 * 100 * Math.sin(2 * Math.PI / n) - m * 16 * Math.tan(Math.PI / m));
        assertEquals(expected, r.signedVolumeMm3(), expected * 1e-5, "grid rounding bound");
        assertEquals(solid.volumeMm3(), r.signedVolumeMm3(), solid.volumeMm3() * 1e-12);
    }

    @Test
    void steppedStackWithCrossingRingsIsClosed() {
        Region a = Region.disc(ctx, 0, 0, 30).minus(Region.boreCircle(ctx, 3, 0, 8));
        Region b = Region.centredRectangle(ctx, 2, 1, 25, 18).minus(Region.slotCut(ctx, -5, -3, 6, 4, 3));
        Region c = Region.disc(ctx, 1, 1, 27.3).minus(Region.regularPolygon(ctx, 0, 0, 6, 7, 0));
        LayeredSolid solid = LayeredSolid.builder(ctx).slab(0, 1, a).slab(1, 2.5, b).slab(2.5, 3, c).slab(4, 5, a)
                .build();
        Mesh mesh = solid.toMesh(ctx);
        MeshReport r = MeshCheck.validate(mesh);
        assertTrue(r.isValidSolid(), r.summary());
        assertEquals(2, r.shellCount());
        assertEquals(solid.noded().volumeMm3(), r.signedVolumeMm3(), solid.volumeMm3() * 1e-12);
    }
}
