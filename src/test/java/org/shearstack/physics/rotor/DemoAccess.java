package org.shearstack.physics.rotor;

/** Lets tests in other packages use the invented demo design. */
public final class DemoAccess {
    private DemoAccess() {
    }

    public static TurbineModel demo() {
        return DemoDesigns.demo();
    }
}
