package org.shearstack.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Mesh;
import org.shearstack.geom.Region;
import org.shearstack.geom.Transform;

/**
 * Section of layered solids: slab regions cut by the half-plane y &ge; 0, meshed again. Faceting puts
 * vertices at the quarter points (kernel convention), so a ring is symmetric about the cut plane and
 * exactly half its layered volume (slab area x height) remains.
 */
class LayeredSectionTest {

    private final GeometryContext ctx = GeometryContext.standard();

    @Test
    void steppedRingKeepsHalfItsVolumeAndIsClosed() {
        LayeredSolid solid = LayeredSolid.builder(ctx)
                .slab(0, 2, Region.annulus(ctx, 0, 0, 40, 8))
                .slab(2, 5, Region.annulus(ctx, 0, 0, 24, 8))
                .build();
        LayeredSolid half = LayeredSolid.of(ctx, LayeredSection.keptSlabs(solid));
        assertEquals(solid.volumeMm3() / 2, half.volumeMm3(), 1e-6 * solid.volumeMm3());
        Mesh mesh = LayeredSection.keptHalfMesh(solid);
        assertTrue(MeshSection.isClosed(mesh), "the rebuilt half is closed");
        assertEquals(half.volumeMm3(), MeshMeasure.signedVolume(mesh), 1e-6 * half.volumeMm3());
        SectionResult split = PartNode.splitCutFace(mesh);
        assertTrue(split.cap().triangleCount() > 0, "the cut face lies in the plane y = 0");
        assertEquals(mesh.triangleCount(), split.cap().triangleCount() + split.body().triangleCount());
    }

    @Test
    void solidBehindThePlaneLeavesNothingAndKernelTransformsConvert() {
        LayeredSolid behind = LayeredSolid.extrusion(Region.rectangle(ctx, -5, -9, 5, -1), 0, 3);
        assertEquals(0, LayeredSection.keptHalfMesh(behind).triangleCount());
        Transform t = Transform.rotationZDeg(90).then(Transform.translation(1, 2, 3));
        Placement p = Placement.of(t);
        double[] q = p.apply(1, 0, 0);
        assertEquals(t.applyX(1, 0, 0), q[0], 1e-15);
        assertEquals(t.applyY(1, 0, 0), q[1], 1e-15);
        assertEquals(t.applyZ(1, 0, 0), q[2], 1e-15);
    }
}
