package org.shearstack.physics.rotor;

import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;

/**
 * Marches one gap from the disc rim r₂ inwards to the exhaust radius r₁ (physics.md §3.6).
 *
 * <p>Two integrators share one right-hand side ({@link GapEquations}):
 * <ul>
 * <li>{@link Integration#EXPONENTIAL}: fixed steps, clustered at the rim, where the swirl is advanced by the exact
 * solution of the tangential equation with λ frozen over the step (stable however stiff the slip decay is, exact
 * for laminar constant-property flow) and the pressure by Simpson's rule. Fast; used for maps.</li>
 * <li>{@link Integration#ADAPTIVE}: the Hipparchus Dormand–Prince 8(5,3) integrator with tight tolerances, the
 * reference the fast scheme is tested against.</li>
 * </ul>
 */
public final class GapMarch {

    /** Which integrator to use. */
    public enum Integration {
        EXPONENTIAL,
        ADAPTIVE
    }

    /** Default number of steps of the exponential scheme. */
    public static final int DEFAULT_STEPS = 40;

    private GapMarch() {
    }

    public static GapSolution march(GapFluid fluid, FrictionClosure closure, double gapM, double outerRadiusM,
            double exhaustRadiusM, GapInlet inlet, Integration integration, int steps) {
        GapEquations eq = new GapEquations(fluid, closure, gapM, inlet, outerRadiusM);
        return integration == Integration.ADAPTIVE
                ? adaptive(eq, outerRadiusM, exhaustRadiusM, inlet)
                : exponential(eq, outerRadiusM, exhaustRadiusM, inlet, steps);
    }

    private static GapSolution exponential(GapEquations eq, double r2, double r1, GapInlet inlet, int steps) {
        double w = inlet.inletRelativeSwirlMPerS();
        double p = inlet.inletPressurePa();
        double omega = inlet.speedRadPerS();
        double ra = r2;
        for (int i = 1; i <= steps; i++) {
            double s = (double) i / steps;
            double rb = r2 - (r2 - r1) * s * Math.sqrt(s);
            double h = rb - ra;
            double rm = 0.5 * (ra + rb);
            eq.evaluate(ra, w, p);
            if (!eq.valid) {
                return GapSolution.failed(eq.maxReynolds(), eq.maxMach());
            }
            double lamA = eq.lambda;
            double dpA = eq.dpdr;
            double wm = GapFlowClosedForm.advance(lamA, omega, ra, w, rm);
            double pm = p + 0.5 * h * dpA;
            eq.evaluate(rm, wm, pm);
            if (!eq.valid) {
                return GapSolution.failed(eq.maxReynolds(), eq.maxMach());
            }
            double lamM = eq.lambda;
            double dpM = eq.dpdr;
            double wb = GapFlowClosedForm.advance(lamM, omega, ra, w, rb);
            double pb = p + h * dpM;
            eq.evaluate(rb, wb, pb);
            if (!eq.valid) {
                return GapSolution.failed(eq.maxReynolds(), eq.maxMach());
            }
            double lamB = eq.lambda;
            // λ varies along the step: advance with the Simpson mean of λ, pressure with Simpson's rule.
            double lamMean = (lamA + 4.0 * lamM + lamB) / 6.0;
            w = GapFlowClosedForm.advance(lamMean, omega, ra, w, rb);
            p = p + h * (dpA + 4.0 * dpM + eq.dpdr) / 6.0;
            ra = rb;
            if (!(p > 0)) {
                return GapSolution.failed(eq.maxReynolds(), eq.maxMach());
            }
        }
        return finish(eq, r1, w, p);
    }

    private static GapSolution adaptive(GapEquations eq, double r2, double r1, GapInlet inlet) {
        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public double[] computeDerivatives(double r, double[] y) {
                eq.evaluate(r, y[0], y[1]);
                if (!eq.valid) {
                    throw new IllegalStateException("gap flow choked or pressure collapsed at r = " + r);
                }
                return new double[] {eq.dWdr, eq.dpdr};
            }
        };
        double span = r2 - r1;
        double[] absTol = {1e-10 * (1.0 + Math.abs(inlet.inletRelativeSwirlMPerS())), 1e-9 * inlet.inletPressurePa()};
        double[] relTol = {1e-12, 1e-12};
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-14 * span, span, absTol, relTol);
        integrator.setMaxEvaluations(2_000_000);
        try {
            ODEStateAndDerivative end = integrator.integrate(ode,
                    new ODEState(r2, new double[] {inlet.inletRelativeSwirlMPerS(), inlet.inletPressurePa()}), r1);
            return finish(eq, r1, end.getPrimaryState()[0], end.getPrimaryState()[1]);
        } catch (IllegalStateException e) {
            return GapSolution.failed(eq.maxReynolds(), eq.maxMach());
        }
    }

    private static GapSolution finish(GapEquations eq, double r1, double w, double p) {
        eq.evaluate(r1, w, p);
        if (!eq.valid) {
            return GapSolution.failed(eq.maxReynolds(), eq.maxMach());
        }
        return new GapSolution(true, w, p, eq.temperature, eq.density, eq.maxReynolds(), eq.maxMach());
    }
}
