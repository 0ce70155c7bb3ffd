package org.shearstack.check.safety;

/**
 * An upper bound on runaway speed without any losses (physics.md §12.8): near no load the gap flow locks to
 * the discs and the pack works as a centrifugal pump against the supply. With the flow locked (no relative
 * velocity) rothalpy h − U²/2 is constant from rim to exhaust, so an isentropic expansion from the supply
 * stagnation state (p₀, T₀) at the rim to the exhaust pressure p_e at r₁ gives
 * Ω² (r₂² − r₁²) = 2 c_p T₀ [1 − (p_e/p₀)^((γ−1)/γ)], the square of the isentropic spouting velocity.
 * Derived for this project; no published value. It ignores every loss, so real rotors run slower; it can
 * only err on the safe side. It does not respond to throat area or load torque.
 *
 * @param rimRadiusM      disc outer radius r₂ at diameter scale 1
 * @param exhaustRadiusM  exhaust radius r₁ at diameter scale 1
 * @param supplyTemperatureK supply stagnation temperature
 * @param exhaustPressurePa  exhaust (ambient) pressure, absolute
 */
public record LockedFlowBound(double rimRadiusM, double exhaustRadiusM, double supplyTemperatureK,
        double exhaustPressurePa) implements RunawayModel {

    /** Air, γ = 1.4, R = 287.05 J/(kg K) (physics.md §0). */
    static final double GAMMA = 1.4;
    static final double CP = GAMMA * 287.05 / (GAMMA - 1);

    public LockedFlowBound {
        if (!(rimRadiusM > exhaustRadiusM && exhaustRadiusM >= 0)) {
            throw new IllegalArgumentException("need 0 <= exhaust radius < rim radius, found " + exhaustRadiusM
                    + " m and " + rimRadiusM + " m");
        }
    }

    @Override
    public double runawayRadPerS(Variant v) {
        if (v.supplyPressurePa() <= exhaustPressurePa) {
            return 0;
        }
        double vs2 = 2 * CP * supplyTemperatureK
                * (1 - Math.pow(exhaustPressurePa / v.supplyPressurePa(), (GAMMA - 1) / GAMMA));
        double r2 = rimRadiusM * v.diameterScale();
        double r1 = exhaustRadiusM * v.diameterScale();
        return Math.sqrt(vs2 / (r2 * r2 - r1 * r1));
    }

    @Override
    public String description() {
        return "locked-flow bound without losses (physics.md §12.8; an upper bound)";
    }
}
