package org.shearstack.io.report;

import org.shearstack.check.Severity;

/** Section 7: every finding with its margin, failures first. */
final class FindingsSection {

    private FindingsSection() {
    }

    static String html(ReportData r) {
        StringBuilder b = new StringBuilder(8192);
        long fail = r.findings().stream().filter(f -> f.severity() == Severity.FAIL).count();
        long caution = r.findings().stream().filter(f -> f.severity() == Severity.CAUTION).count();
        b.append("<section id=\"findings\">\n<h2>Findings</h2>\n<p>").append(r.findings().size())
                .append(r.findings().size() == 1 ? " finding: " : " findings: ").append(fail).append(" fail, ").append(caution).append(" caution, ")
                .append(r.findings().size() - fail - caution).append(" ok. Margin is the limit over the measured"
                        + " value unless the message says otherwise; above 1 is on the safe side.</p>\n");
        if (!r.findings().isEmpty()) {
            b.append(FindingsTable.html(r.findings(), "all"));
        }
        b.append("</section>\n");
        return b.toString();
    }
}
