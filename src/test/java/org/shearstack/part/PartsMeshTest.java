package org.shearstack.part;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.shearstack.assembly.Layout;
import org.shearstack.assembly.PartDef;
import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Mesh;
import org.shearstack.geom.MeshCheck;
import org.shearstack.geom.MeshReport;
import org.shearstack.rules.geometry.TestDesigns;

class PartsMeshTest {

    /** The demo's chord tolerance: these tests are about closed, valid solids, not about faceting. */
    static final GeometryContext CTX = GeometryContext.withChordTolerance(0.05);
    /** Coarser faceting for the large and random designs: fewer facets, same topology. */
    static final GeometryContext COARSE = GeometryContext.withChordTolerance(0.4);

    static void checkAll(DesignValues v) {
        checkAll(v, CTX);
    }

    static void checkAll(DesignValues v, GeometryContext ctx) {
        Dims d = Dims.of(v);
        for (PartDef p : Layout.parts(d)) {
            LayeredSolid s = p.recipe().build(d, ctx);
            Mesh m = s.toMesh(ctx);
            MeshReport r = MeshCheck.validate(m);
            assertTrue(r.isValidSolid(), p.name() + ": " + r.summary());
            assertEquals(1, r.shellCount(), p.name() + ": " + r.summary());
            assertEquals(List.of(p.expectedGenus()), r.genusPerShell(), p.name() + ": " + r.summary());
            // the layered invariant: mesh volume = Σ slab area × height, up to the noding shift of boundary
            // vertices by at most one grid cell (kernel-notes.md P1): bound Σ perimeter × height × grid
            double bound = 0;
            for (var slab : s.slabs()) {
                bound += slab.region().perimeterMm() * (slab.z1Mm() - slab.z0Mm()) * ctx.gridMm();
            }
            assertEquals(s.volumeMm3(), r.signedVolumeMm3(), bound, p.name());
        }
    }

    @Test
    void demoParts() {
        checkAll(TestDesigns.demo());
    }

    @Test
    void smallestParts() {
        checkAll(TestDesigns.smallest());
    }

    @Test
    void largestParts() {
        checkAll(TestDesigns.largest(), COARSE);
    }

    @Test
    void randomParts() {
        for (long seed = 1; seed <= 1; seed++) {
            checkAll(TestDesigns.random(seed), COARSE);
        }
    }

    /** The larger sweep: many random designs at the demo's faceting (a benchmark-sized run, not in the default suite). */
    @Test
    @Tag("bench")
    void manyRandomParts() {
        for (long seed = 1; seed <= 40; seed++) {
            checkAll(TestDesigns.random(seed));
        }
    }
}
