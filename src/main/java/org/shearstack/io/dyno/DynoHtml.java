package org.shearstack.io.dyno;

import org.shearstack.io.Html;
import java.util.List;
import java.util.Locale;
import org.shearstack.check.Finding;
import org.shearstack.physics.dyno.CoastPoint;
import org.shearstack.physics.dyno.CurvePoint;
import org.shearstack.physics.dyno.DynoPoint;
import org.shearstack.physics.dyno.DynoResult;
import org.shearstack.physics.dyno.DynoSummary;
import org.shearstack.physics.dyno.Segment;
import org.shearstack.physics.dyno.WindowChoice;

/** dyno.html: a self-contained page (no scripts, no external files) with inline SVG charts. */
public final class DynoHtml {
    private static final double RPM = DynoReport.RPM_PER_RAD_S;
    private static final String BLUE = "#1f5fa8";
    private static final String RED = "#b03a2e";
    private static final String GREEN = "#2e7d32";
    private static final String GREY = "#666666";

    private DynoHtml() {
    }

    public static String render(DynoReport rep) {
        DynoResult r = rep.result();
        StringBuilder s = new StringBuilder();
        s.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>Bench run: ")
                .append(Html.escape(rep.logSource())).append("</title>\n<style>\nbody{font-family:sans-serif;max-width:"
                        + "780px;margin:1em auto;color:#222}table{border-collapse:collapse}td,th{border:1px solid #ccc;"
                        + "padding:3px 8px;text-align:left}.caution{background:#fff4e0;border:1px solid #e0a030;"
                        + "padding:8px}.fail{color:#b03a2e}\n</style>\n</head>\n<body>\n");
        s.append("<h1>Bench run analysis</h1>\n<p>Log <code>").append(Html.escape(rep.logSource())).append("</code>: ")
                .append(r.log().size()).append(" samples; ").append(Html.escape(rep.logColumns())).append(".</p>\n");
        s.append("<p class=\"caution\"><b>Caution.</b> A spinning printed rotor can burst and a pressurised printed"
                + " housing can split. Stand out of the plane of the discs, wear eye protection, and never run above"
                + " the design's speed limit.</p>\n");
        summary(s, rep);
        s.append("<h2>Speed against time</h2>\n").append(speedChart(r));
        s.append("<h2>Torque against speed</h2>\n<p>Rotor torque is the air's torque on the discs, I·α plus the"
                + " coast-down loss; shaft torque is what a load can take, I·α (plus the generator's torque when"
                + " loaded). Lines are averages over speed bins, dots single samples.</p>\n").append(torqueChart(r));
        s.append("<h2>Power against speed</h2>\n").append(powerChart(r));
        if (!r.coastDown().isEmpty()) {
            s.append("<h2>Loss torque from the coast-down</h2>\n").append(lossChart(r));
        }
        s.append("<h2>Method</h2>\n<p>Inertia (acceleration) method: I dω/dt = T_rotor(ω) − T_loss(ω) during the"
                + " run-up and I dω/dt = −T_loss(ω) during the coast-down. Speed is smoothed and differentiated"
                + " with Savitzky–Golay least-squares fits (Savitzky &amp; Golay 1964, Anal. Chem. 36:1627) on the"
                + " actual sample times.</p>\n<ul>\n");
        for (var e : new java.util.TreeMap<>(r.windows()).entrySet()) {
            WindowChoice w = e.getValue();
            s.append("<li>").append(e.getKey().label()).append(" window: ").append(Html.escape(w.reason()))
                    .append("</li>\n");
        }
        s.append("</ul>\n<h2>Findings</h2>\n<ul>\n");
        for (Finding f : r.findings()) {
            s.append("<li").append(f.severity() == org.shearstack.check.Severity.FAIL ? " class=\"fail\"" : "")
                    .append("><b>").append(f.severity()).append(' ').append(Html.escape(f.code())).append("</b>: ")
                    .append(Html.escape(f.message()));
            if (!f.remedy().isEmpty()) {
                s.append(" <i>").append(Html.escape(f.remedy())).append("</i>");
            }
            s.append("</li>\n");
        }
        return s.append("</ul>\n</body>\n</html>\n").toString();
    }

    private static void summary(StringBuilder s, DynoReport rep) {
        DynoResult r = rep.result();
        DynoSummary m = r.summary();
        s.append("<h2>Summary</h2>\n<table>\n");
        rowSi(s, "Inertia used", r.inertiaKgM2(), "kg·m²", rep.inertiaSource());
        rowSi(s, "Peak shaft power", m.peakShaftPowerW(), "W", "at " + rpm(m.speedAtPeakShaftPowerRadPerS()));
        rowSi(s, "Peak rotor power", m.peakRotorPowerW(), "W", "at " + rpm(m.speedAtPeakRotorPowerRadPerS()));
        rowSi(s, "Stall torque (rotor), estimate", m.stallRotorTorqueNm() * 1e3, "mN·m",
                "straight line through the lower half of the run-up, at zero speed");
        s.append("<tr><th>No-load speed</th><td>").append(rpm(m.noLoadSpeedRadPerS())).append("</td><td>")
                .append(Html.escape(m.noLoadSource())).append("</td></tr>\n");
        r.loss().ifPresent(l -> {
            rowSi(s, "Loss: constant c0", l.law().constantNm() * 1e3, "mN·m", l.terms());
            rowSi(s, "Loss: viscous c1", l.law().viscousNmPerRadPerS(), "N·m·s/rad", "");
            rowSi(s, "Loss: quadratic c2", l.law().quadraticNmPerRadPerSSquared(), "N·m·s²/rad²",
                    String.format(Locale.ROOT, "rms residual %.3g mN·m", l.rmsNm() * 1e3));
            rowSi(s, "Coast-down stop time (fitted law)", m.coastDownStopTimeS(), "s", "from the coast-down's first speed");
        });
        if (Double.isFinite(m.backEmfConstantVsPerRad())) {
            rowSi(s, "Generator k_e", m.backEmfConstantVsPerRad(), "V·s/rad", "open-circuit samples");
        }
        r.comparison().ifPresent(c -> rowSi(s, "Measured / predicted torque", c.meanRatio(), "",
                String.format(Locale.ROOT, "%s torque vs %s, mean over %d samples at 20–80 %% of no-load speed;"
                        + " rms difference %.3g mN·m", c.basis().name().toLowerCase(Locale.ROOT), c.label(),
                        c.samples(), c.rmsDifferenceNm() * 1e3)));
        s.append("</table>\n");
    }

    private static void rowSi(StringBuilder s, String name, double v, String unit, String note) {
        s.append("<tr><th>").append(Html.escape(name)).append("</th><td>")
                .append(Double.isFinite(v) ? String.format(Locale.ROOT, "%.4g %s", v, unit).trim() : "unknown")
                .append("</td><td>").append(Html.escape(note)).append("</td></tr>\n");
    }

    private static String rpm(double radPerS) {
        return Double.isFinite(radPerS) ? String.format(Locale.ROOT, "%.0f rpm (%.1f rad/s)", radPerS * RPM, radPerS)
                : "unknown";
    }

    private static String speedChart(DynoResult r) {
        double[] t = r.log().timesS();
        double[] w = r.log().speedsRadPerS();
        for (int i = 0; i < w.length; i++) {
            w[i] *= RPM;
        }
        SvgChart c = new SvgChart("Speed against time", "time [s]", "speed [rpm]");
        for (Segment seg : r.segments().all()) {
            String colour = seg.kind() == Segment.Kind.RUN_UP ? GREEN : seg.kind() == Segment.Kind.COAST_DOWN ? RED
                    : GREY;
            c.band(t[seg.from()], t[seg.to() - 1], seg.kind().label(), colour);
        }
        return c.line("measured", t, w, BLUE, false).toSvg();
    }

    private static String torqueChart(DynoResult r) {
        List<CurvePoint> cv = r.curve();
        SvgChart c = new SvgChart("Torque against speed", "speed [rpm]", "torque [mN·m]");
        double[] sw = new double[r.runUp().size()];
        double[] st = new double[sw.length];
        for (int i = 0; i < sw.length; i++) {
            DynoPoint p = r.runUp().get(i);
            sw[i] = p.speedRadPerS() * RPM;
            st[i] = p.rotorTorqueNm() * 1e3;
        }
        c.points("", sw, st, BLUE);
        c.line("rotor torque, measured", col(cv, 0), col(cv, 2), BLUE, false);
        c.line("shaft torque, measured", col(cv, 0), col(cv, 1), GREEN, false);
        if (r.comparison().isPresent() || cv.stream().anyMatch(p -> Double.isFinite(p.predictedTorqueNm()))) {
            c.line("predicted", col(cv, 0), col(cv, 5), RED, true);
        }
        return c.toSvg();
    }

    private static String powerChart(DynoResult r) {
        List<CurvePoint> cv = r.curve();
        SvgChart c = new SvgChart("Power against speed", "speed [rpm]", "power [W]");
        c.line("rotor power, measured", col(cv, 0), col(cv, 4), BLUE, false);
        c.line("shaft power, measured", col(cv, 0), col(cv, 3), GREEN, false);
        if (cv.stream().anyMatch(p -> Double.isFinite(p.predictedTorqueNm()))) {
            double[] pp = new double[cv.size()];
            for (int i = 0; i < pp.length; i++) {
                pp[i] = cv.get(i).predictedTorqueNm() * cv.get(i).speedRadPerS();
            }
            c.line("predicted", col(cv, 0), pp, RED, true);
        }
        return c.toSvg();
    }

    private static String lossChart(DynoResult r) {
        List<CoastPoint> cp = r.coastDown();
        double[] w = new double[cp.size()];
        double[] m = new double[w.length];
        double[] f = new double[w.length];
        for (int i = 0; i < w.length; i++) {
            w[i] = cp.get(i).speedRadPerS() * RPM;
            m[i] = cp.get(i).usedInFit() ? cp.get(i).measuredLossTorqueNm() * 1e3 : Double.NaN;
            f[i] = cp.get(i).fittedLossTorqueNm() * 1e3;
        }
        return new SvgChart("Loss torque against speed (air off)", "speed [rpm]", "loss torque [mN·m]")
                .points("measured, −I·α", w, m, BLUE).line("fitted c0 + c1·ω + c2·ω²", w, f, RED, false).toSvg();
    }

    /** Column of the curve: 0 speed (rpm), 1 shaft torque, 2 rotor torque (mN·m), 3 shaft, 4 rotor power (W), 5 predicted torque. */
    private static double[] col(List<CurvePoint> cv, int k) {
        double[] out = new double[cv.size()];
        for (int i = 0; i < out.length; i++) {
            CurvePoint p = cv.get(i);
            out[i] = switch (k) {
                case 0 -> p.speedRadPerS() * RPM;
                case 1 -> p.shaftTorqueNm() * 1e3;
                case 2 -> p.rotorTorqueNm() * 1e3;
                case 3 -> p.shaftPowerW();
                case 4 -> p.rotorPowerW();
                default -> p.predictedTorqueNm() * 1e3;
            };
        }
        return out;
    }
}
