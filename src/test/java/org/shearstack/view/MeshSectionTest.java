package org.shearstack.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.shearstack.geom.Mesh;

/**
 * The section cut keeps y &ge; 0 and closes the cut. Reference values are analytic: box volumes, the area
 * of a regular polygon (n/2 r^2 sin(2 pi/n)), and Euler's formula V - E + F = 2 for one closed shell of
 * genus 0.
 */
class MeshSectionTest {

    private static final double VOLUME_TOLERANCE = 1e-9;

    @Test
    void boxAcrossThePlaneKeepsItsPositiveHalfClosed() {
        Mesh box = SampleShapes.box(-2, -3, 0, 4, 5, 10);
        SectionResult r = MeshSection.keepPositiveY(box);
        Mesh cut = r.combined();
        assertEquals("", r.note());
        assertTrue(MeshSection.isClosed(cut), "cut box must be closed");
        assertEquals(6 * 5 * 10, MeshMeasure.signedVolume(cut), VOLUME_TOLERANCE); // 6 x 5 x 10 mm kept
        assertEquals(2, MeshMeasure.eulerCharacteristic(cut));
        assertTrue(r.cap().triangleCount() >= 2, "the cut face needs triangles");
    }

    @Test
    void washerCutThroughItsAxisIsHalfTheWasherAndOneBallLikeShell() {
        int n = 16;
        double ri = 6;
        double ro = 20;
        double h = 3;
        Mesh washer = SampleShapes.ring(ri, ro, 0, h, n);
        double fullVolume = (MeshMeasure.regularPolygonArea(ro, n) - MeshMeasure.regularPolygonArea(ri, n)) * h;
        assertEquals(fullVolume, MeshMeasure.signedVolume(washer), 1e-9 * fullVolume);
        SectionResult r = MeshSection.keepPositiveY(washer);
        Mesh cut = r.combined();
        assertTrue(MeshSection.isClosed(cut));
        // vertices at 0 and 180 degrees lie on the cut plane, so exactly half the polygon area remains
        assertEquals(fullVolume / 2, MeshMeasure.signedVolume(cut), 1e-9 * fullVolume);
        assertEquals(2, MeshMeasure.eulerCharacteristic(cut), "a half washer is one shell of genus 0");
    }

    @Test
    void solidCylinderWithItsCentreVertexOnThePlane() {
        Mesh cylinder = SampleShapes.cylinder(5, -1, 7, 24);
        Mesh cut = MeshSection.keepPositiveY(cylinder).combined();
        assertTrue(MeshSection.isClosed(cut));
        assertEquals(MeshMeasure.regularPolygonArea(5, 24) * 8 / 2, MeshMeasure.signedVolume(cut), VOLUME_TOLERANCE);
    }

    @Test
    void cutThroughSlantedFacesMakesNewSharedVertices() {
        // a box turned 30 degrees about Z: the plane meets edges between vertices, not vertices
        Mesh box = new Placement(Math.cos(Math.PI / 6), -Math.sin(Math.PI / 6), 0,
                Math.sin(Math.PI / 6), Math.cos(Math.PI / 6), 0, 0, 0, 1, 1, 0.5, 0)
                .apply(SampleShapes.box(-4, -4, 0, 4, 4, 2));
        Mesh cut = MeshSection.keepPositiveY(box).combined();
        assertTrue(MeshSection.isClosed(cut));
        double kept = MeshMeasure.signedVolume(cut);
        double removed = MeshMeasure.signedVolume(mirrorY(MeshSection.keepPositiveY(mirrorY(box)).combined()));
        // the two halves make up the whole box: 8 x 8 x 2 mm
        assertEquals(128, kept + removed, 1e-9);
        assertTrue(kept > 64, "the box is shifted towards +y, so more than half stays, found " + kept);
    }

    @Test
    void startingCornerOfEachTriangleDoesNotChangeTheResult() {
        Mesh washer = SampleShapes.ring(3, 9, 0, 2, 12);
        int[] tri = washer.triangleArray();
        for (int t = 0; t < tri.length; t += 3) {
            int a = tri[t];
            tri[t] = tri[t + 1];
            tri[t + 1] = tri[t + 2];
            tri[t + 2] = a;
        }
        Mesh rotated = Mesh.of(washer.vertexArray(), tri);
        assertEquals(MeshMeasure.signedVolume(MeshSection.keepPositiveY(washer).combined()),
                MeshMeasure.signedVolume(MeshSection.keepPositiveY(rotated).combined()), VOLUME_TOLERANCE);
    }

    @Test
    void meshesOnOneSideAreKeptWholeOrDropped() {
        Mesh front = SampleShapes.box(0, 1, 0, 2, 3, 2);
        SectionResult kept = MeshSection.keepPositiveY(front);
        assertEquals(8.0, MeshMeasure.signedVolume(kept.combined()), VOLUME_TOLERANCE);
        assertEquals(0, kept.cap().triangleCount());
        Mesh behind = SampleShapes.box(0, -3, 0, 2, -1, 2);
        assertEquals(0, MeshSection.keepPositiveY(behind).body().triangleCount());
        Mesh touching = SampleShapes.box(0, 0, 0, 2, 2, 2); // one face in the plane
        Mesh t = MeshSection.keepPositiveY(touching).combined();
        assertTrue(MeshSection.isClosed(t));
        assertEquals(8.0, MeshMeasure.signedVolume(t), VOLUME_TOLERANCE);
    }

    @Test
    void openMeshIsCutButItsSectionSaysTheFaceIsMissing() {
        Mesh box = SampleShapes.box(-1, -1, 0, 1, 1, 1);
        int[] tri = box.triangleArray();
        int[] open = java.util.Arrays.copyOf(tri, tri.length - 6); // drop the -x face
        SectionResult r = MeshSection.keepPositiveY(Mesh.of(box.vertexArray(), open));
        assertTrue(r.note().contains("not closed"), r.note());
        assertEquals(0, r.cap().triangleCount());
        assertTrue(r.body().triangleCount() > 0);
    }

    @Test
    void twoDiscsInOneMeshGiveTwoClosedHalves() {
        Mesh pack = SampleShapes.join(SampleShapes.ring(2, 10, 0, 1, 32), SampleShapes.ring(2, 10, 3, 4, 32));
        Mesh cut = MeshSection.keepPositiveY(pack).combined();
        assertTrue(MeshSection.isClosed(cut));
        assertEquals(4, MeshMeasure.eulerCharacteristic(cut), "two genus-0 shells");
    }

    private static Mesh mirrorY(Mesh m) {
        return new Placement(1, 0, 0, 0, -1, 0, 0, 0, 1, 0, 0, 0).apply(m);
    }
}
