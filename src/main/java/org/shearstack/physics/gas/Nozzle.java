package org.shearstack.physics.gas;

import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;

/**
 * A nozzle (or several identical ones, summed into the areas) between the plenum and the rotor.
 *
 * @param kind                 converging or converging–diverging
 * @param throatAreaM2         total throat area
 * @param exitAreaM2           total exit area; equals the throat area for a converging nozzle
 * @param dischargeCoefficient C_d, actual over ideal mass flow (0 &lt; C_d ≤ 1)
 * @param velocityCoefficient  actual over ideal jet velocity (0 &lt; c_v ≤ 1), the nozzle's friction loss
 */
public record Nozzle(NozzleKind kind, double throatAreaM2, double exitAreaM2, double dischargeCoefficient,
        double velocityCoefficient) {

    private static final double IDEAL_MATCH = 0.01;

    public Nozzle {
        Gas.requirePositive(throatAreaM2, "throatAreaM2");
        Gas.requirePositive(exitAreaM2, "exitAreaM2");
        if (!(dischargeCoefficient > 0 && dischargeCoefficient <= 1.0)) {
            throw new IllegalArgumentException("discharge coefficient must be in (0, 1], found " + dischargeCoefficient);
        }
        if (!(velocityCoefficient > 0 && velocityCoefficient <= 1.0)) {
            throw new IllegalArgumentException("velocity coefficient must be in (0, 1], found " + velocityCoefficient);
        }
        if (kind == NozzleKind.CONVERGING && exitAreaM2 != throatAreaM2) {
            throw new IllegalArgumentException("a converging nozzle's exit area must equal its throat area");
        }
        if (kind == NozzleKind.CONVERGING_DIVERGING && exitAreaM2 < throatAreaM2) {
            throw new IllegalArgumentException("a converging-diverging nozzle needs exit area >= throat area, found "
                    + exitAreaM2 + " < " + throatAreaM2);
        }
    }

    public static Nozzle converging(double throatAreaM2, double dischargeCoefficient, double velocityCoefficient) {
        return new Nozzle(NozzleKind.CONVERGING, throatAreaM2, throatAreaM2, dischargeCoefficient, velocityCoefficient);
    }

    /** A converging–diverging nozzle whose exit area expands ideally from p₀ to the design exit pressure. */
    public static Nozzle convergingDiverging(Gas gas, double throatAreaM2, double designPressureRatio,
            double dischargeCoefficient, double velocityCoefficient) {
        double exitMach = Isentropic.machFromPressureRatio(gas.gamma(), designPressureRatio);
        double ratio = exitMach > 1.0 ? Isentropic.areaRatio(gas.gamma(), exitMach) : 1.0;
        return new Nozzle(NozzleKind.CONVERGING_DIVERGING, throatAreaM2, throatAreaM2 * ratio, dischargeCoefficient,
                velocityCoefficient);
    }

    /** Throat area that passes {@code massFlowKgPerS} choked: A_t = ṁ√T₀/(C_d p₀ K) (physics.md §1.5). */
    public static double chokedThroatAreaM2(Gas gas, double massFlowKgPerS, double stagnationPressurePa,
            double stagnationTemperatureK, double dischargeCoefficient) {
        return massFlowKgPerS * Math.sqrt(stagnationTemperatureK)
                / (dischargeCoefficient * stagnationPressurePa * Isentropic.chokedFluxConstant(gas));
    }

    /** Largest mass flow this nozzle passes from the given stagnation state (choked). */
    public double chokedMassFlowKgPerS(Gas gas, double stagnationPressurePa, double stagnationTemperatureK) {
        return dischargeCoefficient * throatAreaM2
                * Isentropic.chokedMassFlux(gas, stagnationPressurePa, stagnationTemperatureK);
    }

    /** Exit-to-throat area ratio. */
    public double areaRatio() {
        return exitAreaM2 / throatAreaM2;
    }

    /** The flow at stagnation state (p₀, T₀) discharging into {@code backPressurePa}. */
    public JetState flow(Gas gas, double stagnationPressurePa, double stagnationTemperatureK, double backPressurePa) {
        Gas.requirePositive(stagnationPressurePa, "stagnationPressurePa");
        Gas.requirePositive(stagnationTemperatureK, "stagnationTemperatureK");
        double pb = Math.min(backPressurePa, stagnationPressurePa);
        double piB = pb / stagnationPressurePa;
        double g = gas.gamma();
        double subsonicExitRatio = kind == NozzleKind.CONVERGING
                ? Isentropic.criticalPressureRatio(g)
                : Isentropic.pressureRatio(g, Isentropic.machFromAreaRatio(g, areaRatio(), false));
        if (piB >= subsonicExitRatio) {
            double flux = Isentropic.subsonicMassFlux(gas, stagnationPressurePa, stagnationTemperatureK, piB);
            double mach = Isentropic.machFromPressureRatio(g, piB);
            double v = Isentropic.expansionVelocity(gas, stagnationTemperatureK, piB);
            return jet(gas, stagnationTemperatureK, dischargeCoefficient * exitAreaM2 * flux, false, mach, pb, v, v,
                    Expansion.SUBSONIC);
        }
        double massFlow = chokedMassFlowKgPerS(gas, stagnationPressurePa, stagnationTemperatureK);
        if (kind == NozzleKind.CONVERGING) {
            return pastExit(gas, stagnationPressurePa, stagnationTemperatureK, pb, massFlow, 1.0);
        }
        double exitMach = Isentropic.machFromAreaRatio(g, areaRatio(), true);
        double pe = stagnationPressurePa * Isentropic.pressureRatio(g, exitMach);
        double shockAtExit = pe * (1.0 + 2.0 * g / (g + 1.0) * (exitMach * exitMach - 1.0));
        if (pb > shockAtExit) {
            return shockInside(gas, stagnationPressurePa, stagnationTemperatureK, pb, massFlow);
        }
        return pastExit(gas, stagnationPressurePa, stagnationTemperatureK, pb, massFlow, exitMach);
    }

    private JetState pastExit(Gas gas, double p0, double t0, double pb, double massFlow, double exitMach) {
        double g = gas.gamma();
        double pe = p0 * Isentropic.pressureRatio(g, exitMach);
        double te = t0 * Isentropic.temperatureRatio(g, exitMach);
        double ve = exitMach * gas.speedOfSoundMPerS(te);
        double rhoE = gas.densityKgPerM3(pe, te);
        // Thrust-equivalent (momentum-conserving) velocity once the jet has adjusted to the back pressure.
        double vJet = Math.max(0.0, ve + (pe - pb) / (rhoE * ve));
        Expansion expansion = Math.abs(pe - pb) <= IDEAL_MATCH * pe ? Expansion.IDEAL
                : pe > pb ? Expansion.UNDER_EXPANDED : Expansion.OVER_EXPANDED;
        return jet(gas, t0, massFlow, true, exitMach, pe, ve, vJet, expansion);
    }

    /** Normal shock in the diverging part: find its position so that the subsonic exit reaches p_b. */
    private JetState shockInside(Gas gas, double p0, double t0, double pb, double massFlow) {
        double g = gas.gamma();
        double eps = areaRatio();
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-12, 1e-12, 1e-12, 5);
        double shockArea = solver.solve(200, a -> exitPressureWithShockAt(g, a, eps) * p0 - pb, 1.0, eps,
                AllowedSolution.ANY_SIDE);
        double p02 = p0 * totalPressureRatioAcrossShock(g, Isentropic.machFromAreaRatio(g, shockArea, true));
        double piE = pb / p02;
        double me = Isentropic.machFromPressureRatio(g, Math.min(1.0, piE));
        double ve = Isentropic.expansionVelocity(gas, t0, piE);
        return jet(gas, t0, massFlow, true, me, pb, ve, ve, Expansion.SHOCK_IN_NOZZLE);
    }

    private static double exitPressureWithShockAt(double g, double shockAreaRatio, double exitAreaRatio) {
        double m1 = Isentropic.machFromAreaRatio(g, shockAreaRatio, true);
        double total = totalPressureRatioAcrossShock(g, m1);
        // Behind the shock the sonic reference area grows by 1/total; the exit is subsonic.
        double exitRatio = Math.max(1.0, exitAreaRatio * total);
        double me = Isentropic.machFromAreaRatio(g, exitRatio, false);
        return total * Isentropic.pressureRatio(g, me);
    }

    /** p₀₂/p₀₁ across a normal shock at upstream Mach m1. */
    static double totalPressureRatioAcrossShock(double g, double m1) {
        double m2 = m1 * m1;
        double a = Math.pow((g + 1.0) * m2 / ((g - 1.0) * m2 + 2.0), g / (g - 1.0));
        double b = Math.pow((g + 1.0) / (2.0 * g * m2 - (g - 1.0)), 1.0 / (g - 1.0));
        return a * b;
    }

    private JetState jet(Gas gas, double t0, double massFlow, boolean choked, double mach, double pe, double ve,
            double vIdeal, Expansion expansion) {
        double v = velocityCoefficient * vIdeal;
        double tJet = t0 - v * v / (2.0 * gas.cpJPerKgK());
        return new JetState(massFlow, choked, mach, pe, ve, v, tJet, expansion);
    }
}
