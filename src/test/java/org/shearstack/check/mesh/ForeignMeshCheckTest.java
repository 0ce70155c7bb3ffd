package org.shearstack.check.mesh;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.shearstack.check.Finding;
import org.shearstack.check.Severity;
import org.shearstack.check.mesh.ForeignMeshCheck.MeshObject;
import org.shearstack.check.print.PrintLimits;
import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Mesh;
import org.shearstack.geom.Region;
import org.shearstack.geom.Transform;

/**
 * Foreign meshes: analytic solids (a box's volume is exact, DESIGN.md §5) built with the kernel and checked as if
 * they came from elsewhere. Printer limits: a 0.4 mm nozzle (standards.md §7/§8 R2–R5: line width 0.45, layer 0.2,
 * overhang 45° from vertical, minimum wall two line widths = 0.9 mm; all common practice).
 */
class ForeignMeshCheckTest {

    static final GeometryContext CTX = GeometryContext.standard();
    static final ForeignMeshCheck.Settings SETTINGS = ForeignMeshCheck.Settings.of(PrintLimits.generic04(), 0.2, CTX);

    static Mesh box(double x0, double y0, double z0, double size) {
        return LayeredSolid.extrusion(Region.rectangle(CTX, x0, y0, x0 + size, y0 + size), z0, z0 + size).toMesh(CTX);
    }

    static List<Finding> of(List<Finding> f, String code) {
        return f.stream().filter(x -> x.code().equals(code)).toList();
    }

    @Test
    void boxIsValidAndSlicesToItsOwnVolume() {
        ForeignMeshCheck.ObjectResult r = ForeignMeshCheck.checkOne(new MeshObject("box", box(0, 0, 0, 10)), SETTINGS);
        assertEquals(Severity.OK, of(r.findings(), "MESH-VALID").get(0).severity());
        assertTrue(r.findings().stream().allMatch(f -> f.severity() == Severity.OK), r.findings().toString());
        // 10 mm cube: 1000 mm³ exactly, sliced at 0.2 mm from the bottom: 0.2 + 49 × 0.2 = 10 mm, 50 slabs
        assertEquals(1000, r.solid().orElseThrow().volumeMm3(), 1e-9);
        assertEquals(50, r.plan().orElseThrow().slabCount());
        // every section of a prism is the same: the 50 slices join into one slab, checked once
        assertEquals(1, r.solid().orElseThrow().slabs().size());
        assertEquals(0, r.report().genusPerShell().get(0));
    }

    @Test
    void boxMissingAFaceFailsValidityAndIsNotSliced() {
        Mesh closed = box(0, 0, 0, 10);
        int[] tri = closed.triangleArray();
        double[] xyz = closed.vertexArray();
        // drop the top face: every triangle whose corners are all at z = 10
        int[] kept = java.util.stream.IntStream.range(0, closed.triangleCount())
                .filter(t -> !(closed.z(tri[3 * t]) == 10 && closed.z(tri[3 * t + 1]) == 10 && closed.z(tri[3 * t + 2]) == 10))
                .flatMap(t -> java.util.stream.IntStream.of(tri[3 * t], tri[3 * t + 1], tri[3 * t + 2])).toArray();
        assertTrue(kept.length < tri.length);
        ForeignMeshCheck.ObjectResult r = ForeignMeshCheck.checkOne(new MeshObject("open", Mesh.of(xyz, kept)), SETTINGS);
        assertEquals(Severity.FAIL, of(r.findings(), "MESH-OPEN").get(0).severity());
        assertTrue(r.solid().isEmpty());
        assertEquals(Severity.CAUTION, of(r.findings(), "PRINTABILITY").get(0).severity());
    }

    @Test
    void insideOutBoxFailsOrientation() {
        Mesh inside = box(0, 0, 0, 10).transformed(Transform.mirrorZ());
        // mirrorZ keeps normals outward by reversing windings; reverse them again to turn the box inside out
        int[] tri = inside.triangleArray();
        for (int t = 0; t < tri.length; t += 3) {
            int b = tri[t + 1];
            tri[t + 1] = tri[t + 2];
            tri[t + 2] = b;
        }
        ForeignMeshCheck.ObjectResult r = ForeignMeshCheck.checkOne(
                new MeshObject("flipped", Mesh.of(inside.vertexArray(), tri)), SETTINGS);
        assertEquals(Severity.FAIL, of(r.findings(), "MESH-ORIENTATION").get(0).severity());
    }

    @Test
    void thinWalledTubeIsFlaggedThinWhereTheWallIs() {
        // 0.6 mm wall (outer Ø 21.2, bore Ø 20): thicker than the 0.4 mm nozzle, under two line widths (0.9 mm)
        Mesh tube = LayeredSolid.extrusion(Region.annulus(CTX, 0, 0, 21.2, 20), 0, 5).toMesh(CTX);
        ForeignMeshCheck.ObjectResult r = ForeignMeshCheck.checkOne(new MeshObject("tube", tube), SETTINGS);
        Finding thin = of(r.findings(), "WALL-THIN").get(0);
        assertEquals(Severity.CAUTION, thin.severity());
        assertEquals(0.6, thin.measured(), 0.02);
        assertEquals(10.3, Math.hypot(thin.where().xMm(), thin.where().yMm()), 0.05);
        assertEquals(1, of(r.findings(), "WALL-THIN").size(), "one wall, reported once: " + r.findings());
        // 0.3 mm wall: a whole body narrower than the nozzle does not print at all
        Mesh foil = LayeredSolid.extrusion(Region.annulus(CTX, 0, 0, 20.6, 20), 0, 5).toMesh(CTX);
        List<Finding> f = ForeignMeshCheck.checkOne(new MeshObject("foil", foil), SETTINGS).findings();
        assertEquals(Severity.FAIL, of(f, "PRINT-FEATURE-SMALL").get(0).severity());
    }

    @Test
    void shelfOverhangIsFoundAtItsHeightAndSide() {
        // a 10 × 10 post 10 mm tall carrying a 2 mm shelf that sticks out 12 mm towards +x: a 90° overhang
        Region post = Region.rectangle(CTX, 0, 0, 10, 10);
        Region shelf = Region.rectangle(CTX, 0, 0, 22, 10);
        Mesh m = LayeredSolid.builder(CTX).slab(0, 10, post).slab(10, 12, shelf).build().toMesh(CTX);
        List<Finding> f = ForeignMeshCheck.checkOne(new MeshObject("shelf", m), SETTINGS).findings();
        Finding o = of(f, "OVERHANG").get(0);
        assertEquals(10, o.where().zMm(), 1e-9);
        assertTrue(o.where().xMm() > 10 && o.where().xMm() < 22, o.toString());
        assertTrue(o.measured() > 5, o.toString());
    }

    @Test
    void fortyFiveDegreeChamferIsNotAnOverhang() {
        // a stepped 45° cone-like stack: each 0.2 mm slab 0.2 mm wider than the one below (standards.md §7: 45° prints)
        LayeredSolid.Builder b = LayeredSolid.builder(CTX);
        for (int i = 0; i < 20; i++) {
            double grow = 0.2 * i;
            b.slab(0.2 * i, 0.2 * (i + 1), Region.rectangle(CTX, -grow, 0, 10 + grow, 10));
        }
        List<Finding> f = ForeignMeshCheck.checkOne(new MeshObject("chamfer", b.build().toMesh(CTX)), SETTINGS)
                .findings();
        assertEquals(List.of(), of(f, "OVERHANG"), f.toString());
    }

    @Test
    void overlappingBoxesInterfereByTheirSharedVolume() {
        List<MeshObject> objects = List.of(new MeshObject("a", box(0, 0, 0, 10)), new MeshObject("b", box(5, 0, 0, 10)));
        ForeignMeshCheck.Result r = ForeignMeshCheck.run(objects, SETTINGS);
        Finding i = of(r.interference(), "MESH-INTERFERENCE").get(0);
        assertEquals(Severity.FAIL, i.severity());
        // the shared block is 5 × 10 × 10 mm = 500 mm³ (exact on axis-aligned slabs)
        assertEquals(500, i.measured(), 1e-6);
        assertTrue(r.anyFail());
    }

    @Test
    void separateAndTouchingBoxesPass() {
        List<MeshObject> apart = List.of(new MeshObject("a", box(0, 0, 0, 10)), new MeshObject("b", box(30, 0, 0, 10)),
                new MeshObject("c", box(10, 0, 0, 10)), new MeshObject("d", box(0, 0, 10, 10)));
        ForeignMeshCheck.Result r = ForeignMeshCheck.run(apart, SETTINGS);
        assertEquals(1, r.interference().size(), r.interference().toString());
        assertEquals(Severity.OK, r.interference().get(0).severity());
        // c touches a and b? a–c share the face x = 10, a–d the face z = 10: contact, not interference
        assertTrue(!r.anyFail(), r.findings().toString());
    }

    @Test
    void slicePlanCoarsensForTallObjectsAndSaysSo() {
        SlicePlan small = SlicePlan.of(0, 10, 0.2, 0.2, 0, 300);
        assertEquals(1, small.layersPerSlab());
        assertEquals(50, small.slabCount());
        SlicePlan tall = SlicePlan.of(5, 205, 0.3, 0.2, 0, 300);
        // 199.7 mm above the first layer = 999 layers (rounded up); within 299 slabs that is every 4 layers
        assertEquals(4, tall.layersPerSlab());
        assertTrue(tall.slabCount() <= 300);
        assertEquals(5.3, tall.boundariesMm()[1], 1e-12);
        assertEquals(6.1, tall.boundariesMm()[2], 1e-12);
        assertTrue(tall.boundariesMm()[tall.slabCount()] >= 205);
        assertTrue(tall.describe().contains("every 4 layers"), tall.describe());
        assertArrayEquals(new double[] {0, 0.2, 0.6, 1.0}, SlicePlan.of(0, 1, 0.2, 0.2, 2, 300).boundariesMm(), 1e-12);
    }
}
