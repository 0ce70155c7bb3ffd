package org.shearstack.io.report;

/** Section 8: bill of materials and print plates. */
final class BomSection {

    private BomSection() {
    }

    static String html(ReportData r) {
        StringBuilder b = new StringBuilder(4096);
        b.append("<section id=\"bom\">\n<h2>Bill of materials and print plates</h2>\n");
        if (r.bom().isEmpty()) {
            b.append("<p class=\"missing\">No bill of materials: ").append(Xml.esc(reason(r, "bom"))).append("</p>\n");
        } else {
            double mass = 0;
            double minutes = 0;
            b.append("<table class=\"bom\">\n<thead><tr><th>item</th><th>kind</th><th>count</th><th>detail</th>")
                    .append("<th>mass</th><th>print time</th></tr></thead>\n<tbody>\n");
            for (BomLine l : r.bom()) {
                b.append("<tr><td>").append(Xml.esc(l.item())).append("</td><td>").append(Xml.esc(l.kind()))
                        .append("</td><td class=\"n\">").append(l.count()).append("</td><td>").append(Xml.esc(l.detail()))
                        .append("</td><td class=\"n\">").append(Double.isNaN(l.massG()) ? "" : Num.sig(l.massG(), 3) + " g")
                        .append("</td><td class=\"n\">").append(Double.isNaN(l.printTimeMin()) ? ""
                                : Num.fixed(l.printTimeMin(), 0) + " min").append("</td></tr>\n");
                mass += Double.isNaN(l.massG()) ? 0 : l.massG();
                minutes += Double.isNaN(l.printTimeMin()) ? 0 : l.printTimeMin();
            }
            b.append("</tbody>\n<tfoot><tr><th colspan=\"4\">printed parts in total</th><td class=\"n\">")
                    .append(Num.sig(mass, 3)).append(" g</td><td class=\"n\">").append(Num.fixed(minutes, 0))
                    .append(" min</td></tr></tfoot>\n</table>\n");
        }
        if (!r.plates().isEmpty()) {
            b.append("<h3>Print plates</h3>\n<ol class=\"plates\">\n");
            for (PlateData p : r.plates()) {
                b.append("<li><code>").append(Xml.esc(p.file())).append("</code>: ")
                        .append(Xml.esc(String.join(", ", p.parts()))).append("</li>\n");
            }
            b.append("</ol>\n");
        }
        b.append("</section>\n");
        return b.toString();
    }

    private static String reason(ReportData r, String section) {
        return r.omissions().stream().filter(o -> o.section().equals(section)).map(Omission::reason).findFirst()
                .orElse("the kit was not generated.");
    }
}
