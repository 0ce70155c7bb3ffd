package org.shearstack.io.report;

import java.util.ArrayList;
import java.util.List;
import java.util.function.ToDoubleFunction;
import org.shearstack.physics.rotor.OperatingPoint;
import org.shearstack.physics.rotor.PerformanceCurve;

/**
 * Section 3: torque, power, efficiency and mass flow against speed, with the uncertainty band shaded, the
 * operating point and the runaway speed marked, and the generator's curves where the spec gives one.
 */
final class PerformanceSection {

    private PerformanceSection() {
    }

    /** The four plots, in page order. */
    static List<SvgPlot> plots(PerformanceData p) {
        List<SvgPlot> out = new ArrayList<>();
        out.add(plot(p, "Shaft torque", "torque (mN\u00b7m)", op -> op.shaftTorqueNm() * 1000, true));
        out.add(plot(p, "Shaft power", "power (W)", OperatingPoint::shaftPowerW, true));
        out.add(plot(p, "Efficiency on the isentropic power of the air", "efficiency (%)",
                op -> op.efficiency() * 100, false));
        out.add(plot(p, "Air mass flow", "mass flow (g/s)", op -> op.massFlowKgPerS() * 1000, false));
        return out;
    }

    static String html(ReportData r) {
        StringBuilder b = new StringBuilder(32768);
        b.append("<section id=\"performance\">\n<h2>Performance</h2>\n");
        if (r.performance().isEmpty()) {
            b.append("<p class=\"missing\">No performance map: ").append(Xml.esc(reason(r))).append("</p>\n");
            b.append("</section>\n");
            return b.toString();
        }
        PerformanceData p = r.performance().get();
        OperatingPoint op = p.operatingPoint();
        b.append("<p>Predicted from stall to runaway by the coupled model (supply path, nozzle, disc gaps, exhaust,"
                + " bearing and disc-face drag). The shaded band spans the optimistic and pessimistic readings of the"
                + " loss coefficients; the line is the estimate. Operating point: ")
                .append(Xml.esc(p.operatingBasis())).append(", ").append(Num.fixed(op.speedRpm(), 0)).append(" rpm, ")
                .append(Num.sig(op.shaftPowerW(), 3)).append(" W.</p>\n");
        if (p.map().fractionOutOfRange() > 0) {
            b.append("<p class=\"note\">").append(Num.fixed(p.map().fractionOutOfRange() * 100, 0))
                    .append(" % of the map lies outside the model's validity range (laminar gap flow, low relative"
                            + " Mach number); read those speeds as rough.</p>\n");
        }
        b.append("<div class=\"plots\">\n");
        for (SvgPlot plot : plots(p)) {
            b.append(plot.svg()).append('\n');
        }
        b.append("</div>\n</section>\n");
        return b.toString();
    }

    private static String reason(ReportData r) {
        return r.omissions().stream().filter(o -> o.section().equals("performance")).map(Omission::reason)
                .findFirst().orElse("the model could not be set up for this design.");
    }

    private static SvgPlot plot(PerformanceData p, String title, String yLabel, ToDoubleFunction<OperatingPoint> f,
            boolean generatorCurve) {
        PerformanceCurve est = p.map().estimate();
        List<SvgPlot.Series> series = new ArrayList<>();
        series.add(new SvgPlot.Series("estimate", "est", rpm(est), values(est, f)));
        List<SvgPlot.Band> bands = List.of(new SvgPlot.Band("uncertainty band", rpm(p.map().pessimistic()),
                values(p.map().pessimistic(), f), rpm(p.map().optimistic()), values(p.map().optimistic(), f)));
        if (generatorCurve && p.generator().isPresent()) {
            var g = p.generator().get();
            double cap = 1.25 * Math.max(max(values(p.map().optimistic(), f)), max(values(est, f)));
            List<PerformanceData.GeneratorSample> shown = new ArrayList<>();
            for (PerformanceData.GeneratorSample s : g.points()) {
                shown.add(s);
                if (genValue(s, title) > cap) {
                    break;
                }
            }
            double[] x = shown.stream().mapToDouble(s -> Num.rpm(s.speedRadPerS())).toArray();
            double[] y = shown.stream().mapToDouble(s -> genValue(s, title)).toArray();
            series.add(new SvgPlot.Series(title.startsWith("Shaft torque")
                    ? "generator load torque" : "generator, electric", "gen", x, y));
        }
        OperatingPoint op = p.operatingPoint();
        OperatingPoint last = est.points().get(est.points().size() - 1);
        List<SvgPlot.Mark> marks = List.of(
                new SvgPlot.Mark("operating point", op.speedRpm(), f.applyAsDouble(op)),
                new SvgPlot.Mark("runaway", Num.rpm(est.runawaySpeedRadPerS()), f.applyAsDouble(last)));
        return SvgPlot.of(title, "speed (rpm)", yLabel, series, bands, marks);
    }

    private static double genValue(PerformanceData.GeneratorSample s, String title) {
        return title.startsWith("Shaft torque") ? s.torqueNm() * 1000 : s.electricalPowerW();
    }

    private static double max(double[] v) {
        double m = 0;
        for (double x : v) {
            m = Double.isFinite(x) ? Math.max(m, x) : m;
        }
        return m;
    }

    private static double[] rpm(PerformanceCurve c) {
        return c.points().stream().mapToDouble(OperatingPoint::speedRpm).toArray();
    }

    private static double[] values(PerformanceCurve c, ToDoubleFunction<OperatingPoint> f) {
        return c.points().stream().mapToDouble(f).toArray();
    }
}
