package org.shearstack.view;

/**
 * Where the camera is, as an orbit around a target, in display coordinates (x right, y down, z away from
 * the viewer at yaw = pitch = 0; mm). The camera sits {@code distanceMm} from the target after turning by
 * yaw about the vertical axis, then by pitch about the camera's horizontal axis.
 */
public record Orbit(double yawDegrees, double pitchDegrees, double distanceMm,
        double targetX, double targetY, double targetZ) {

    /** Vertical field of view of the viewer's perspective camera. */
    public static final double FIELD_OF_VIEW_DEGREES = 30;

    /** The starting view: a little from the left and from above, so the cut face and the stack both show. */
    public static Orbit initial() {
        return new Orbit(-28, -22, 400, 0, 0, 0);
    }

    public Orbit orbitBy(double yawDeltaDegrees, double pitchDeltaDegrees) {
        double pitch = Math.max(-89, Math.min(89, pitchDegrees + pitchDeltaDegrees));
        return new Orbit(yawDegrees + yawDeltaDegrees, pitch, distanceMm, targetX, targetY, targetZ);
    }

    public Orbit zoomBy(double factor) {
        double d = Math.max(1e-3, Math.min(1e7, distanceMm * factor));
        return new Orbit(yawDegrees, pitchDegrees, d, targetX, targetY, targetZ);
    }

    /** Moves the target with the mouse: a drag of (dx, dy) pixels drags the model along. */
    public Orbit panByPixels(double dxPx, double dyPx, double viewportHeightPx) {
        double mmPerPx = 2 * distanceMm * Math.tan(Math.toRadians(FIELD_OF_VIEW_DEGREES / 2)) / viewportHeightPx;
        double[] right = toWorld(1, 0, 0);
        double[] down = toWorld(0, 1, 0);
        double sx = -dxPx * mmPerPx;
        double sy = -dyPx * mmPerPx;
        return new Orbit(yawDegrees, pitchDegrees, distanceMm,
                targetX + sx * right[0] + sy * down[0],
                targetY + sx * right[1] + sy * down[1],
                targetZ + sx * right[2] + sy * down[2]);
    }

    /**
     * The same viewing direction, aimed at the box's centre and just far enough away that the whole box
     * is inside the picture with a small margin.
     *
     * @param aspect picture width / height
     */
    public Orbit fitting(Box3 box, double aspect) {
        Box3 b = box.isEmpty() ? new Box3(-50, -50, -50, 50, 50, 50) : box;
        double[] c = b.centre();
        double tanV = Math.tan(Math.toRadians(FIELD_OF_VIEW_DEGREES / 2));
        double tanH = tanV * aspect;
        double distance = 0;
        double pad = Math.max(b.diagonal(), 1e-3) * 0.03;
        for (double[] corner : b.corners()) {
            double[] p = toCamera(corner[0] - c[0], corner[1] - c[1], corner[2] - c[2]);
            double ax = Math.abs(p[0]) + pad;
            double ay = Math.abs(p[1]) + pad;
            distance = Math.max(distance, Math.max(ax / tanH, ay / tanV) - p[2]);
        }
        return new Orbit(yawDegrees, pitchDegrees, Math.max(distance, 1e-3), c[0], c[1], c[2]);
    }

    /** A direction from camera axes into display axes: Ry(yaw) Rx(pitch) v. */
    double[] toWorld(double x, double y, double z) {
        double[] p = rotateX(x, y, z, pitchDegrees);
        return rotateY(p[0], p[1], p[2], yawDegrees);
    }

    /** A display-axes vector into camera axes: Rx(-pitch) Ry(-yaw) v. */
    double[] toCamera(double x, double y, double z) {
        double[] p = rotateY(x, y, z, -yawDegrees);
        return rotateX(p[0], p[1], p[2], -pitchDegrees);
    }

    private static double[] rotateY(double x, double y, double z, double degrees) {
        double a = Math.toRadians(degrees);
        double cos = Math.cos(a);
        double sin = Math.sin(a);
        return new double[] {x * cos + z * sin, y, -x * sin + z * cos};
    }

    private static double[] rotateX(double x, double y, double z, double degrees) {
        double a = Math.toRadians(degrees);
        double cos = Math.cos(a);
        double sin = Math.sin(a);
        return new double[] {x, y * cos - z * sin, y * sin + z * cos};
    }
}
