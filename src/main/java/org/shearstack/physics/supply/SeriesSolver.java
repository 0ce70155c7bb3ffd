package org.shearstack.physics.supply;

import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.shearstack.physics.gas.Gas;
import org.shearstack.physics.gas.JetState;
import org.shearstack.physics.gas.Nozzle;

/**
 * Solves the supply path and the nozzle in series for the plenum pressure by root finding: the path's ISO 6358
 * flow from the supply pressure to the plenum equals the nozzle's compressible flow from the plenum to the back
 * pressure (ISO 6358-3:2014 combines components numerically in the same spirit). No series-conductance
 * shortcut is used. The plenum is adiabatic, so its stagnation temperature is the supply temperature.
 */
public final class SeriesSolver {

    private static final int MAX_EVALUATIONS = 200;

    private SeriesSolver() {
    }

    /**
     * The plenum pressure while the nozzle is choked (then independent of the back pressure): where the path's
     * flow equals the nozzle's choked flow. Valid for every back pressure at or below
     * {@link #chokingBackPressurePa}.
     */
    public static double chokedPlenumPressurePa(Gas gas, SupplyPath supply, Nozzle nozzle) {
        double ps = supply.supplyPressurePa();
        double ts = supply.supplyTemperatureK();
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-12, ps * 1e-12, 1e-15, 5);
        return solver.solve(MAX_EVALUATIONS,
                p -> supply.path().massFlowKgPerS(ps, p, ts) - nozzle.chokedMassFlowKgPerS(gas, p, ts),
                1e-9 * ps, ps, AllowedSolution.ANY_SIDE);
    }

    /** Highest back pressure at which the nozzle is still choked when its plenum is at {@code plenumPa}. */
    public static double chokingBackPressurePa(Gas gas, Nozzle nozzle, double plenumPa) {
        double g = gas.gamma();
        double ratio = nozzle.kind() == org.shearstack.physics.gas.NozzleKind.CONVERGING
                ? org.shearstack.physics.gas.Isentropic.criticalPressureRatio(g)
                : org.shearstack.physics.gas.Isentropic.pressureRatio(g,
                        org.shearstack.physics.gas.Isentropic.machFromAreaRatio(g, nozzle.areaRatio(), false));
        return ratio * plenumPa;
    }

    /** The operating point for a nozzle discharging into {@code backPressurePa}. */
    public static SeriesFlow solve(Gas gas, SupplyPath supply, Nozzle nozzle, double backPressurePa) {
        double ps = supply.supplyPressurePa();
        double ts = supply.supplyTemperatureK();
        if (!(backPressurePa > 0) || backPressurePa >= ps) {
            JetState none = nozzle.flow(gas, ps, ts, ps);
            return new SeriesFlow(ps, 0.0, none);
        }
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-12, ps * 1e-12, 1e-15, 5);
        double plenum = solver.solve(MAX_EVALUATIONS,
                p -> supply.path().massFlowKgPerS(ps, p, ts) - nozzle.flow(gas, p, ts, backPressurePa).massFlowKgPerS(),
                backPressurePa, ps, AllowedSolution.ANY_SIDE);
        JetState jet = nozzle.flow(gas, plenum, ts, backPressurePa);
        return new SeriesFlow(plenum, jet.massFlowKgPerS(), jet);
    }
}
