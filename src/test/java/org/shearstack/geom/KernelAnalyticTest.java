package org.shearstack.geom;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/** Analytic references for mass properties, metamorphic tests and slicing. */
class KernelAnalyticTest {

    /** Coarse tolerance so faceting is visible against the continuum formulas. */
    private final GeometryContext coarse = new GeometryContext(GeometryContext.DEFAULT_GRID_MM, 0.2);
    private final GeometryContext ctx = GeometryContext.standard();
    private static final double PLA_KG_PER_M3 = 1240; // common practice value for PLA, used only as a scale

    /** Polar second moment of a regular n-gon of circumradius R about its centre: n R^4 sin a (2 + cos a) / 12. */
    private static double polygonPolar(double vertexRadius, int n) {
        double a = 2 * Math.PI / n;
        return n * Math.pow(vertexRadius, 4) * Math.sin(a) * (2 + Math.cos(a)) / 12;
    }

    @Test
    void discInertiaMatchesThePolygonExactlyAndHalfMRSquaredWithinTheFacetingBound() {
        double r = 30;
        double h = 2;
        Mesh mesh = LayeredSolid.extrusion(Region.disc(coarse, 0, 0, 2 * r), 0, h).toMesh(coarse);
        MassProperties mp = MassProperties.of(mesh, PLA_KG_PER_M3);
        int n = coarse.segmentCount(r);
        double kgPerMm5 = PLA_KG_PER_M3 * 1e-15;
        double exactPolygon = kgPerMm5 * h * polygonPolar(r, n); // derived: sum of centre triangles
        // grid rounding moves each vertex by at most 0.71 grid, so J ~ R^4 moves by at most 4 * 0.71 grid / R
        double gridRel = 3 * coarse.gridMm() / r;
        assertEquals(exactPolygon, mp.inertiaCentroidKgM2(2, 2), exactPolygon * gridRel, "grid rounding only");
        assertEquals(exactPolygon, mp.inertiaZAxisKgM2(), exactPolygon * gridRel);
        // solid cylinder about its axis I = 1/2 m R^2 (standard table of mass moments of inertia, e.g.
        // Hibbeler, Engineering Mechanics: Dynamics, inside back cover; from memory)
        double continuum = 0.5 * mp.massKg() * r * r * 1e-6;
        double bound = continuum * (1 - Math.cos(2 * Math.PI / n)) / 3 + exactPolygon * gridRel; // derived bound
        assertEquals(continuum, mp.inertiaZAxisKgM2(), bound);
        assertTrue(Math.abs(continuum - mp.inertiaZAxisKgM2()) > 1e-3 * bound, "faceting is visible");
        // transverse: I_xx = m (3 R^2 + h^2) / 12 for the cylinder; for the polygon prism J/2 h + A h^3 / 12
        double area = n / 2.0 * r * r * Math.sin(2 * Math.PI / n);
        double ixx = kgPerMm5 * (h * polygonPolar(r, n) / 2 + area * h * h * h / 12);
        assertEquals(ixx, mp.inertiaCentroidKgM2(0, 0), ixx * gridRel);
        assertEquals(h / 2, mp.centroidZMm(), 1e-12);
        assertEquals(0, mp.inertiaCentroidKgM2(0, 1), ixx * 1e-9);
        // surface area: two faces plus the wall n * chord * h
        double wall = n * 2 * r * Math.sin(Math.PI / n) * h;
        assertEquals(2 * area + wall, mp.surfaceAreaMm2(), (2 * area + wall) * gridRel);
    }

    @Test
    void ringInertiaMatchesHalfMTimesSumOfSquaredRadiiWithinTheFacetingBound() {
        double ro = 40;
        double ri = 10;
        double h = 3;
        Mesh mesh = LayeredSolid.extrusion(Region.annulus(coarse, 0, 0, 2 * ro, 2 * ri), 0, h).toMesh(coarse);
        MeshReport report = MeshCheck.validate(mesh);
        assertEquals(List.of(1), report.genusPerShell(), "a washer has genus 1");
        MassProperties mp = MassProperties.of(mesh, PLA_KG_PER_M3);
        int no = coarse.segmentCount(ro);
        int ni = coarse.segmentCount(ri);
        double riv = ri / Math.cos(Math.PI / ni); // circumscribed bore polygon's vertex radius
        double kgPerMm5 = PLA_KG_PER_M3 * 1e-15;
        double exact = kgPerMm5 * h * (polygonPolar(ro, no) - polygonPolar(riv, ni));
        assertEquals(exact, mp.inertiaZAxisKgM2(), exact * 3 * coarse.gridMm() / ri, "grid rounding only");
        // hollow cylinder I = 1/2 m (R^2 + r^2) (same table as above; from memory), with the continuum mass
        double continuum = 0.5 * PLA_KG_PER_M3 * 1e-9 * Math.PI * (ro * ro - ri * ri) * h * (ro * ro + ri * ri) * 1e-6;
        double bound = kgPerMm5 * h * (Math.abs(polygonPolar(ro, no) - Math.PI * Math.pow(ro, 4) / 2)
                + Math.abs(polygonPolar(riv, ni) - Math.PI * Math.pow(ri, 4) / 2)) * 1.001 + exact * 3 * coarse.gridMm() / ri;
        assertEquals(continuum, mp.inertiaZAxisKgM2(), bound);
        assertTrue(bound < 2e-2 * continuum, "the bound is tight enough to mean something");
    }

    @Test
    void offAxisPartUsesTheParallelAxisTheorem() {
        Mesh mesh = LayeredSolid.extrusion(Region.disc(ctx, 20, 0, 10), 0, 1).toMesh(ctx);
        MassProperties mp = MassProperties.of(mesh, 1000);
        double expected = mp.inertiaCentroidKgM2(2, 2) + mp.massKg() * 20 * 20 * 1e-6; // Steiner
        assertEquals(expected, mp.inertiaZAxisKgM2(), expected * 1e-9);
        assertEquals(20, mp.centroidXMm(), 1e-9);
    }

    @Test
    void rotatingTheStartVertexChangesNothing() {
        double[] xy = {0, 0, 12, -1, 14, 6, 7, 9, 4, 5, -2, 8};
        LayeredSolid base = stackOf(Region.polygon(ctx, xy));
        MeshReport ref = MeshCheck.validate(base.toMesh(ctx));
        for (int k = 1; k < xy.length / 2; k++) {
            double[] rot = new double[xy.length];
            for (int i = 0; i < xy.length; i++) {
                rot[i] = xy[(i + 2 * k) % xy.length];
            }
            MeshReport r = MeshCheck.validate(stackOf(Region.polygon(ctx, rot)).toMesh(ctx));
            assertTrue(r.isValidSolid(), r.summary());
            assertEquals(ref.genusPerShell(), r.genusPerShell());
            assertEquals(ref.signedVolumeMm3(), r.signedVolumeMm3(), 1e-12 * ref.signedVolumeMm3());
        }
    }

    @Test
    void translatingAndRotatingKeepValidityGenusAndVolume() {
        for (long seed = 200; seed < 206; seed++) {
            LayeredSolid s = new RandomStacks(ctx, seed).stack();
            MeshReport ref = MeshCheck.validate(s.toMesh(ctx));
            assertTrue(ref.isValidSolid(), ref.summary());
            List<Slab> moved = s.slabs().stream()
                    .map(sl -> new Slab(sl.z0Mm() + 1.5, sl.z1Mm() + 1.5, sl.region().translated(7.25, -3.5))).toList();
            MeshReport t = MeshCheck.validate(LayeredSolid.of(ctx, moved).toMesh(ctx));
            assertEquals(ref.triangleCount(), t.triangleCount(), "seed " + seed);
            assertEquals(ref.genusPerShell(), t.genusPerShell(), "seed " + seed);
            assertEquals(ref.signedVolumeMm3(), t.signedVolumeMm3(), 1e-9 * ref.signedVolumeMm3(), "seed " + seed);
            List<Slab> turned = s.slabs().stream().map(sl -> sl.withRegion(sl.region().rotatedDeg(90))).toList();
            MeshReport q = MeshCheck.validate(LayeredSolid.of(ctx, turned).toMesh(ctx));
            assertEquals(ref.signedVolumeMm3(), q.signedVolumeMm3(), 1e-12 * ref.signedVolumeMm3(), "seed " + seed);
            assertEquals(ref.genusPerShell(), q.genusPerShell(), "seed " + seed);
            LayeredSolid odd = LayeredSolid.of(ctx,
                    s.slabs().stream().map(sl -> sl.withRegion(sl.region().rotatedDeg(37))).toList());
            MeshReport o = MeshCheck.validate(odd.toMesh(ctx));
            assertTrue(o.isValidSolid(), "seed " + seed + " " + o.summary());
            assertEquals(odd.noded().volumeMm3(), o.signedVolumeMm3(), 1e-9 * o.signedVolumeMm3());
            // mesh transform by a quarter turn: same volume, still valid
            MeshReport m = MeshCheck.validate(s.toMesh(ctx).transformed(Transform.rotationZDeg(90)
                    .then(Transform.flipOverX()).then(Transform.translation(5, 5, 5))));
            assertTrue(m.isValidSolid());
            assertEquals(ref.signedVolumeMm3(), m.signedVolumeMm3(), 1e-9 * ref.signedVolumeMm3());
        }
    }

    @Test
    void mirroringKeepsTheMeshOutward() {
        Mesh mesh = LayeredSolid.extrusion(Region.slot(ctx, 0, 0, 10, 3, 4), 0, 2).toMesh(ctx);
        MeshReport r = MeshCheck.validate(mesh.transformed(Transform.mirrorZ()));
        assertTrue(r.isValidSolid(), r.summary());
    }

    @Test
    void slicingAStackGivesBackTheSlabAreas() {
        Region a = Region.disc(ctx, 0, 0, 30).minus(Region.boreCircle(ctx, 3, 0, 8));
        Region b = Region.centredRectangle(ctx, 2, 1, 25, 18).minus(Region.slotCut(ctx, -5, -3, 6, 4, 3));
        Region c = Region.annulus(ctx, 1, 1, 27.3, 5).union(Region.disc(ctx, -14, 0, 6));
        LayeredSolid solid = LayeredSolid.builder(ctx).slab(0, 1, a).slab(1, 2.5, b).slab(2.5, 3, c).slab(4, 5, a)
                .build();
        Mesh mesh = solid.toMesh(ctx);
        LayeredSolid noded = solid.noded();
        for (Slab s : noded.slabs()) {
            double z = (s.z0Mm() + s.z1Mm()) / 2;
            Slicer.Section sec = Slicer.section(mesh, z, ctx);
            assertEquals(0, sec.openChains());
            assertEquals(s.region().areaMm2(), sec.region().areaMm2(), 1e-9 * s.region().areaMm2(), "z " + z);
            assertEquals(s.region().partCount(), sec.region().partCount());
        }
        assertTrue(Slicer.section(mesh, 3.5, ctx).region().isEmpty(), "the gap");
        LayeredSolid back = Slicer.slabs(mesh, ctx, 0, 1, 2.5, 3, 4, 5);
        assertEquals(noded.volumeMm3(), back.volumeMm3(), 1e-9 * noded.volumeMm3());
    }

    private LayeredSolid stackOf(Region r) {
        return LayeredSolid.builder(ctx).slab(0, 1, r).slab(1, 2, r.minus(Region.boreCircle(ctx, 6, 3, 3)))
                .slab(2, 2.5, r.intersect(Region.disc(ctx, 6, 3, 10))).build();
    }
}
