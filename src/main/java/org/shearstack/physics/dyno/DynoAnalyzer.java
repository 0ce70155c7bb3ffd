package org.shearstack.physics.dyno;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.shearstack.check.Finding;
import org.shearstack.check.Severity;

/**
 * The inertia (run-up / coast-down) dynamometer of physics.md §8.1: I dω/dt = T_rotor(ω) − T_loss(ω).
 * The coast-down gives T_loss = −I α_down, fitted as c0 + c1 ω + c2 ω²; the run-up gives the shaft torque
 * I α_up (plus k_e·I when a generator is loaded) and the rotor torque shaft + T_loss.
 */
public final class DynoAnalyzer {
    /** Fewest samples a log must have. */
    public static final int MIN_SAMPLES = 20;

    private DynoAnalyzer() {
    }

    /** Analyses one log. @throws IllegalArgumentException when the log has neither a run-up nor a coast-down */
    public static DynoResult analyze(SpeedLog raw, DynoInputs in) {
        boolean[] spikes = Outliers.find(raw.speedsRadPerS());
        List<Finding> findings = new ArrayList<>();
        SpeedLog log = raw;
        int nSpikes = 0;
        StringBuilder times = new StringBuilder();
        for (int i = 0; i < spikes.length; i++) {
            if (spikes[i]) {
                if (nSpikes < 10) {
                    times.append(nSpikes == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%.3f s", raw.timeS(i)));
                }
                nSpikes++;
            }
        }
        if (nSpikes > 0) {
            log = Outliers.without(raw, spikes);
            findings.add(finding("DYNO-SPIKES", Severity.CAUTION, String.format(Locale.ROOT, "Left out %d single-sample"
                    + " speed spike(s) far from their neighbours (at %s%s).", nSpikes, times, nSpikes > 10 ? ", …" : ""),
                    "Check the tachometer's reflective mark and its distance; spikes are missed or doubled pulses."));
        }
        if (log.size() < MIN_SAMPLES) {
            throw new IllegalArgumentException("the log has " + log.size() + " samples; at least " + MIN_SAMPLES
                    + " are needed");
        }
        Segments seg = segments(log, in);
        if (seg.runUp().isEmpty() && seg.coastDown().isEmpty()) {
            throw new IllegalArgumentException("no run-up and no coast-down found: the speed never rises or falls by"
                    + " 30 % of its top value; give them with --run-up/--coast-down START:END (seconds)");
        }
        Map<Segment.Kind, WindowChoice> windows = new EnumMap<>(Segment.Kind.class);
        double inertia = in.inertiaKgM2();
        double top = 0;
        for (int i = 0; i < log.size(); i++) {
            top = Math.max(top, log.speedRadPerS(i));
        }

        // coast-down → loss law
        Optional<LossFit.Result> loss = Optional.empty();
        List<CoastPoint> coast = new ArrayList<>();
        if (seg.coastDown().isPresent()) {
            Segment s = seg.coastDown().get();
            Fitted f = smooth(log, s, in, windows);
            int half = f.window.points() / 2;
            List<double[]> pts = new ArrayList<>();
            for (int k = 0; k < f.t.length; k++) {
                boolean use = k >= half && k < f.t.length - half && f.w[k] > SegmentDetector.LOW_SHARE * top;
                if (use) {
                    pts.add(new double[] {f.w[k], -inertia * f.a[k]});
                }
            }
            if (pts.size() >= 3) {
                double[] x = new double[pts.size()];
                double[] y = new double[pts.size()];
                for (int k = 0; k < x.length; k++) {
                    x[k] = pts.get(k)[0];
                    y[k] = pts.get(k)[1];
                }
                loss = Optional.of(LossFit.fit(x, y));
            } else {
                findings.add(finding("DYNO-COASTDOWN-SHORT", Severity.CAUTION, "The coast-down has too few samples"
                        + " after trimming the window at its ends to fit a loss law.", "Log the whole coast-down to"
                        + " standstill at a steady sample rate."));
            }
            LossLaw law = loss.map(LossFit.Result::law).orElse(LossLaw.NONE);
            for (int k = 0; k < f.t.length; k++) {
                boolean use = k >= half && k < f.t.length - half && f.w[k] > SegmentDetector.LOW_SHARE * top;
                coast.add(new CoastPoint(f.t[k], f.w[k], f.a[k], -inertia * f.a[k], law.torqueNm(f.w[k]), use));
            }
        } else {
            findings.add(finding("DYNO-NO-COASTDOWN", Severity.CAUTION, "No coast-down found: the rotor's own losses"
                    + " are unknown, so the rotor torque shown equals the shaft torque (losses taken as zero).",
                    "Shut the air off at top speed and keep logging until the rotor stops."));
        }
        loss.ifPresent(r -> findings.add(finding("DYNO-LOSS-FIT", Severity.OK, String.format(Locale.ROOT,
                "Loss torque from the coast-down: %.4g N·m + %.4g N·m·s/rad · ω + %.4g N·m·s²/rad² · ω² (%s),"
                        + " rms residual %.3g N·m over %d samples. With the air off the windage in the gaps differs"
                        + " from the running condition.", r.law().constantNm(), r.law().viscousNmPerRadPerS(),
                r.law().quadraticNmPerRadPerSSquared(), r.terms(), r.rmsNm(), r.samples()), "")));

        LossLaw law = loss.map(LossFit.Result::law).orElse(LossLaw.NONE);
        double ke = GeneratorTerms.backEmfConstant(log, top);
        if (log.hasElectrical() && Double.isNaN(ke)) {
            findings.add(finding("DYNO-NO-KE", Severity.CAUTION, "No open-circuit samples (current near zero) above"
                    + " 10 % of the top speed: the generator constant k_e and its torque are unknown.",
                    "Log a stretch with the load disconnected, e.g. the coast-down."));
        }

        List<DynoPoint> run = new ArrayList<>();
        if (seg.runUp().isPresent()) {
            Segment s = seg.runUp().get();
            Fitted f = smooth(log, s, in, windows);
            double[] volt = GeneratorTerms.smoothed(log.voltagesV(), s, f);
            double[] amp = GeneratorTerms.smoothed(log.currentsA(), s, f);
            int half = f.window.points() / 2;
            for (int k = half; k < f.t.length - half; k++) {
                double w = f.w[k];
                double gen = amp == null ? 0 : (Double.isNaN(ke) ? 0 : ke * amp[k]);
                double shaft = inertia * f.a[k] + gen;
                double lossT = law.torqueNm(w);
                double rotor = shaft + lossT;
                double pe = amp == null ? Double.NaN : volt[k] * amp[k];
                double eff = amp == null || Double.isNaN(ke) || Math.abs(amp[k]) < 1e-6 ? Double.NaN
                        : volt[k] / (ke * w);
                double pred = in.prediction().map(p -> p.torqueNm().applyAsDouble(w)).orElse(Double.NaN);
                run.add(new DynoPoint(f.t[k], w, f.a[k], lossT, gen, shaft, rotor, shaft * w, rotor * w, pe, eff, pred));
            }
        } else {
            findings.add(finding("DYNO-NO-RUNUP", Severity.CAUTION, "No run-up found: only the losses can be"
                    + " measured from this log.", "Start logging before the air is turned on."));
        }

        DynoSummary summary = Summaries.summarize(log, seg, run, law, loss.isPresent(), inertia, ke, findings);
        Optional<Comparison> cmp = in.prediction().flatMap(p -> Summaries.compare(p, run, summary.noLoadSpeedRadPerS()));
        findings.add(finding("DYNO-SAFETY", Severity.CAUTION, "A spinning printed rotor can burst: stand out of the"
                + " plane of the discs, wear eye protection and never exceed the design's speed limit on the bench.",
                ""));
        return new DynoResult(inertia, log, seg, windows, loss, run, CurvePoint.bin(run, in.prediction()), coast, summary, cmp, findings);
    }

    private static Segments segments(SpeedLog log, DynoInputs in) {
        Segments detected = SegmentDetector.detect(log);
        Optional<Segment> ru = in.runUp().map(r -> SegmentDetector.fromTimes(log, r, Segment.Kind.RUN_UP))
                .or(detected::runUp);
        Optional<Segment> cd = in.coastDown().map(r -> SegmentDetector.fromTimes(log, r, Segment.Kind.COAST_DOWN))
                .or(detected::coastDown);
        return new Segments(ru, detected.steady(), cd);
    }

    /** Smoothed speed and slope of one segment. */
    record Fitted(double[] t, double[] w, double[] a, WindowChoice window, int[] perSample) {
    }

    private static Fitted smooth(SpeedLog log, Segment s, DynoInputs in, Map<Segment.Kind, WindowChoice> windows) {
        SpeedLog part = log.slice(s.from(), s.to());
        double[] t = part.timesS();
        double[] w = part.speedsRadPerS();
        WindowChoice wc = in.windowPoints().isPresent() ? WindowChoice.given(in.windowPoints().getAsInt(), t)
                : WindowChoice.choose(t, w, s.kind().label());
        if (wc.points() > t.length) {
            throw new IllegalArgumentException("the " + s.kind().label() + " has " + t.length
                    + " samples, fewer than the window of " + wc.points());
        }
        SavitzkyGolay.Smoothed sm = SavitzkyGolay.apply(t, w, wc.points(), wc.order());
        int[] perSample = new int[t.length];
        java.util.Arrays.fill(perSample, wc.points());
        if (in.windowPoints().isEmpty()) {
            WindowChoice.Local local = WindowChoice.local(wc, t, w, sm.perSecond(), s.kind().label());
            wc = local.choice();
            perSample = local.windows();
            sm = SavitzkyGolay.apply(t, w, perSample, wc.order());
        }
        windows.put(s.kind(), wc);
        return new Fitted(t, sm.value(), sm.perSecond(), wc, perSample);
    }

    static Finding finding(String code, Severity sev, String message, String remedy) {
        return new Finding(code, sev, message, Double.NaN, Double.NaN, "", Double.NaN, "", "bench run", code, remedy,
                null);
    }
}
