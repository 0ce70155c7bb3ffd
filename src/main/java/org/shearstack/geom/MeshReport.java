package org.shearstack.geom;

import java.util.List;

/**
 * The result of {@link MeshCheck#validate(Mesh)}: counts of each defect and the topology of the shells.
 *
 * @param vertexCount            vertices in the mesh
 * @param triangleCount          triangles in the mesh
 * @param openEdges              directed edges without a reverse partner (holes, or a flipped neighbour)
 * @param duplicateEdges         directed edges used by more than one triangle (non-manifold or wrongly wound)
 * @param degenerateTriangles    triangles with a repeated vertex index or zero area
 * @param nonFiniteCoordinates   coordinates that are NaN or infinite
 * @param unusedVertices         vertices used by no triangle
 * @param pinchedVertices        vertices whose triangles form more than one fan (two bodies touching at a
 *                               point, kernel-notes P9): edge-manifold and printable as touching parts, so
 *                               reported but not counted against {@link #isValidSolid()}
 * @param shellCount             edge-connected components
 * @param genusPerShell          genus of each shell from χ = V − E + F = 2 − 2g, or −1 where it is undefined
 * @param volumePerShellMm3      signed volume of each shell (negative for an inward-facing shell, e.g. a void)
 * @param signedVolumeMm3        signed volume of the whole mesh (positive when outward-oriented)
 */
public record MeshReport(int vertexCount, int triangleCount, int openEdges, int duplicateEdges,
        int degenerateTriangles, int nonFiniteCoordinates, int unusedVertices, int pinchedVertices, int shellCount,
        List<Integer> genusPerShell, List<Double> volumePerShellMm3, double signedVolumeMm3) {

    public MeshReport {
        genusPerShell = List.copyOf(genusPerShell);
        volumePerShellMm3 = List.copyOf(volumePerShellMm3);
    }

    /** Closed 2-manifold with each directed edge once and each undirected edge twice (consistently wound). */
    public boolean isClosedManifold() {
        return openEdges == 0 && duplicateEdges == 0 && triangleCount > 0;
    }

    /**
     * A printable solid: closed, consistently oriented 2-manifold, no degenerate triangles, finite
     * coordinates and positive volume.
     */
    public boolean isValidSolid() {
        return isClosedManifold() && degenerateTriangles == 0 && nonFiniteCoordinates == 0 && signedVolumeMm3 > 0;
    }

    /** One line for logs and error messages. */
    public String summary() {
        return String.format(java.util.Locale.ROOT,
                "%d triangles, %d vertices, %d shells, genus %s, open edges %d, duplicate edges %d, "
                        + "degenerate %d, non-finite %d, pinched vertices %d, volume %.6f mm3",
                triangleCount, vertexCount, shellCount, genusPerShell, openEdges, duplicateEdges,
                degenerateTriangles, nonFiniteCoordinates, pinchedVertices, signedVolumeMm3);
    }
}
