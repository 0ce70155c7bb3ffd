package org.shearstack.physics.dyno;

/**
 * Loss torque of a spinning rotor with the air off: T_loss(ω) = c0 + c1·ω + c2·ω² (N·m), a Coulomb
 * (bearing load) term, a viscous term and a quadratic (windage) term.
 *
 * @param constantNm                  c0, N·m
 * @param viscousNmPerRadPerS         c1, N·m·s/rad
 * @param quadraticNmPerRadPerSSquared c2, N·m·s²/rad²
 */
public record LossLaw(double constantNm, double viscousNmPerRadPerS, double quadraticNmPerRadPerSSquared) {
    /** No loss at all. */
    public static final LossLaw NONE = new LossLaw(0, 0, 0);

    public LossLaw {
        if (!Double.isFinite(constantNm) || !Double.isFinite(viscousNmPerRadPerS)
                || !Double.isFinite(quadraticNmPerRadPerSSquared)) {
            throw new IllegalArgumentException("loss coefficients must be finite");
        }
    }

    /** Loss torque in N·m at a speed (rad/s, not negative). */
    public double torqueNm(double speedRadPerS) {
        return constantNm + speedRadPerS * (viscousNmPerRadPerS + speedRadPerS * quadraticNmPerRadPerSSquared);
    }

    /** Loss power in W at a speed. */
    public double powerW(double speedRadPerS) {
        return torqueNm(speedRadPerS) * speedRadPerS;
    }

    /** The coefficients as an array {c0, c1, c2}. */
    public double[] coefficients() {
        return new double[] {constantNm, viscousNmPerRadPerS, quadraticNmPerRadPerSSquared};
    }
}
