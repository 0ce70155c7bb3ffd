package org.shearstack.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.shearstack.geom.Mesh;

/** Our mesh to JavaFX arrays, including meshes made to be awkward. No display needed. */
class MeshAdapterTest {

    private static final double[] ORIGIN = {0, 0, 0};

    @Test
    void boxKeepsSharpEdgesAndIndexesItsOwnPoints() {
        Mesh box = SampleShapes.box(1, 2, 3, 4, 6, 8);
        FxMeshArrays a = MeshAdapter.toArrays(box, new double[] {1, 2, 3}, MeshAdapter.DEFAULT_CREASE_DEGREES);
        assertEquals(12, a.faceCount());
        assertEquals(0, a.droppedDegenerate());
        assertEquals(24, a.points().length);
        assertEquals(0f, a.points()[0]); // (1, 2, 3) minus the origin
        assertEquals(3f, a.points()[18]); // vertex 6 = (4, 6, 8) -> (3, 4, 5)
        // every corner normal of a box is one of the six axis directions (edges are 90 degrees, above the crease)
        for (int i = 0; i < a.normals().length; i += 3) {
            float x = Math.abs(a.normals()[i]);
            float y = Math.abs(a.normals()[i + 1]);
            float z = Math.abs(a.normals()[i + 2]);
            assertEquals(1f, x + y + z, 1e-6f, "normal " + i / 3 + " should be axis-aligned");
        }
        // face 0 is the bottom: its normal points down
        assertEquals(-1f, a.normals()[a.faces()[1] * 3 + 2], 1e-6f);
    }

    @Test
    void faceIndicesPointAtPointsNormalsAndTheOneTexCoord() {
        FxMeshArrays a = MeshAdapter.toArrays(SampleShapes.ring(2, 5, 0, 1, 8), ORIGIN, 35);
        int points = a.points().length / 3;
        int normals = a.normals().length / 3;
        for (int i = 0; i < a.faces().length; i += 3) {
            assertTrue(a.faces()[i] >= 0 && a.faces()[i] < points);
            assertTrue(a.faces()[i + 1] >= 0 && a.faces()[i + 1] < normals);
            assertEquals(0, a.faces()[i + 2]);
        }
        assertEquals(2, a.texCoords().length);
    }

    @Test
    void cylinderSideIsSmoothedAndItsEndsStayFlat() {
        int n = 96;
        Mesh cylinder = SampleShapes.cylinder(10, 0, 5, n);
        FxMeshArrays smooth = MeshAdapter.toArrays(cylinder, ORIGIN, 35);
        double halfStepDegrees = 360.0 / n / 2;
        double worstSide = 0;
        for (int f = 0; f < smooth.faceCount(); f++) {
            for (int c = 0; c < 3; c++) {
                int v = smooth.faces()[9 * f + 3 * c];
                int normal = smooth.faces()[9 * f + 3 * c + 1];
                double nx = smooth.normals()[3 * normal];
                double ny = smooth.normals()[3 * normal + 1];
                double nz = smooth.normals()[3 * normal + 2];
                if (Math.abs(nz) > 0.5) {
                    assertEquals(1.0, Math.abs(nz), 1e-6, "end faces stay flat");
                } else {
                    double radial = Math.atan2(cylinder.y(v), cylinder.x(v));
                    double deviation = Math.toDegrees(Math.abs(Math.atan2(
                            nx * Math.sin(radial) - ny * Math.cos(radial), nx * Math.cos(radial) + ny * Math.sin(radial))));
                    worstSide = Math.max(worstSide, deviation);
                }
            }
        }
        // a flat facet's normal is half a step off the radial direction at its corners; smoothed corners less
        assertTrue(worstSide < 0.75 * halfStepDegrees, "side normals deviate " + worstSide + " deg from radial");
        FxMeshArrays flat = MeshAdapter.toArrays(cylinder, ORIGIN, 0);
        assertTrue(maxSideDeviation(cylinder, flat) > 0.99 * halfStepDegrees, "with no smoothing facets stay flat");
    }

    @Test
    void emptyMeshGivesEmptyArrays() {
        FxMeshArrays a = MeshAdapter.toArrays(Mesh.of(new double[0], new int[0]), ORIGIN, 35);
        assertTrue(a.isEmpty());
        assertEquals(0, a.points().length);
    }

    @Test
    void degenerateTrianglesAreLeftOutAndCounted() {
        double[] xyz = {0, 0, 0, 1, 0, 0, 0, 1, 0, 2, 0, 0};
        int[] tri = {
            0, 1, 2, // fine
            0, 0, 1, // repeated corner
            0, 1, 3, // three points on a line
            1, 1, 1}; // a point
        FxMeshArrays a = MeshAdapter.toArrays(Mesh.of(xyz, tri), ORIGIN, 35);
        assertEquals(1, a.faceCount());
        assertEquals(3, a.droppedDegenerate());
        for (float v : a.normals()) {
            assertTrue(Float.isFinite(v));
        }
        assertEquals(1f, a.normals()[2], 1e-6f);
    }

    @Test
    void farAwayPartIsDrawnRelativeToTheSceneCentre() {
        double far = 1.0e9; // 1000 km away: a float alone would keep only ~64 mm steps there
        Mesh box = new Placement(1, 0, 0, 0, 1, 0, 0, 0, 1, far, far, far).apply(SampleShapes.box(0, 0, 0, 0.1, 0.1, 0.1));
        FxMeshArrays a = MeshAdapter.toArrays(box, new double[] {far, far, far}, 35);
        assertEquals(0.1f, a.points()[3], 1e-6f);
        assertEquals(12, a.faceCount());
    }

    @Test
    void hugeSpreadIsRefusedNamingTheVertex() {
        double[] xyz = {0, 0, 0, 1, 0, 0, 0, 1.0e12, 0};
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> MeshAdapter.toArrays(Mesh.of(xyz, new int[] {0, 1, 2}), ORIGIN, 35));
        assertTrue(e.getMessage().contains("vertex 2 coordinate y"), e.getMessage());
        assertTrue(e.getMessage().contains("1.0E12"), e.getMessage());
    }

    @Test
    void creaseAngleOutsideRangeIsRefused() {
        Mesh box = SampleShapes.box(0, 0, 0, 1, 1, 1);
        assertThrows(IllegalArgumentException.class, () -> MeshAdapter.toArrays(box, ORIGIN, -1));
        assertThrows(IllegalArgumentException.class, () -> MeshAdapter.toArrays(box, ORIGIN, Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> MeshAdapter.toArrays(box, new double[2], 35));
    }

    private static double maxSideDeviation(Mesh cylinder, FxMeshArrays a) {
        double worst = 0;
        for (int f = 0; f < a.faceCount(); f++) {
            for (int c = 0; c < 3; c++) {
                int v = a.faces()[9 * f + 3 * c];
                int normal = a.faces()[9 * f + 3 * c + 1];
                double nx = a.normals()[3 * normal];
                double ny = a.normals()[3 * normal + 1];
                if (Math.abs(a.normals()[3 * normal + 2]) < 0.5) {
                    double radial = Math.atan2(cylinder.y(v), cylinder.x(v));
                    worst = Math.max(worst, Math.toDegrees(Math.abs(Math.atan2(
                            nx * Math.sin(radial) - ny * Math.cos(radial), nx * Math.cos(radial) + ny * Math.sin(radial)))));
                }
            }
        }
        return worst;
    }
}
