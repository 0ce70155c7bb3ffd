package org.shearstack.physics.calibration;

import org.shearstack.physics.GoldenSection;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;
import org.shearstack.physics.dyno.CoastPoint;
import org.shearstack.physics.dyno.CurvePoint;
import org.shearstack.physics.dyno.DynoResult;
import org.shearstack.physics.dyno.NonNegativeLeastSquares;
import org.shearstack.physics.dyno.Segment;
import org.shearstack.physics.dyno.WindowChoice;
import org.shearstack.physics.gas.Gas;
import org.shearstack.physics.rotor.AdmissionReading;
import org.shearstack.physics.rotor.Calibration;
import org.shearstack.physics.rotor.LossModel;
import org.shearstack.physics.rotor.ParasiticLosses;
import org.shearstack.physics.rotor.TurbineGeometry;
import org.shearstack.physics.rotor.TurbineModel;

/**
 * Fits a model's {@link Calibration} to analysed bench runs (physics.md §8, issue "calibration"):
 * <ol>
 * <li>Air off: the coast-down loss torque is a non-negative combination of the model's parasitic terms at
 * ambient density: a constant (seal drag when the bearings are sealed, else the bearing load term), the
 * Palmgren speed term (∝ f₀) and the windage of end faces and rims (one common scale). A term that never
 * carries 3 % of the loss over the logged speeds cannot be told apart and keeps its prior value.</li>
 * <li>Air on: with those losses, the discharge scale is fitted to the run-up's shaft torque and the measured
 * no-load speed, for each admission reading; a reading is chosen only when its residual is clearly smaller
 * (below 0.8 of the other's), otherwise the prior reading stays and the notes say the data cannot tell.</li>
 * </ol>
 * All runs are taken at the model's supply conditions.
 */
public final class BenchCalibrator {
    /** Smallest share of the loss torque a term must carry somewhere to be fitted. */
    public static final double MIN_SHARE = 0.03;
    /** Residual ratio below which one admission reading is preferred over the other. */
    public static final double ADMISSION_RATIO = 0.8;
    /** Largest relative standard error of a loss coefficient that is still reported as fitted. */
    public static final double MAX_RELATIVE_ERROR = 0.25;
    private static final double DISCHARGE_LO = 0.3;
    private static final double DISCHARGE_HI = 1.5;

    private BenchCalibrator() {
    }

    /** Calibrates; at least one run must have a coast-down or a run-up. */
    public static CalibrationFit fit(TurbineModel model, List<DynoResult> runs) {
        Calibration prior = model.calibration();
        List<String> notes = new ArrayList<>();
        List<FittedCoefficient> coefs = new ArrayList<>();
        LossSamples loss = LossSamples.of(runs);
        Calibration afterLoss = prior;
        AirOff airOff = new AirOff(model);
        if (loss.size() >= 6) {
            afterLoss = fitLosses(model, prior, loss, airOff, coefs, notes);
        } else {
            notes.add("No usable coast-down: loss coefficients kept at their prior values.");
            coefs.add(new FittedCoefficient("bearing-speed-factor", prior.bearingSpeedFactor(),
                    prior.bearingSpeedFactor(), false, "no coast-down"));
            coefs.add(new FittedCoefficient("windage-scale", prior.endFaceScale(), prior.endFaceScale(), false,
                    "no coast-down"));
        }
        double measuredNoLoad = meanNoLoad(runs);
        List<double[]> bins = runUpBins(runs, measuredNoLoad);
        Calibration after = afterLoss;
        if (bins.size() >= 3 && Double.isFinite(measuredNoLoad)) {
            after = fitAirOn(model, afterLoss, bins, measuredNoLoad, coefs, notes);
        } else {
            notes.add("No usable run-up: discharge scale and admission reading kept at their prior values.");
        }
        after = new Calibration(after.admission(), after.endFaceScale(), after.rimScale(),
                after.bearingFrictionCoefficient(), after.bearingSpeedFactor(), after.sealTorquePerBearingNm(),
                after.dischargeScale(), "calibrated");
        TurbineModel mb = model.withCalibration(prior);
        TurbineModel ma = model.withCalibration(after);
        List<CalibrationFit.CurveSample> curve = new ArrayList<>();
        double sb = 0;
        double sa = 0;
        for (double[] b : bins) {
            double tb = mb.at(b[0]).shaftTorqueNm();
            double ta = ma.at(b[0]).shaftTorqueNm();
            curve.add(new CalibrationFit.CurveSample(b[0], b[1], tb, ta));
            sb += (tb - b[1]) * (tb - b[1]);
            sa += (ta - b[1]) * (ta - b[1]);
        }
        double lb = loss.size() == 0 ? Double.NaN : airOff.rms(prior, loss);
        double la = loss.size() == 0 ? Double.NaN : airOff.rms(after, loss);
        return new CalibrationFit(prior, after, coefs, measuredNoLoad, mb.runawaySpeedRadPerS(),
                ma.runawaySpeedRadPerS(), lb, la, bins.isEmpty() ? Double.NaN : Math.sqrt(sb / bins.size()),
                bins.isEmpty() ? Double.NaN : Math.sqrt(sa / bins.size()), curve, notes);
    }

    private static Calibration fitLosses(TurbineModel model, Calibration prior, LossSamples loss, AirOff airOff,
            List<FittedCoefficient> coefs, List<String> notes) {
        LossModel lm = model.losses();
        boolean sealed = lm.sealedBearings() > 0;
        int n = loss.size();
        double[][] basis = new double[3][n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double w = loss.speed[i];
            basis[0][i] = sealed ? lm.sealedBearings() : lm.bearingCount() * lm.bearingLoadN() * lm.bearingBoreM() / 2;
            basis[1][i] = airOff.palmgrenPerUnitF0(w);
            basis[2][i] = airOff.windagePerUnitScale(w);
            // the constant term not fitted keeps its prior value and is taken off the measurement
            double known = sealed ? lm.bearingCount() * prior.bearingFrictionCoefficient() * lm.bearingLoadN()
                    * lm.bearingBoreM() / 2 : lm.sealedBearings() * prior.sealTorquePerBearingNm();
            y[i] = loss.torque[i] - known;
        }
        double[] priorCoef = {sealed ? prior.sealTorquePerBearingNm() : prior.bearingFrictionCoefficient(),
            prior.bearingSpeedFactor(), prior.endFaceScale()};
        boolean[] use = {true, true, true};
        NonNegativeLeastSquares.Result r = null;
        for (int pass = 0; pass < 4; pass++) {
            r = fitSubset(basis, y, use, priorCoef);
            double[] rel = relativeStandardErrors(basis, y, use, r.coefficients(), priorCoef, loss.correlation);
            // drop the least determined term only, then refit: the others may become well determined without it
            int worst = -1;
            double worstScore = 0;
            for (int k = 0; k < 3; k++) {
                double share = maxShare(basis, r.coefficients(), k);
                double score = share < MIN_SHARE ? Double.POSITIVE_INFINITY : rel[k] / MAX_RELATIVE_ERROR;
                if (use[k] && score > 1 && score > worstScore) {
                    worst = k;
                    worstScore = score;
                }
            }
            if (worst < 0) {
                break;
            }
            use[worst] = false;
        }
        double[] c = r.coefficients();
        String[] keys = {sealed ? "seal-torque-per-bearing-nm" : "bearing-friction-coefficient", "bearing-speed-factor",
            "windage-scale"};
        for (int k = 0; k < 3; k++) {
            String note = use[k] ? String.format(Locale.ROOT, "fitted to %d coast-down samples", n)
                    : "not determined by these logs (under 3 % of the loss at every logged speed, or a standard"
                            + " error above 25 % of its value): prior kept";
            coefs.add(new FittedCoefficient(keys[k], priorCoef[k], c[k], use[k], note));
        }
        notes.add(String.format(Locale.ROOT, "The constant loss term is attributed to %s; the other constant term"
                + " keeps its prior value.", sealed ? "seal drag (the bearings are sealed)" : "bearing load friction"));
        return new Calibration(prior.admission(), c[2], c[2], sealed ? prior.bearingFrictionCoefficient() : c[0], c[1],
                sealed ? c[0] : prior.sealTorquePerBearingNm(), prior.dischargeScale(), prior.name());
    }

    private static NonNegativeLeastSquares.Result fitSubset(double[][] basis, double[] y, boolean[] use,
            double[] priorCoef) {
        int n = y.length;
        List<Integer> idx = new ArrayList<>();
        double[] yy = y.clone();
        for (int k = 0; k < 3; k++) {
            if (use[k]) {
                idx.add(k);
            } else {
                for (int i = 0; i < n; i++) {
                    yy[i] -= priorCoef[k] * basis[k][i];
                }
            }
        }
        double[] full = priorCoef.clone();
        if (idx.isEmpty()) {
            return new NonNegativeLeastSquares.Result(full, use.clone(), Double.NaN);
        }
        double[][] sub = new double[idx.size()][];
        for (int j = 0; j < idx.size(); j++) {
            sub[j] = basis[idx.get(j)];
        }
        NonNegativeLeastSquares.Result r = NonNegativeLeastSquares.fit(sub, yy);
        for (int j = 0; j < idx.size(); j++) {
            full[idx.get(j)] = r.coefficients()[j];
        }
        return new NonNegativeLeastSquares.Result(full, use.clone(), r.rms());
    }

    /**
     * Standard error over value of each fitted coefficient, from σ²(AᵀA)⁻¹ with σ² the residual variance, the
     * variance inflated by the number of samples one smoothing window correlates; +∞ for a zero coefficient.
     */
    private static double[] relativeStandardErrors(double[][] basis, double[] y, boolean[] use, double[] c,
            double[] priorCoef, double correlation) {
        int n = y.length;
        List<Integer> idx = new ArrayList<>();
        for (int k = 0; k < 3; k++) {
            if (use[k]) {
                idx.add(k);
            }
        }
        double[] rel = new double[3];
        int m = idx.size();
        if (m == 0 || n <= m) {
            return rel;
        }
        double sse = 0;
        for (int i = 0; i < n; i++) {
            double f = 0;
            for (int k = 0; k < 3; k++) {
                f += (use[k] ? c[k] : priorCoef[k]) * basis[k][i];
            }
            double yy = y[i];
            sse += (yy - f) * (yy - f);
        }
        double sigma2 = sse / (n - m) * Math.max(1, correlation);
        double[][] a = new double[m][m];
        for (int i = 0; i < n; i++) {
            for (int r = 0; r < m; r++) {
                for (int q = 0; q < m; q++) {
                    a[r][q] += basis[idx.get(r)][i] * basis[idx.get(q)][i];
                }
            }
        }
        for (int r = 0; r < m; r++) {
            double[] e = new double[m];
            e[r] = 1;
            double[] col = solve(a, e);
            int k = idx.get(r);
            double se = col == null ? Double.POSITIVE_INFINITY : Math.sqrt(Math.max(0, sigma2 * col[r]));
            rel[k] = c[k] > 0 ? se / c[k] : Double.POSITIVE_INFINITY;
        }
        return rel;
    }

    private static double[] solve(double[][] a, double[] b) {
        // scale rows and columns to unit diagonal for conditioning
        int m = b.length;
        double[] d = new double[m];
        for (int i = 0; i < m; i++) {
            d[i] = a[i][i] > 0 ? 1 / Math.sqrt(a[i][i]) : 1;
        }
        double[][] s = new double[m][m];
        double[] bb = new double[m];
        for (int i = 0; i < m; i++) {
            bb[i] = b[i] * d[i];
            for (int j = 0; j < m; j++) {
                s[i][j] = a[i][j] * d[i] * d[j];
            }
        }
        double[] x = org.shearstack.physics.dyno.NonNegativeLeastSquares.solveLinear(s, bb);
        if (x == null) {
            return null;
        }
        for (int i = 0; i < m; i++) {
            x[i] *= d[i];
        }
        return x;
    }

    private static double maxShare(double[][] basis, double[] c, int k) {
        double best = 0;
        for (int i = 0; i < basis[0].length; i++) {
            double total = 0;
            for (int j = 0; j < basis.length; j++) {
                total += c[j] * basis[j][i];
            }
            if (total > 0) {
                best = Math.max(best, c[k] * basis[k][i] / total);
            }
        }
        return best;
    }

    private static Calibration fitAirOn(TurbineModel model, Calibration base, List<double[]> bins,
            double measuredNoLoad, List<FittedCoefficient> coefs, List<String> notes) {
        double ref = 0;
        for (double[] b : bins) {
            ref = Math.max(ref, Math.abs(b[1]));
        }
        double tref = ref;
        double[] bestS = new double[2];
        double[] bestE = new double[2];
        AdmissionReading[] readings = AdmissionReading.values();
        for (int a = 0; a < readings.length; a++) {
            AdmissionReading reading = readings[a];
            DoubleUnaryOperator err = s -> {
                TurbineModel m = model.withCalibration(with(base, reading, s));
                double e = 0;
                for (double[] b : bins) {
                    double d = (m.at(b[0]).shaftTorqueNm() - b[1]) / tref;
                    e += d * d;
                }
                double z = m.at(measuredNoLoad).shaftTorqueNm() / tref;
                return e / bins.size() + z * z;
            };
            double[] g = GoldenSection.minimize(err, DISCHARGE_LO, DISCHARGE_HI, 1e-4);
            bestS[a] = g[0];
            bestE[a] = g[1];
        }
        int prior = base.admission().ordinal();
        int other = 1 - prior;
        int chosen = bestE[other] < ADMISSION_RATIO * bestE[prior] ? other : prior;
        boolean told = bestE[chosen] < ADMISSION_RATIO * bestE[1 - chosen];
        notes.add(String.format(Locale.ROOT, "Admission reading: residual %.3g with %s, %.3g with %s; %s.",
                Math.sqrt(bestE[0]), label(readings[0]), Math.sqrt(bestE[1]), label(readings[1]),
                told ? "the data prefer " + label(readings[chosen])
                        : "the data cannot tell them apart, the prior reading " + label(base.admission()) + " stays"));
        coefs.add(new FittedCoefficient("discharge-scale", base.dischargeScale(), bestS[chosen], true,
                String.format(Locale.ROOT, "fitted to %d run-up speed bins and the measured no-load speed", bins.size())));
        coefs.add(new FittedCoefficient("admission", base.admission().ordinal(), readings[chosen].ordinal(), told,
                label(readings[chosen])));
        if (bestS[chosen] <= DISCHARGE_LO + 1e-3 || bestS[chosen] >= DISCHARGE_HI - 1e-3) {
            notes.add(String.format(Locale.ROOT, "The discharge scale hit the end of its range %.1f–%.1f: the model"
                    + " and the bench run disagree by more than the nozzle can explain.", DISCHARGE_LO, DISCHARGE_HI));
        }
        return with(base, readings[chosen], bestS[chosen]);
    }

    static String label(AdmissionReading r) {
        return r.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    private static Calibration with(Calibration c, AdmissionReading a, double dischargeScale) {
        return new Calibration(a, c.endFaceScale(), c.rimScale(), c.bearingFrictionCoefficient(),
                c.bearingSpeedFactor(), c.sealTorquePerBearingNm(), dischargeScale, c.name());
    }

    private static double meanNoLoad(List<DynoResult> runs) {
        double s = 0;
        int n = 0;
        for (DynoResult r : runs) {
            double w = r.summary().noLoadSpeedRadPerS();
            if (Double.isFinite(w) && r.summary().noLoadSource().startsWith("measured")) {
                s += w;
                n++;
            }
        }
        return n == 0 ? Double.NaN : s / n;
    }

    private static List<double[]> runUpBins(List<DynoResult> runs, double noLoad) {
        List<double[]> out = new ArrayList<>();
        for (DynoResult r : runs) {
            for (CurvePoint p : r.curve()) {
                if (p.speedRadPerS() >= 0.1 * noLoad && p.speedRadPerS() <= 0.9 * noLoad && p.samples() >= 3) {
                    out.add(new double[] {p.speedRadPerS(), p.shaftTorqueNm()});
                }
            }
        }
        return out;
    }

    /** Coast-down samples of all runs, thinned to at most 400. */
    private record LossSamples(double[] speed, double[] torque, double correlation) {
        static LossSamples of(List<DynoResult> runs) {
            List<CoastPoint> all = new ArrayList<>();
            int window = 1;
            for (DynoResult r : runs) {
                WindowChoice wc = r.windows().get(Segment.Kind.COAST_DOWN);
                window = wc == null ? window : Math.max(window, wc.points());
                for (CoastPoint p : r.coastDown()) {
                    if (p.usedInFit()) {
                        all.add(p);
                    }
                }
            }
            int stride = Math.max(1, all.size() / 400);
            int n = (all.size() + stride - 1) / stride;
            double[] w = new double[n];
            double[] t = new double[n];
            for (int i = 0; i < n; i++) {
                w[i] = all.get(i * stride).speedRadPerS();
                t[i] = all.get(i * stride).measuredLossTorqueNm();
            }
            return new LossSamples(w, t, (double) window / stride);
        }

        int size() {
            return speed.length;
        }
    }

    /** Parasitic torques with the air off: still air at ambient pressure and supply temperature. */
    private static final class AirOff {
        private final TurbineModel model;
        private final double rho;
        private final double mu;

        AirOff(TurbineModel model) {
            this.model = model;
            Gas gas = model.gas();
            double t = model.supply().supplyTemperatureK();
            this.rho = gas.densityKgPerM3(model.supply().ambientPressurePa(), t);
            this.mu = gas.viscosityPaS(t);
        }

        double palmgrenPerUnitF0(double w) {
            LossModel lm = model.losses();
            return lm.bearingCount() * ParasiticLosses.palmgrenSpeedTermNm(w, 1.0, lm.lubricantViscosityCSt(),
                    lm.bearingMeanDiameterM());
        }

        double windagePerUnitScale(double w) {
            TurbineGeometry g = model.geometry();
            return ParasiticLosses.endFaceMomentNm(w, g.outerRadiusM(), g.endClearanceM(), rho, mu)
                    + ParasiticLosses.rimMomentNm(w, g.outerRadiusM(), g.rimClearanceM(), g.packHeightM(), rho, mu);
        }

        double total(Calibration c, double w) {
            return ParasiticLosses.at(w, model.geometry(), model.losses(), c, rho, mu).totalNm();
        }

        double rms(Calibration c, LossSamples s) {
            double e = 0;
            for (int i = 0; i < s.size(); i++) {
                double d = total(c, s.speed[i]) - s.torque[i];
                e += d * d;
            }
            return Math.sqrt(e / s.size());
        }
    }
}
