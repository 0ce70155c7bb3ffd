package org.shearstack.physics.rotor;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.shearstack.physics.gas.Gas;
import org.shearstack.physics.gas.Nozzle;
import org.shearstack.physics.supply.SupplyPath;

/**
 * The coupled model of a multiple-disc air turbine: supply path and nozzle in series, gap-averaged compressible
 * flow in the gaps, exhaust ports, parasitic drag. Immutable; each query solves afresh.
 *
 * @param gas          working gas
 * @param supply       supply pressure, temperature, ambient and path characteristic
 * @param nozzle       the nozzle(s)
 * @param geometry     disc pack and housing flow geometry
 * @param losses       bearing and port hardware
 * @param calibration  loss coefficients and admission reading
 * @param closure      gap friction closure
 * @param integration  gap-march integrator
 * @param marchSteps   steps of the exponential integrator
 */
public record TurbineModel(Gas gas, SupplyPath supply, Nozzle nozzle, TurbineGeometry geometry, LossModel losses,
        Calibration calibration, FrictionClosure closure, GapMarch.Integration integration, int marchSteps) {

    /** Tip speed above which the runaway search gives up (far above any printable rotor). */
    private static final double MAX_TIP_SPEED_M_PER_S = 3000.0;

    public TurbineModel {
        if (marchSteps < 4) {
            throw new IllegalArgumentException("march needs at least 4 steps, found " + marchSteps);
        }
    }

    /** Air, the blended friction closure and the fast gap march. */
    public static TurbineModel of(SupplyPath supply, Nozzle nozzle, TurbineGeometry geometry, LossModel losses,
            Calibration calibration) {
        return new TurbineModel(Gas.AIR, supply, nozzle, geometry, losses, calibration, FrictionClosure.BLENDED,
                GapMarch.Integration.EXPONENTIAL, GapMarch.DEFAULT_STEPS);
    }

    public TurbineModel withCalibration(Calibration other) {
        return new TurbineModel(gas, supply, nozzle, geometry, losses, other, closure, integration, marchSteps);
    }

    public TurbineModel withGeometry(TurbineGeometry other) {
        return new TurbineModel(gas, supply, nozzle, other, losses, calibration, closure, integration, marchSteps);
    }

    public TurbineModel withNozzle(Nozzle other) {
        return new TurbineModel(gas, supply, other, geometry, losses, calibration, closure, integration, marchSteps);
    }

    /** The coupled solution at one speed (rad/s, ≥ 0). */
    public OperatingPoint at(double speedRadPerS) {
        if (!(speedRadPerS >= 0) || Double.isInfinite(speedRadPerS)) {
            throw new IllegalArgumentException("speed must be finite and >= 0 rad/s, found " + speedRadPerS);
        }
        return new CoupledSolver(this).at(speedRadPerS);
    }

    /** No-load speed where the shaft torque falls to zero; 0 when the rotor cannot start. */
    public double runawaySpeedRadPerS() {
        return runawaySpeedRadPerS(0.0);
    }

    /**
     * Speed where the shaft torque falls to a constant extra load torque (a brake, a generator's friction);
     * 0 when the rotor cannot start against it.
     */
    public double runawaySpeedRadPerS(double extraLoadTorqueNm) {
        CoupledSolver solver = new CoupledSolver(this);
        OperatingPoint stall = solver.at(0.0);
        if (stall.shaftTorqueNm() <= extraLoadTorqueNm) {
            return 0.0;
        }
        double a = 0.0;
        double b = Math.max(50.0, 0.5 * stall.jetVelocityMPerS() / geometry.outerRadiusM());
        while (solver.at(b).shaftTorqueNm() > extraLoadTorqueNm) {
            a = b;
            b *= 1.6;
            if (b * geometry.outerRadiusM() > MAX_TIP_SPEED_M_PER_S) {
                throw new IllegalStateException("no runaway speed found below a tip speed of "
                        + MAX_TIP_SPEED_M_PER_S + " m/s");
            }
        }
        BracketingNthOrderBrentSolver brent = new BracketingNthOrderBrentSolver(1e-10, 1e-6, 1e-12, 5);
        return brent.solve(200, w -> solver.at(w).shaftTorqueNm() - extraLoadTorqueNm, a, b,
                AllowedSolution.ANY_SIDE);
    }

    /**
     * Highest runaway speed of the uncertainty band (estimate, optimistic and pessimistic readings), with a
     * constant extra load torque: the figure a safety check must use (physics.md §12.6–§12.8).
     */
    public double runawayUpperBoundRadPerS(double extraLoadTorqueNm) {
        double est = runawaySpeedRadPerS(extraLoadTorqueNm);
        double opt = withCalibration(calibration.optimistic()).runawaySpeedRadPerS(extraLoadTorqueNm);
        double pes = withCalibration(calibration.pessimistic()).runawaySpeedRadPerS(extraLoadTorqueNm);
        return Math.max(est, Math.max(opt, pes));
    }

    /**
     * A variant of this design for what-if questions (safety remedies): another supply pressure, the nozzle
     * throat (and exit) scaled by {@code throatScale}, the disc and exhaust radii scaled by {@code diameterScale}
     * (exhaust port area with its square; gaps, thicknesses and clearances unchanged).
     */
    public TurbineModel variant(double supplyPressurePa, double throatScale, double diameterScale) {
        TurbineGeometry g = geometry;
        TurbineGeometry scaled = new TurbineGeometry(g.outerRadiusM() * diameterScale,
                g.exhaustRadiusM() * diameterScale, g.gapM(), g.discThicknessM(), g.discCount(), g.endClearanceM(),
                g.rimClearanceM(), g.exhaustAreaM2() * diameterScale * diameterScale, g.jetAngleDeg());
        Nozzle n = new Nozzle(nozzle.kind(), nozzle.throatAreaM2() * throatScale, nozzle.exitAreaM2() * throatScale,
                nozzle.dischargeCoefficient(), nozzle.velocityCoefficient());
        return new TurbineModel(gas, supply.atPressure(supplyPressurePa), n, scaled, losses, calibration, closure,
                integration, marchSteps);
    }

    /** Points at {@code count} evenly spaced speeds from stall to runaway. */
    public PerformanceCurve curve(int count) {
        if (count < 2) {
            throw new IllegalArgumentException("a curve needs at least 2 points, found " + count);
        }
        CoupledSolver solver = new CoupledSolver(this);
        double runaway = runawaySpeedRadPerS();
        List<OperatingPoint> points = new ArrayList<>(count);
        for (int i = 0; i < count; i++) {
            points.add(solver.at(runaway * i / (count - 1)));
        }
        return new PerformanceCurve(calibration, points, runaway, points.get(0).shaftTorqueNm());
    }

    /** The estimate and its optimistic and pessimistic readings. */
    public PerformanceMap map(int count) {
        return new PerformanceMap(curve(count), withCalibration(calibration.optimistic()).curve(count),
                withCalibration(calibration.pessimistic()).curve(count));
    }

    /**
     * Operating point against a load whose torque (N·m) is a function of speed (rad/s): where shaft torque equals
     * load torque between stall and runaway. When the load exceeds the stall torque, the stall point is returned.
     */
    public OperatingPoint operatingPoint(DoubleUnaryOperator loadTorqueNm) {
        CoupledSolver solver = new CoupledSolver(this);
        OperatingPoint stall = solver.at(0.0);
        if (stall.shaftTorqueNm() <= loadTorqueNm.applyAsDouble(0.0)) {
            return stall;
        }
        DoubleUnaryOperator excess = s -> solver.at(s).shaftTorqueNm() - loadTorqueNm.applyAsDouble(s);
        double a = 0.0;
        double b = Math.max(50.0, 0.25 * stall.jetVelocityMPerS() / geometry.outerRadiusM());
        while (excess.applyAsDouble(b) > 0.0) {
            a = b;
            b *= 1.6;
            if (b * geometry.outerRadiusM() > MAX_TIP_SPEED_M_PER_S) {
                throw new IllegalStateException("no operating point found below a tip speed of "
                        + MAX_TIP_SPEED_M_PER_S + " m/s");
            }
        }
        BracketingNthOrderBrentSolver brent = new BracketingNthOrderBrentSolver(1e-10, 1e-6, 1e-12, 5);
        double w = brent.solve(200, excess::applyAsDouble, a, b, AllowedSolution.ANY_SIDE);
        return solver.at(w);
    }

    /** Isentropic power available from a mass flow, supply state to ambient. */
    public double isentropicPowerW(double massFlowKgPerS) {
        return CoupledSolver.isentropicPowerW(gas, supply, massFlowKgPerS);
    }
}
