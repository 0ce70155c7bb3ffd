package org.shearstack.physics.gas;

/** The two nozzle shapes the tool designs. */
public enum NozzleKind {
    /** Converging only: the jet is at most sonic at the exit; any further expansion happens outside. */
    CONVERGING,
    /** Converging–diverging (de Laval): supersonic exit at the design pressure ratio. */
    CONVERGING_DIVERGING
}
