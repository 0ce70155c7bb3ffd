package org.shearstack.view;

import org.shearstack.geom.Mesh;

/** Exact measures of closed meshes for tests. */
final class MeshMeasure {

    private MeshMeasure() {
    }

    /** Signed volume by the divergence theorem: sum of a . (b x c) / 6 over triangles. */
    static double signedVolume(Mesh m) {
        double sum = 0;
        for (int t = 0; t < m.triangleCount(); t++) {
            int a = m.corner(t, 0);
            int b = m.corner(t, 1);
            int c = m.corner(t, 2);
            double cx = m.y(b) * m.z(c) - m.z(b) * m.y(c);
            double cy = m.z(b) * m.x(c) - m.x(b) * m.z(c);
            double cz = m.x(b) * m.y(c) - m.y(b) * m.x(c);
            sum += m.x(a) * cx + m.y(a) * cy + m.z(a) * cz;
        }
        return sum / 6;
    }

    /** V - E + F over the vertices used by triangles (2 for one closed shell of genus 0). */
    static int eulerCharacteristic(Mesh m) {
        java.util.Set<Integer> used = new java.util.HashSet<>();
        java.util.Set<Long> edges = new java.util.HashSet<>();
        long n = m.vertexCount();
        for (int t = 0; t < m.triangleCount(); t++) {
            for (int c = 0; c < 3; c++) {
                int a = m.corner(t, c);
                int b = m.corner(t, (c + 1) % 3);
                used.add(a);
                edges.add(Math.min(a, b) * n + Math.max(a, b));
            }
        }
        return used.size() - edges.size() + m.triangleCount();
    }

    /** Area of a regular n-gon with circumradius r: n/2 r^2 sin(2 pi / n) (elementary geometry). */
    static double regularPolygonArea(double circumradius, int n) {
        return n / 2.0 * circumradius * circumradius * Math.sin(2 * Math.PI / n);
    }
}
