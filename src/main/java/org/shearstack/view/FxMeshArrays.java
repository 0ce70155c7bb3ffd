package org.shearstack.view;

/**
 * Flat arrays ready for a JavaFX {@code TriangleMesh} in {@code POINT_NORMAL_TEXCOORD} format, with
 * coordinates relative to an origin (so float precision is spent near the scene, not near 0).
 *
 * @param points              x, y, z per vertex, mm relative to the origin
 * @param normals             unit normal per face corner (3 per kept face)
 * @param texCoords           a single (0, 0) texture coordinate
 * @param faces               per corner: point index, normal index, texture index (9 ints per face)
 * @param droppedDegenerate   triangles left out because they had no area
 */
public record FxMeshArrays(float[] points, float[] normals, float[] texCoords, int[] faces, int droppedDegenerate) {

    public int faceCount() {
        return faces.length / 9;
    }

    public boolean isEmpty() {
        return faces.length == 0;
    }
}
