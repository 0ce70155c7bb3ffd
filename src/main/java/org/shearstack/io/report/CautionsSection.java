package org.shearstack.io.report;

/** Section 2: the cautions, before anything else a maker might act on. */
final class CautionsSection {

    private CautionsSection() {
    }

    static String html(ReportData r) {
        StringBuilder b = new StringBuilder(1024);
        b.append("<section id=\"cautions\" class=\"cautions\">\n<h2>Before you run it</h2>\n<ul>\n");
        for (String line : Cautions.lines(r.safety())) {
            b.append("<li>").append(Xml.esc(line)).append("</li>\n");
        }
        b.append("</ul>\n</section>\n");
        return b.toString();
    }
}
