package org.shearstack.io.report;

import java.util.Base64;

/** Section 4: each printed part drawn in plan and section with its facts, and the assembly picture. */
final class PartsSection {

    private PartsSection() {
    }

    static String html(ReportData r) {
        StringBuilder b = new StringBuilder(32768);
        b.append("<section id=\"parts\">\n<h2>Parts</h2>\n");
        if (r.preview().png().isPresent()) {
            b.append("<figure class=\"preview\"><img alt=\"assembly of ").append(Xml.esc(r.design().name()))
                    .append("\" src=\"data:image/png;base64,")
                    .append(Base64.getEncoder().encodeToString(r.preview().png().get()))
                    .append("\"/><figcaption>The assembly as generated, cut through the axis.</figcaption></figure>\n");
        } else {
            b.append("<p class=\"note\">No assembly picture was rendered: ").append(Xml.esc(r.preview().note()))
                    .append("</p>\n");
        }
        if (r.parts().isEmpty()) {
            b.append("<p class=\"missing\">No printed parts in this report: ").append(Xml.esc(reason(r)))
                    .append("</p>\n");
        }
        for (PartData p : r.parts()) {
            b.append("<div class=\"part\" id=\"part-").append(Xml.esc(p.name())).append("\">\n<h3>")
                    .append(Xml.esc(p.name())).append(" <span class=\"count\">\u00d7 ").append(p.count())
                    .append("</span></h3>\n<div class=\"partbody\">\n");
            b.append(SectionDrawing.svg(p.name(), p.solid())).append('\n');
            b.append("<table class=\"facts\">\n");
            row(b, "material", p.material());
            row(b, "mass (each)", Num.sig(p.massG(), 3) + " g");
            row(b, "volume (each)", Num.sig(p.volumeMm3() / 1000, 3) + " cm\u00b3");
            row(b, "print orientation", p.printOrientation());
            for (KeyDimension k : p.keyDimensions()) {
                row(b, k.label(), k.display());
            }
            b.append("</table>\n</div>\n</div>\n");
        }
        b.append("</section>\n");
        return b.toString();
    }

    private static void row(StringBuilder b, String k, String v) {
        b.append("<tr><th>").append(Xml.esc(k)).append("</th><td>").append(Xml.esc(v)).append("</td></tr>\n");
    }

    private static String reason(ReportData r) {
        return r.omissions().stream().filter(o -> o.section().equals("parts")).map(Omission::reason).findFirst()
                .orElse("the kit was not generated.");
    }
}
