package org.shearstack.physics.gas;

/** How the nozzle's exit pressure compares with the back pressure it discharges into. */
public enum Expansion {
    /** Not choked: the exit is subsonic and at the back pressure. */
    SUBSONIC,
    /** Choked and the exit pressure matches the back pressure within one per cent. */
    IDEAL,
    /** Choked, exit pressure above the back pressure: the jet keeps expanding outside in shock cells. */
    UNDER_EXPANDED,
    /** Choked, exit pressure below the back pressure: oblique shocks outside the exit. */
    OVER_EXPANDED,
    /** Converging–diverging nozzle with a normal shock standing inside its diverging part. */
    SHOCK_IN_NOZZLE
}
