package org.shearstack.physics.rotor;

import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.shearstack.physics.gas.Expansion;
import org.shearstack.physics.gas.Gas;
import org.shearstack.physics.gas.JetState;
import org.shearstack.physics.gas.Nozzle;
import org.shearstack.physics.supply.SeriesFlow;
import org.shearstack.physics.supply.SeriesSolver;
import org.shearstack.physics.supply.SupplyPath;

/**
 * Solves supply → nozzle → gaps → exhaust at one speed. The unknown is the static pressure p₂ at the disc rims
 * (the nozzle's back pressure): for a trial p₂ the supply path and nozzle in series give the mass flow and the jet
 * (root find on the plenum pressure), the admission reading splits the flow between gaps and rims, the gap march
 * gives the pressure at the exhaust radius, and the exhaust ports need p₁ = p_ambient + K·½ρV². A bracketing
 * Brent solver finds the p₂ that satisfies the ports; this is the root finding on the mass flow the two ends agree on.
 */
final class CoupledSolver {

    private final TurbineModel model;
    private final Nozzle nozzle;
    private final GapFluid fluid;
    private final double chokedPlenumPa;
    private final double chokingBackPa;

    CoupledSolver(TurbineModel model) {
        this.model = model;
        Nozzle n = model.nozzle();
        double cd = Math.min(1.0, n.dischargeCoefficient() * model.calibration().dischargeScale());
        this.nozzle = new Nozzle(n.kind(), n.throatAreaM2(), n.exitAreaM2(), cd, n.velocityCoefficient());
        this.fluid = GapFluid.compressible(model.gas());
        this.chokedPlenumPa = SeriesSolver.chokedPlenumPressurePa(model.gas(), model.supply(), nozzle);
        this.chokingBackPa = SeriesSolver.chokingBackPressurePa(model.gas(), nozzle, chokedPlenumPa);
    }

    /** One evaluation of the chain at a trial rim pressure. */
    private record Trial(double residual, SeriesFlow series, double gapMassFlow, double inletSwirl,
            double inletRelativeSwirl, GapSolution gap, double exhaustVelocity) {
    }

    OperatingPoint at(double omega) {
        SupplyPath supply = model.supply();
        double pAmb = supply.ambientPressurePa();
        double ps = supply.supplyPressurePa();
        double lo = pAmb * (1.0 + 1e-9);
        double hi = ps * (1.0 - 1e-7);
        Trial top = trial(omega, hi);
        if (top.residual() <= 0.0) {
            return blocked(omega);
        }
        Trial bottom = trial(omega, lo);
        double p2;
        if (bottom.residual() >= 0.0) {
            p2 = lo;
        } else {
            BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-12, ps * 1e-8, 1e-9, 5);
            p2 = solver.solve(500, p -> trial(omega, p).residual(), lo, hi, AllowedSolution.ANY_SIDE);
        }
        return point(omega, p2, trial(omega, p2));
    }

    private Trial trial(double omega, double p2) {
        Gas gas = model.gas();
        TurbineGeometry g = model.geometry();
        SupplyPath supply = model.supply();
        SeriesFlow series;
        if (p2 <= chokingBackPa) {
            // choked nozzle: the plenum pressure no longer depends on p2, only the jet's expansion does
            JetState jet = nozzle.flow(gas, chokedPlenumPa, supply.supplyTemperatureK(), p2);
            series = new SeriesFlow(chokedPlenumPa, jet.massFlowKgPerS(), jet);
        } else {
            series = SeriesSolver.solve(gas, supply, nozzle, p2);
        }
        double m = series.massFlowKgPerS();
        double vThetaJet = series.jet().jetVelocityMPerS() * Math.cos(Math.toRadians(g.jetAngleDeg()));
        double phi = g.admissionFraction();
        double rimSpeed = omega * g.outerRadiusM();
        double gapFlow;
        double vThetaIn;
        if (model.calibration().admission() == AdmissionReading.RIM_STRUCK_CAPPED) {
            gapFlow = m;
            vThetaIn = phi * vThetaJet + (1.0 - phi) * Math.min(vThetaJet, rimSpeed);
        } else {
            gapFlow = phi * m;
            vThetaIn = vThetaJet;
        }
        double mg = gapFlow / g.gapCount();
        double w2 = GapFlowClosedForm.inletRelativeSwirlMPerS(vThetaIn, omega, g.outerRadiusM());
        if (!(mg > 0)) {
            return new Trial(p2 - pAmbient(), series, 0.0, vThetaIn, w2, null, 0.0);
        }
        GapInlet inlet = new GapInlet(mg, omega, p2, supply.supplyTemperatureK(), w2);
        GapSolution gap = GapMarch.march(fluid, model.closure(), g.gapM(), g.outerRadiusM(), g.exhaustRadiusM(), inlet,
                model.integration(), model.marchSteps());
        if (!gap.ok()) {
            return new Trial(-p2, series, gapFlow, vThetaIn, w2, gap, 0.0);
        }
        double rho1 = gap.outletDensityKgPerM3();
        double vEx = m / (rho1 * g.exhaustAreaM2());
        double required = pAmbient() + model.losses().exhaustLossCoefficient() * 0.5 * rho1 * vEx * vEx;
        return new Trial(gap.outletPressurePa() - required, series, gapFlow, vThetaIn, w2, gap, vEx);
    }

    private double pAmbient() {
        return model.supply().ambientPressurePa();
    }

    private OperatingPoint point(double omega, double p2, Trial t) {
        Gas gas = model.gas();
        TurbineGeometry g = model.geometry();
        SupplyPath supply = model.supply();
        double m = t.series().massFlowKgPerS();
        ParasiticTorques parasitic = parasitic(omega, p2);
        double available = isentropicPowerW(gas, supply, m);
        if (t.gap() == null || !t.gap().ok()) {
            Validity v = t.gap() == null ? Validity.NO_FLOW
                    : new Validity(t.gap().maxReynolds(), 0.0, t.gap().maxRelativeMach(), false);
            double shaft = -parasitic.totalNm();
            return new OperatingPoint(omega, m > 0, shaft, 0.0, parasitic, shaft * omega, m,
                    t.series().plenumPressurePa(), p2, Double.NaN, t.series().jet().jetVelocityMPerS(),
                    t.series().jet().expansion(), t.series().jet().jetStaticTemperatureK(), available,
                    available > 0 ? shaft * omega / available : 0.0, 0.0, 0.0, 0.0, v);
        }
        GapSolution gap = t.gap();
        double mg = t.gapMassFlow() / g.gapCount();
        double perGap = GapFlowClosedForm.torquePerGapNm(mg, omega, g.outerRadiusM(), t.inletRelativeSwirl(),
                g.exhaustRadiusM(), gap.outletRelativeSwirlMPerS());
        double rotor = g.gapCount() * perGap;
        double shaft = rotor - parasitic.totalNm();
        double vTheta1 = omega * g.exhaustRadiusM() + GapFlowClosedForm.KAPPA * gap.outletRelativeSwirlMPerS();
        double swirlLoss = t.gapMassFlow() * 0.5 * vTheta1 * vTheta1;
        double exhaustLoss = m * 0.5 * t.exhaustVelocity() * t.exhaustVelocity();
        double exhaustMach = t.exhaustVelocity() / gas.speedOfSoundMPerS(gap.outletTemperatureK());
        double mu1 = gas.viscosityPaS(gap.outletTemperatureK());
        Validity validity = new Validity(gap.maxReynolds(), mg / (Math.PI * g.exhaustRadiusM() * mu1),
                gap.maxRelativeMach(), true);
        return new OperatingPoint(omega, true, shaft, rotor, parasitic, shaft * omega, m,
                t.series().plenumPressurePa(), p2, gap.outletPressurePa(), t.series().jet().jetVelocityMPerS(),
                t.series().jet().expansion(), t.series().jet().jetStaticTemperatureK(), available,
                available > 0 ? shaft * omega / available : 0.0, swirlLoss, exhaustLoss, exhaustMach, validity);
    }

    private OperatingPoint blocked(double omega) {
        ParasiticTorques parasitic = parasitic(omega, pAmbient());
        double shaft = -parasitic.totalNm();
        return new OperatingPoint(omega, false, shaft, 0.0, parasitic, shaft * omega, 0.0,
                model.supply().supplyPressurePa(), model.supply().supplyPressurePa(), Double.NaN, 0.0,
                Expansion.SUBSONIC, model.supply().supplyTemperatureK(), 0.0, 0.0, 0.0, 0.0, 0.0, Validity.NO_FLOW);
    }

    private ParasiticTorques parasitic(double omega, double housingPressurePa) {
        Gas gas = model.gas();
        double ts = model.supply().supplyTemperatureK();
        return ParasiticLosses.at(omega, model.geometry(), model.losses(), model.calibration(),
                gas.densityKgPerM3(housingPressurePa, ts), gas.viscosityPaS(ts));
    }

    /** Isentropic power of a mass flow expanding from the supply state to ambient, ṁc_pT_s(1 − (p_a/p_s)^((γ−1)/γ)). */
    static double isentropicPowerW(Gas gas, SupplyPath supply, double massFlowKgPerS) {
        double g = gas.gamma();
        return massFlowKgPerS * gas.cpJPerKgK() * supply.supplyTemperatureK()
                * (1.0 - Math.pow(supply.ambientPressurePa() / supply.supplyPressurePa(), (g - 1.0) / g));
    }
}
