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

    @Test
    void partsTouchingAtAPointAreOpenedIntoAValidSolid() {
        // kernel-notes P7: two discs meeting at the quadrant point (5, 0) pinch the solid there
        Region pair = Region.disc(ctx, 0, 0, 10).union(Region.disc(ctx, 10, 0, 10));
        Mesh mesh = LayeredSolid.extrusion(pair, 0, 1).toMesh(ctx);
        MeshReport r = MeshCheck.validate(mesh);
        assertTrue(r.isValidSolid(), r.summary());
        // the opening removes a few µm² near the touch point (tangent circles stay within a grid cell over
        // ~sqrt(2 R grid) = 0.07 mm), far below what a printer resolves
        assertEquals(pair.areaMm2(), r.signedVolumeMm3(), 1e-3, "only a tiny square is cut");
        assertTrue(r.signedVolumeMm3() < pair.areaMm2(), "material is removed, not added");
    }

    @Test
    void aHoleAboveEqualToTheOutlineBelowIsOpenedIntoAValidSolid() {
        // kernel-notes P8: the upper plate's hole coincides with the lower disc's outline (material on
        // opposite sides), so the two bodies would share every edge of that curve
        Region disc = Region.disc(ctx, 0, 0, 20);
        Region plate = Region.centredRectangle(ctx, 0, 0, 40, 40).minus(disc);
        LayeredSolid solid = LayeredSolid.builder(ctx).slab(0, 1, disc).slab(1, 2, plate).build();
        MeshReport r = MeshCheck.validate(solid.toMesh(ctx));
        assertTrue(r.isValidSolid(), r.summary());
        assertEquals(2, r.shellCount(), "a one-grid gap now separates the bodies");
        assertEquals(solid.volumeMm3(), r.signedVolumeMm3(), disc.perimeterMm() * 3 * ctx.gridMm());
    }

    @Test
    void equalNeighboursMergeAndGapsMakeShells() {
        Region r = Region.annulus(ctx, 0, 0, 12, 4);
        LayeredSolid s = LayeredSolid.builder(ctx).slab(0, 1, r).slab(1, 2, r).slab(3, 4, r).build();
        Mesh mesh = s.toMesh(ctx);
        MeshReport rep = MeshCheck.validate(mesh);
        assertEquals(2, rep.shellCount());
        assertEquals(List.of(1, 1), rep.genusPerShell());
        assertEquals(3 * r.areaMm2(), rep.signedVolumeMm3(), 1e-9 * rep.signedVolumeMm3());
        assertEquals(2 * MeshCheck.validate(LayeredSolid.extrusion(r, 0, 1).toMesh(ctx)).triangleCount(),
                mesh.triangleCount(), "merged slabs add no triangles");
        assertTrue(s.slabAt(1.5).isPresent());
        assertTrue(s.slabAt(2.5).isEmpty());
    }

    @Test
    void aPointTouchAcrossAnInterfaceIsReportedAsAPinchedVertex() {
        // kernel-notes P9: a lower square's corner touches the upper square's corner at one point
        Region low = Region.rectangle(ctx, 0, 0, 5, 5);
        Region high = Region.rectangle(ctx, 5, 5, 10, 10);
        MeshReport r = MeshCheck.validate(LayeredSolid.builder(ctx).slab(0, 1, low).slab(1, 2, high).build().toMesh(ctx));
        assertTrue(r.isValidSolid(), r.summary());
        assertEquals(1, r.pinchedVertices(), r.summary());
        assertEquals(0, MeshCheck.validate(LayeredSolid.extrusion(low, 0, 1).toMesh(ctx)).pinchedVertices());
    }
}
