package org.shearstack.physics.rotor;

import static org.shearstack.physics.rotor.GapFlowClosedForm.ENERGY_FACTOR;
import static org.shearstack.physics.rotor.GapFlowClosedForm.KAPPA;

/**
 * Right-hand side of the gap-averaged equations (physics.md §3.2, §3.6), radius as the independent variable:
 * tangential κ(dW/dr + W/r) + 2Ω = λ_eff r W, radial dp/dr = ρ[Ω²r + 2ΩW + κW²/r − κU dU/dr − 12νU·φ/b²],
 * continuity U = −ṁ_g/(2πρbr), and in compressible mode constant rothalpy
 * I = c_pT + ½(54/35)(U² + W²) − ½Ω²r² for the temperature. φ is the friction-closure multiplier.
 * One instance serves one march; it keeps the last temperature as the next guess and the validity maxima.
 */
final class GapEquations {

    private final GapFluid fluid;
    private final FrictionClosure closure;
    private final double gap;
    private final double massFlow;
    private final double omega;
    private final double rothalpy;
    private final double cp;
    private final double gasR;
    private double temperatureGuess;
    private double maxReynolds;
    private double maxMach;

    // results of the last evaluate()
    double density;
    double lambda;
    double dWdr;
    double dpdr;
    double temperature;
    boolean valid;

    GapEquations(GapFluid fluid, FrictionClosure closure, double gapM, GapInlet inlet, double outerRadiusM) {
        this.fluid = fluid;
        this.closure = closure;
        this.gap = gapM;
        this.massFlow = inlet.massFlowPerGapKgPerS();
        this.omega = inlet.speedRadPerS();
        this.cp = fluid.gas().cpJPerKgK();
        this.gasR = fluid.gas().gasConstantJPerKgK();
        double vThetaIn = omega * outerRadiusM + KAPPA * inlet.inletRelativeSwirlMPerS();
        // Euler form of the rothalpy: I = c_p T₀ − Ω r₂ V_θ,in (adiabatic entry from the stagnation state).
        this.rothalpy = cp * inlet.stagnationTemperatureK() - omega * outerRadiusM * vThetaIn;
        this.temperatureGuess = inlet.stagnationTemperatureK();
    }

    double maxReynolds() {
        return maxReynolds;
    }

    double maxMach() {
        return maxMach;
    }

    /** Static temperature at (r, W, p) from the rothalpy, a few fixed-point passes for the density in U. */
    double temperatureAt(double r, double w, double p) {
        if (!fluid.compressible()) {
            return Double.NaN;
        }
        double t = temperatureGuess;
        for (int i = 0; i < 3; i++) {
            double rho = p / (gasR * t);
            double u = radialVelocity(rho, r);
            t = (rothalpy + 0.5 * omega * omega * r * r - 0.5 * ENERGY_FACTOR * (u * u + w * w)) / cp;
            if (!(t > 0)) {
                return Double.NaN;
            }
        }
        temperatureGuess = t;
        return t;
    }

    private double radialVelocity(double rho, double r) {
        return -massFlow / (2.0 * Math.PI * rho * gap * r);
    }

    /** Evaluates the derivatives at radius r for state (W, p); sets the public fields. */
    void evaluate(double r, double w, double p) {
        boolean comp = fluid.compressible();
        double t = comp ? temperatureAt(r, w, p) : Double.NaN;
        if (comp && !(t > 0) || !(p > 0)) {
            valid = false;
            return;
        }
        double rho = comp ? p / (gasR * t) : fluid.densityKgPerM3();
        double mu = comp ? fluid.gas().viscosityPaS(t) : fluid.viscosityPaS();
        double u = radialVelocity(rho, r);
        double vRel = Math.sqrt(u * u + w * w);
        double re = rho * vRel * 2.0 * gap / mu;
        double phi = closure.multiplier(re);
        double lam = 24.0 * Math.PI * mu * phi / (gap * massFlow);
        double dW = (lam * r * w - 2.0 * omega) / KAPPA - w / r;
        double friction = -12.0 * (mu / rho) * u * phi / (gap * gap);
        double a = omega * omega * r + 2.0 * omega * w + KAPPA * w * w / r + friction;
        double q = u * u;
        double dp;
        if (comp) {
            double rt = gasR * t;
            double cpt = cp * t;
            double den = 1.0 - KAPPA * q / rt + ENERGY_FACTOR * q / cpt;
            if (den < 0.05) {
                valid = false;
                return;
            }
            double num = (a + KAPPA * q / r) / rt - (omega * omega * r - ENERGY_FACTOR * w * dW + ENERGY_FACTOR * q / r) / cpt;
            double x = num / den;
            dp = p * (a + KAPPA * q / r + KAPPA * q * x) / rt;
            maxMach = Math.max(maxMach, vRel / Math.sqrt(fluid.gas().gamma() * rt));
        } else {
            dp = rho * (a + KAPPA * q / r);
        }
        maxReynolds = Math.max(maxReynolds, re);
        density = rho;
        lambda = lam;
        dWdr = dW;
        dpdr = dp;
        temperature = t;
        valid = true;
    }
}
