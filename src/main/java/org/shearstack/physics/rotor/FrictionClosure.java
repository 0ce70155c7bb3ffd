package org.shearstack.physics.rotor;

/**
 * Wall friction of the relative flow in a gap, as a multiplier on the laminar (parabolic-profile) shear 6μV/b.
 * The Fanning factor goes smoothly from the plane-Poiseuille law f = 24/Re to the Blasius (1913) law
 * f = 0.0791·Re^(−1/4), both on the hydraulic diameter 2b, with the Churchill &amp; Usagi (1972, AIChE J. 18:1121)
 * blending f = (f_lam^n + f_turb^n)^(1/n), n = 8 (coefficients from memory). The two laws cross near Re ≈ 2000,
 * the usual end of laminar channel flow.
 */
public enum FrictionClosure {
    /** Laminar shear only (the gap-averaged model as derived; used for the closed-form checks). */
    LAMINAR,
    /** Laminar below, turbulent channel law above, blended smoothly. */
    BLENDED;

    /** Reynolds number on 2b where laminar and Blasius laws cross. */
    public static final double TRANSITION_REYNOLDS = Math.pow(24.0 / 0.0791, 4.0 / 3.0);

    /** f/f_lam at a Reynolds number ρ|V|·2b/μ. */
    public double multiplier(double reynoldsOnTwoGaps) {
        if (this == LAMINAR || !(reynoldsOnTwoGaps > 0)) {
            return 1.0;
        }
        double root = Math.sqrt(reynoldsOnTwoGaps);
        double ratio = 0.0791 * root * Math.sqrt(root) / 24.0; // Re^(3/4)
        if (ratio < 0.05) {
            return 1.0;
        }
        // (1 + ratio^8)^(1/8) with n = 8 written as repeated squares and square roots
        double r2 = ratio * ratio;
        double r4 = r2 * r2;
        return Math.sqrt(Math.sqrt(Math.sqrt(1.0 + r4 * r4)));
    }
}
