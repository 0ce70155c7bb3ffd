package org.shearstack.physics.bearing;

/**
 * Simple friction torque of a rolling bearing: M = μ P d/2 with d the bore (Koyo catalogue, table 4-1:
 * μ = 0.0010–0.0015 for deep-groove ball bearings; RoyMech: 0.0015, start-up up to twice that). At the light
 * loads of a small turbine, seal drag and grease churning dominate; measure them by coast-down.
 */
public final class BearingFriction {

    /** Friction coefficient of a deep-groove ball bearing, upper value of Koyo table 4-1 (and RoyMech). */
    public static final double DEEP_GROOVE_MU = 0.0015;

    private BearingFriction() {
    }

    /** Friction torque in N·mm for a load in N and a bore in mm. */
    public static double torqueNmm(double frictionCoefficient, double loadN, double boreMm) {
        if (!(frictionCoefficient >= 0 && loadN >= 0 && boreMm > 0)) {
            throw new IllegalArgumentException("need μ >= 0, load >= 0 and bore > 0");
        }
        return frictionCoefficient * loadN * boreMm / 2;
    }
}
