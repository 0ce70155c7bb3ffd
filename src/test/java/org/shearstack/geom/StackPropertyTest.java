package org.shearstack.geom;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Property tests over seeded random stacks (DESIGN §2): every mesh is a valid closed, outward solid, and its
 * volume equals Σ area × height of the noded slabs (exact prisms, kernel-notes P1) to 1e-9 relative, and
 * the input slabs' Σ area × height within the noding bound Σ perimeter × height × grid.
 */
class StackPropertyTest {

    private static final int CASES = 80;
    private final GeometryContext ctx = GeometryContext.standard();

    @Test
    void randomStacksGiveValidSolidsWithTheLayeredVolume() {
        for (long seed = 1; seed <= CASES; seed++) {
            LayeredSolid solid = new RandomStacks(ctx, seed).stack();
            LayeredSolid noded = solid.noded();
            StackMesher.Result built = StackMesher.build(noded, true);
            MeshReport r = MeshCheck.validate(built.mesh());
            String where = "seed " + seed + ": " + solid + ": " + r.summary();
            assertTrue(r.isValidSolid(), where);
            assertEquals(0, r.unusedVertices(), where);
            double layered = noded.volumeMm3();
            assertEquals(layered, r.signedVolumeMm3(), Math.abs(layered) * 1e-9, where + " (noded layered volume)");
            assertEquals(0, built.wallSplits(), where + " (a fully noded stack needs no wall splits)");
            double bound = 0;
            for (Slab s : solid.slabs()) {
                bound += s.region().perimeterMm() * s.heightMm() * ctx.gridMm();
            }
            assertEquals(solid.volumeMm3(), r.signedVolumeMm3(), bound, where + " (input layered volume)");
        }
    }
}
