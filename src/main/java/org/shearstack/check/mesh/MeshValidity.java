package org.shearstack.check.mesh;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.geom.MeshReport;

/**
 * Findings on whether a mesh is a printable solid (DESIGN.md §5: closed 2-manifold, each directed edge once and
 * each undirected edge twice, no degenerate triangles, finite coordinates, positive volume):
 * <ul>
 *   <li>MESH-OPEN (fail): edges with no neighbour across them, the surface has holes;</li>
 *   <li>MESH-ORIENTATION (fail): directed edges used twice (a triangle wound against its neighbours, or more
 *       than two triangles on one edge), or a negative enclosed volume (inside out);</li>
 *   <li>MESH-NONFINITE (fail): NaN or infinite coordinates;</li>
 *   <li>MESH-DEGENERATE (caution): triangles of zero area, which slicers drop but which hint at a bad export;</li>
 *   <li>MESH-PINCHED (caution): vertices where two bodies touch at a point;</li>
 *   <li>MESH-VALID (ok): the solid's shells, genus and volume, when none of the failures above apply.</li>
 * </ul>
 */
public final class MeshValidity {

    private MeshValidity() {
    }

    public static List<Finding> findings(String object, MeshReport r) {
        List<Finding> out = new ArrayList<>();
        if (r.triangleCount() == 0) {
            out.add(fail("MESH-OPEN", "The mesh has no triangles.", 0, "triangles", object, "re-export the object"));
            return out;
        }
        if (r.nonFiniteCoordinates() > 0) {
            out.add(fail("MESH-NONFINITE", r.nonFiniteCoordinates() + " coordinates are not finite numbers.",
                    r.nonFiniteCoordinates(), "coordinates", object, "re-export the object from its CAD program"));
        }
        if (r.openEdges() > 0) {
            out.add(fail("MESH-OPEN", r.openEdges() + " edges have no triangle across them: the surface has holes"
                    + " and does not enclose a solid.", r.openEdges(), "edges", object,
                    "close the holes (repair the mesh) and export again"));
        }
        if (r.duplicateEdges() > 0) {
            out.add(fail("MESH-ORIENTATION", r.duplicateEdges() + " directed edges are used twice: triangles are"
                    + " wound against their neighbours, or more than two triangles share an edge.", r.duplicateEdges(),
                    "edges", object, "make the normals consistent (repair the mesh) and split touching bodies"));
        } else if (r.isClosedManifold() && !(r.signedVolumeMm3() > 0)) {
            out.add(fail("MESH-ORIENTATION", "The enclosed volume is " + Findings.num(r.signedVolumeMm3(), 4)
                    + " mm³: the mesh is inside out (normals point inward).", r.signedVolumeMm3(), "mm3",
                    object, "flip the normals"));
        }
        if (r.degenerateTriangles() > 0) {
            out.add(Findings.of("MESH-DEGENERATE", Severity.CAUTION, r.degenerateTriangles()
                    + " triangles have zero area (repeated or collinear corners).", r.degenerateTriangles(), 0, "triangles",
                    Double.NaN, object, "triangles", "remove them (most slicers do) or export again"));
        }
        if (r.pinchedVertices() > 0) {
            out.add(Findings.of("MESH-PINCHED", Severity.CAUTION, r.pinchedVertices()
                    + " vertices join bodies that touch at a single point; they print as separate bodies joined by"
                    + " nothing.", r.pinchedVertices(), 0, "vertices", Double.NaN, object, "vertices",
                    "separate the bodies or join them with real material"));
        }
        if (out.stream().noneMatch(f -> f.severity() == Severity.FAIL)) {
            out.add(Findings.of("MESH-VALID", Severity.OK, "Closed, consistently oriented solid: " + r.shellCount()
                    + (r.shellCount() == 1 ? " shell" : " shells") + ", genus " + r.genusPerShell() + ", volume "
                    + Findings.num(r.signedVolumeMm3(), 6) + " mm³, " + r.triangleCount() + " triangles.",
                    r.signedVolumeMm3(), Double.NaN, "mm3", Double.NaN, object, "mesh", ""));
        }
        return out;
    }

    /** True when the mesh can be sliced meaningfully (no hole, no orientation fault, finite). */
    public static boolean sliceable(MeshReport r) {
        return r.isClosedManifold() && r.nonFiniteCoordinates() == 0 && r.signedVolumeMm3() > 0;
    }

    private static Finding fail(String code, String message, double count, String unit, String object, String remedy) {
        return Findings.of(code, Severity.FAIL, message, count, 0, unit, Double.NaN, object, "mesh", remedy);
    }
}
