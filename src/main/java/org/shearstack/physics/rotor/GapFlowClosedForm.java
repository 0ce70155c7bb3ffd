package org.shearstack.physics.rotor;

/**
 * The closed-form solution of the gap-averaged laminar flow between two co-rotating discs at constant density
 * (physics.md §3.2–§3.4, our derivation at the level of approximation of the published integral models).
 * Parabolic profiles across the gap for the radial velocity and for the swirl relative to the discs; κ = 6/5 is
 * the momentum-flux factor of the parabolic profile, 54/35 its kinetic-energy factor.
 */
public final class GapFlowClosedForm {

    /** Momentum-flux profile factor ⟨(3/2 f)²⟩ of the parabolic profile. */
    public static final double KAPPA = 6.0 / 5.0;
    /** Kinetic-energy profile factor ⟨(3/2 f)³⟩ of the parabolic profile. */
    public static final double ENERGY_FACTOR = 54.0 / 35.0;

    private GapFlowClosedForm() {
    }

    /** Slip-decay constant λ = 24πμ/(b ṁ_g), 1/m². */
    public static double lambdaPerM2(double viscosityPaS, double gapM, double massFlowPerGapKgPerS) {
        return 24.0 * Math.PI * viscosityPaS / (gapM * massFlowPerGapKgPerS);
    }

    /** Slip-decay number Λ = λ(r₂² − r₁²)/(2κ). */
    public static double slipDecayNumber(double lambdaPerM2, double outerRadiusM, double exhaustRadiusM) {
        return lambdaPerM2 * (outerRadiusM * outerRadiusM - exhaustRadiusM * exhaustRadiusM) / (2.0 * KAPPA);
    }

    /**
     * Gap-mean relative swirl W(r) = 2Ω/(λr) + (r₂/r)(W₂ − 2Ω/(λr₂))·exp(−λ(r₂² − r²)/(2κ)), written with expm1
     * so that the inviscid limit λ → 0 is exact: r W = r₂W₂ + Ω(r₂² − r²)/κ.
     */
    public static double relativeSwirlMPerS(double lambdaPerM2, double speedRadPerS, double outerRadiusM,
            double inletRelativeSwirlMPerS, double radiusM) {
        return advance(lambdaPerM2, speedRadPerS, outerRadiusM, inletRelativeSwirlMPerS, radiusM);
    }

    /** Exact step of the tangential equation from (r_a, W_a) to r_b with λ frozen. */
    static double advance(double lambda, double omega, double ra, double wa, double rb) {
        double x = -lambda * (ra * ra - rb * rb) / (2.0 * KAPPA);
        double e = Math.exp(x);
        double growth;
        if (lambda * Math.abs(ra * ra - rb * rb) < 1e-300) {
            growth = omega * (ra * ra - rb * rb) / KAPPA;
        } else {
            growth = -2.0 * omega / lambda * Math.expm1(x);
        }
        return (ra * wa * e + growth) / rb;
    }

    /** Euler torque of one gap T_g = ṁ_g [r₂(Ωr₂ + κW₂) − r₁(Ωr₁ + κW₁)]. */
    public static double torquePerGapNm(double massFlowPerGapKgPerS, double speedRadPerS, double outerRadiusM,
            double inletRelativeSwirlMPerS, double exhaustRadiusM, double outletRelativeSwirlMPerS) {
        return massFlowPerGapKgPerS * (outerRadiusM * (speedRadPerS * outerRadiusM + KAPPA * inletRelativeSwirlMPerS)
                - exhaustRadiusM * (speedRadPerS * exhaustRadiusM + KAPPA * outletRelativeSwirlMPerS));
    }

    /** Entry condition conserving the angular-momentum flux of a flat jet: W₂ = (V_θ,in − Ωr₂)/κ. */
    public static double inletRelativeSwirlMPerS(double inletSwirlVelocityMPerS, double speedRadPerS,
            double outerRadiusM) {
        return (inletSwirlVelocityMPerS - speedRadPerS * outerRadiusM) / KAPPA;
    }

    /** Exit residual-slip ratio W∞(r₁)/(Ωr₁) = b ṁ_g/(12πμr₁²). */
    public static double residualSlipRatio(double viscosityPaS, double gapM, double massFlowPerGapKgPerS,
            double exhaustRadiusM) {
        return gapM * massFlowPerGapKgPerS / (12.0 * Math.PI * viscosityPaS * exhaustRadiusM * exhaustRadiusM);
    }

    /**
     * Mass-averaged absolute kinetic energy with the parabolic profiles,
     * ½[(54/35)U² + Ω²r² + (12/5)ΩrW + (54/35)W²], J/kg.
     */
    public static double kineticEnergyJPerKg(double radialVelocityMPerS, double speedRadPerS, double radiusM,
            double relativeSwirlMPerS) {
        double u = radialVelocityMPerS;
        double w = relativeSwirlMPerS;
        double wr = speedRadPerS * radiusM;
        return 0.5 * (ENERGY_FACTOR * u * u + wr * wr + 2.0 * KAPPA * wr * w + ENERGY_FACTOR * w * w);
    }

    /** Ekman (rotating boundary-layer) thickness δ_E = √(ν/Ω). */
    public static double ekmanThicknessM(double kinematicViscosityM2PerS, double speedRadPerS) {
        return Math.sqrt(kinematicViscosityM2PerS / speedRadPerS);
    }
}
