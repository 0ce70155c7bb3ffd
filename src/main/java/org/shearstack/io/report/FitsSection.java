package org.shearstack.io.report;

import java.util.List;
import org.shearstack.check.Finding;

/** Section 6: fits (bearing seats, journals, screw holes, bores) and stack-ups (axial and radial). */
final class FitsSection {

    private FitsSection() {
    }

    /** Findings of the fit and stack-up checks (codes FIT-* and STACK-*), in report order. */
    static List<Finding> fitFindings(List<Finding> findings) {
        return findings.stream().filter(f -> f.code().startsWith("FIT-") || f.code().startsWith("STACK-")).toList();
    }

    static String html(ReportData r) {
        List<Finding> fits = fitFindings(r.findings());
        StringBuilder b = new StringBuilder(4096);
        b.append("<section id=\"fits\">\n<h2>Fits and stack-ups</h2>\n");
        if (fits.isEmpty()) {
            b.append("<p class=\"missing\">No fit or stack-up checks ran for this design.</p>\n");
        } else {
            b.append("<p>Clearance is hole minus shaft on diameter; a negative clearance is an interference."
                    + " Printed sizes include the printer's compensation and scatter.</p>\n");
            b.append(FindingsTable.html(fits, "fits"));
        }
        b.append("</section>\n");
        return b.toString();
    }
}
