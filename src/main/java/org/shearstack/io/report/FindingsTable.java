package org.shearstack.io.report;

import java.util.List;
import java.util.Locale;
import org.shearstack.check.Finding;

/** A table of findings with severity, code, part and feature, measured against limit, margin, message and remedy. */
final class FindingsTable {

    private FindingsTable() {
    }

    static String html(List<Finding> findings, String cssClass) {
        StringBuilder b = new StringBuilder(8192);
        b.append("<table class=\"findings ").append(cssClass).append("\">\n<thead><tr><th>severity</th><th>code</th>")
                .append("<th>part / feature</th><th>measured</th><th>limit</th><th>margin</th><th>what it means</th>")
                .append("</tr></thead>\n<tbody>\n");
        for (Finding f : findings) {
            String sev = f.severity().name().toLowerCase(Locale.ROOT);
            b.append("<tr class=\"s-").append(sev).append("\"><td><span class=\"sev s-").append(sev).append("\">")
                    .append(sev).append("</span></td><td><code>").append(Xml.esc(f.code())).append("</code></td><td>")
                    .append(Xml.esc(f.part())).append(f.feature().isEmpty() ? "" : "<br/><small>"
                            + Xml.esc(f.feature()) + "</small>")
                    .append("</td><td class=\"n\">").append(value(f.measured(), f.unit())).append("</td><td class=\"n\">")
                    .append(value(f.limit(), f.unit())).append("</td><td class=\"n\">").append(Num.sig(f.margin(), 3))
                    .append("</td><td>").append(Xml.esc(f.message()));
            if (!f.remedy().isEmpty()) {
                b.append("<div class=\"remedy\"><b>Remedy:</b> ").append(Xml.esc(f.remedy())).append("</div>");
            }
            b.append("</td></tr>\n");
        }
        b.append("</tbody>\n</table>\n");
        return b.toString();
    }

    private static String value(double v, String unit) {
        return Double.isNaN(v) ? "-" : Xml.esc(Num.sig(v, 4) + (unit.isEmpty() ? "" : " " + unit));
    }
}
