package org.shearstack.io.calibration;

import java.util.List;
import java.util.Locale;
import org.shearstack.io.dyno.SvgChart;
import org.shearstack.physics.calibration.CalibrationFit;
import org.shearstack.physics.calibration.FittedCoefficient;

/** A self-contained page showing a calibration before and after against the measured run-up. */
public final class CalibrationHtml {
    private static final double RPM = 30 / Math.PI;

    private CalibrationHtml() {
    }

    public static String render(CalibrationFit f, String design, List<String> logs) {
        StringBuilder s = new StringBuilder();
        s.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>Calibration of ")
                .append(esc(design)).append("</title>\n<style>body{font-family:sans-serif;max-width:780px;margin:1em auto}"
                        + "td,th{border:1px solid #ccc;padding:3px 8px}table{border-collapse:collapse}</style>\n"
                        + "</head>\n<body>\n<h1>Calibration from bench runs</h1>\n<p>Design <code>")
                .append(esc(design)).append("</code>; logs: ").append(esc(String.join(", ", logs))).append(".</p>\n");
        s.append("<table>\n<tr><th>coefficient</th><th>before</th><th>after</th><th>status</th></tr>\n");
        for (FittedCoefficient c : f.coefficients()) {
            s.append(String.format(Locale.ROOT, "<tr><td>%s</td><td>%.4g</td><td>%.4g</td><td>%s</td></tr>%n",
                    esc(c.key()), c.before(), c.after(), esc(c.fitted() ? "fitted: " + c.note() : "kept: " + c.note())));
        }
        s.append("</table>\n");
        double m = f.measuredNoLoadRadPerS();
        s.append(String.format(Locale.ROOT, "<p>No-load speed: measured %.0f rpm; predicted %.0f rpm before (%+.1f %%),"
                + " %.0f rpm after (%+.1f %%).</p>%n", m * RPM, f.noLoadBeforeRadPerS() * RPM,
                100 * (f.noLoadBeforeRadPerS() / m - 1), f.noLoadAfterRadPerS() * RPM,
                100 * (f.noLoadAfterRadPerS() / m - 1)));
        int n = f.curve().size();
        double[] w = new double[n];
        double[] meas = new double[n];
        double[] before = new double[n];
        double[] after = new double[n];
        for (int i = 0; i < n; i++) {
            CalibrationFit.CurveSample c = f.curve().get(i);
            w[i] = c.speedRadPerS() * RPM;
            meas[i] = c.measuredShaftTorqueNm() * 1e3;
            before[i] = c.beforeShaftTorqueNm() * 1e3;
            after[i] = c.afterShaftTorqueNm() * 1e3;
        }
        if (n > 0) {
            s.append(new SvgChart("Shaft torque: measured, model before and after", "speed [rpm]", "torque [mN·m]")
                    .points("measured (run-up)", w, meas, "#1f5fa8").line("model before", w, before, "#888888", true)
                    .line("model after", w, after, "#b03a2e", false).toSvg());
        }
        s.append("<ul>\n");
        for (String note : f.notes()) {
            s.append("<li>").append(esc(note)).append("</li>\n");
        }
        return s.append("</ul>\n</body>\n</html>\n").toString();
    }

    private static String esc(String t) {
        return t.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
