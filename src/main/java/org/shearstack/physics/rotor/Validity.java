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
    /**
     * Upper end of the blended friction closure: Blasius's smooth-channel law f = 0.0791·Re^(−1/4) is fitted up to
     * Re ≈ 10⁵ (from memory; Blasius 1913). Beyond the laminar limit the model runs on that closure, so a point is
     * outside the model's validity only beyond this number, not beyond 2000 (physics.md §12.5).
     */
    public static final double BLENDED_REYNOLDS_LIMIT = 1.0e5;

    public static final Validity NO_FLOW = new Validity(0.0, 0.0, 0.0, true);

    public boolean laminar() {
        return gapReynolds <= LAMINAR_REYNOLDS_LIMIT && throughFlowReynolds <= LAMINAR_REYNOLDS_LIMIT;
    }

    public boolean subsonicRelative() {
        return relativeMach < RELATIVE_MACH_LIMIT;
    }

    /**
     * True when the point lies inside the range of the model as it runs (blended laminar–turbulent closure):
     * Reynolds numbers up to {@link #BLENDED_REYNOLDS_LIMIT}, subsonic relative flow, a completed march.
     * Turbulent gap flow alone is not outside it; {@link #laminar()} tells that apart.
     */
    public boolean inRange() {
        return gapReynolds <= BLENDED_REYNOLDS_LIMIT && throughFlowReynolds <= BLENDED_REYNOLDS_LIMIT
                && subsonicRelative() && marchCompleted;
    }

    /** True when the point also keeps the laminar limit the closed-form model was derived for. */
    public boolean inLaminarRange() {
        return laminar() && inRange();
    }
}
