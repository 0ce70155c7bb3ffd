package org.shearstack.physics.rotor;

/**
 * Where one map point stands against the validity range of the gap-averaged model.
 *
 * @param gapReynolds          largest ρ|V_rel|·2b/μ of the relative flow in the gaps
 * @param throughFlowReynolds  through-flow Reynolds number ṁ_g/(πr₁μ) at the exhaust radius
 * @param relativeMach         largest relative Mach number in the gaps (at entry, normally)
 * @param marchCompleted       false when the gap march failed (flow choked in the gaps)
 */
public record Validity(double gapReynolds, double throughFlowReynolds, double relativeMach, boolean marchCompleted) {

    /**
     * Laminar limit of plane-channel flow on the hydraulic diameter 2b, about 2000 (from memory, physics.md §3.4);
     * the blended friction closure takes over above it.
     */
    public static final double LAMINAR_REYNOLDS_LIMIT = 2000.0;
    /** Relative Mach number at which the gap entry becomes transonic and the 1-D gap model loses meaning. */
    public static final double RELATIVE_MACH_LIMIT = 1.0;

    public static final Validity NO_FLOW = new Validity(0.0, 0.0, 0.0, true);

    public boolean laminar() {
        return gapReynolds <= LAMINAR_REYNOLDS_LIMIT && throughFlowReynolds <= LAMINAR_REYNOLDS_LIMIT;
    }

    public boolean subsonicRelative() {
        return relativeMach < RELATIVE_MACH_LIMIT;
    }

    /** True when every limit is kept. */
    public boolean inRange() {
        return laminar() && subsonicRelative() && marchCompleted;
    }
}
