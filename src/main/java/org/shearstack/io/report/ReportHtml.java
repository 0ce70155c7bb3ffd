package org.shearstack.io.report;

/**
 * report.html: one self-contained page (inline CSS and SVG, pictures as data URIs, no external references)
 * that is also well-formed XML. Sections: headline, cautions, performance, parts, derivations, fits and
 * stack-ups, findings, bill of materials and plates.
 */
public final class ReportHtml {

    private ReportHtml() {
    }

    public static String page(ReportData r) {
        StringBuilder b = new StringBuilder(262144);
        b.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\"/>\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\"/>\n<title>")
                .append(Xml.esc(r.design().name())).append(" - ShearStack report</title>\n<style>\n")
                .append(ReportStyle.CSS).append("</style>\n</head>\n<body>\n<main>\n");
        b.append(HeadlineSection.html(r));
        b.append(CautionsSection.html(r));
        b.append(PerformanceSection.html(r));
        b.append(PartsSection.html(r));
        b.append(DerivationsSection.html(r));
        b.append(FitsSection.html(r));
        b.append(FindingsSection.html(r));
        b.append(BomSection.html(r));
        b.append("<footer>ShearStack report format ").append(ReportJson.FORMAT_VERSION)
                .append(". The same content for scripts is in report.json. Predictions are estimates inside the band"
                        + " shown; measure your build before trusting a number near a limit.</footer>\n");
        b.append("</main>\n</body>\n</html>\n");
        return b.toString();
    }
}
