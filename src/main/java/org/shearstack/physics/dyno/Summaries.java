package org.shearstack.physics.dyno;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.shearstack.check.Finding;
import org.shearstack.check.Severity;

/** Headline numbers and the comparison with a prediction. */
final class Summaries {
    private Summaries() {
    }

    static DynoSummary summarize(SpeedLog log, Segments seg, List<DynoPoint> run, LossLaw law, boolean haveLoss,
            double inertia, double ke, List<Finding> findings) {
        double pS = Double.NaN;
        double wS = Double.NaN;
        double pR = Double.NaN;
        double wR = Double.NaN;
        double wMax = 0;
        for (DynoPoint p : run) {
            if (Double.isNaN(pS) || p.shaftPowerW() > pS) {
                pS = p.shaftPowerW();
                wS = p.speedRadPerS();
            }
            if (Double.isNaN(pR) || p.rotorPowerW() > pR) {
                pR = p.rotorPowerW();
                wR = p.speedRadPerS();
            }
            wMax = Math.max(wMax, p.speedRadPerS());
        }
        // stall: straight line through the rotor torque over the lower half of the run-up's speeds
        double stall = Double.NaN;
        List<double[]> low = new ArrayList<>();
        for (DynoPoint p : run) {
            if (p.speedRadPerS() <= 0.5 * wMax) {
                low.add(new double[] {p.speedRadPerS(), p.rotorTorqueNm()});
            }
        }
        if (low.size() >= 5) {
            double[] line = Linear.line(col(low, 0), col(low, 1));
            stall = line == null ? Double.NaN : line[0];
        }
        if (Double.isNaN(stall) && !run.isEmpty()) {
            findings.add(DynoAnalyzer.finding("DYNO-NO-STALL", Severity.CAUTION, "Too few run-up samples below half"
                    + " the top speed to extrapolate the stall torque.", "Start logging before the air is turned on."));
        }
        double stallShaft = Double.isNaN(stall) ? Double.NaN : stall - law.constantNm();

        double noLoad = Double.NaN;
        String source = "unknown";
        Optional<Segment> steady = seg.steady();
        boolean openCircuit = true;
        if (steady.isPresent() && log.hasElectrical()) {
            double[] amp = log.currentsA().orElseThrow();
            double imax = 0;
            double isum = 0;
            for (double x : amp) {
                imax = Math.max(imax, Math.abs(x));
            }
            for (int k = steady.get().from(); k < steady.get().to(); k++) {
                isum += Math.abs(amp[k]);
            }
            openCircuit = isum / steady.get().length() <= GeneratorTerms.OPEN_CIRCUIT_SHARE * imax + 1e-3;
        }
        if (steady.isPresent() && openCircuit) {
            double s = 0;
            for (int k = steady.get().from(); k < steady.get().to(); k++) {
                s += log.speedRadPerS(k);
            }
            noLoad = s / steady.get().length();
            source = String.format(Locale.ROOT, "measured: mean speed of the steady stretch %.2f..%.2f s",
                    log.timeS(steady.get().from()), log.timeS(steady.get().to() - 1));
        } else if (!run.isEmpty()) {
            List<double[]> high = new ArrayList<>();
            for (DynoPoint p : run) {
                if (p.speedRadPerS() >= 0.5 * wMax) {
                    high.add(new double[] {p.speedRadPerS(), p.shaftTorqueNm()});
                }
            }
            double[] line = high.size() >= 5 ? Linear.line(col(high, 0), col(high, 1)) : null;
            if (line != null && line[1] < 0 && -line[0] / line[1] >= wMax) {
                noLoad = -line[0] / line[1];
                source = "extrapolated: shaft torque over the upper half of the run-up, straight line to zero";
            } else {
                noLoad = wMax;
                source = "lower bound: the highest speed of the run-up (no steady stretch without load)";
            }
            findings.add(DynoAnalyzer.finding("DYNO-NO-STEADY", Severity.CAUTION, "No unloaded steady stretch at top"
                    + " speed; the no-load speed is " + source + ".", "Let the rotor settle at top speed with no load"
                    + " for a few seconds before shutting the air off."));
        }
        double stop = Double.NaN;
        if (haveLoss && law.constantNm() > 0 && seg.coastDown().isPresent()) {
            double w0 = log.speedRadPerS(seg.coastDown().get().from());
            stop = CoastDown.timeBetweenS(inertia, law, w0, 0, 2000);
        }
        return new DynoSummary(pS, wS, pR, wR, stall, stallShaft, noLoad, source, ke, stop);
    }

    static Optional<Comparison> compare(Prediction p, List<DynoPoint> run, double noLoadSpeedRadPerS) {
        double sumRatio = 0;
        double sumSq = 0;
        int n = 0;
        for (DynoPoint d : run) {
            double w = d.speedRadPerS();
            if (w < 0.2 * noLoadSpeedRadPerS || w > 0.8 * noLoadSpeedRadPerS) {
                continue;
            }
            double measured = p.basis() == Prediction.Basis.ROTOR ? d.rotorTorqueNm() : d.shaftTorqueNm();
            double predicted = d.predictedTorqueNm();
            if (!Double.isFinite(predicted) || predicted == 0) {
                continue;
            }
            sumRatio += measured / predicted;
            sumSq += (measured - predicted) * (measured - predicted);
            n++;
        }
        if (n == 0) {
            return Optional.empty();
        }
        return Optional.of(new Comparison(p.label(), p.basis(), sumRatio / n, Math.sqrt(sumSq / n), n));
    }

    private static double[] col(List<double[]> rows, int c) {
        double[] out = new double[rows.size()];
        for (int k = 0; k < out.length; k++) {
            out[k] = rows.get(k)[c];
        }
        return out;
    }
}
