package org.shearstack.io.report;

import java.util.List;

/** Section 1: design name, verdict, maximum safe supply pressure first, speeds, operating point, key dimensions. */
final class HeadlineSection {

    private HeadlineSection() {
    }

    static String html(ReportData r) {
        StringBuilder b = new StringBuilder(4096);
        String verdict = r.verdictWord();
        b.append("<header id=\"headline\">\n<div class=\"title\"><h1>").append(Xml.esc(r.design().name()))
                .append("</h1><p class=\"sub\">multiple-disc air turbine, designed from <code>")
                .append(Xml.esc(r.design().sourceFile())).append("</code></p></div>\n");
        b.append("<p class=\"verdict v-").append(verdict).append("\" data-path=\"verdict\">").append(verdict)
                .append("</p>\n</header>\n<section id=\"figures\">\n");
        List<Headline.Figure> figures = Headline.figures(r);
        if (r.safety().isEmpty()) {
            b.append("<p class=\"first missing\">Maximum safe supply pressure: not computed. Do not run this build"
                    + " under pressure until it has been checked (see below).</p>\n");
        }
        b.append("<table class=\"figures\">\n");
        boolean first = true;
        for (Headline.Figure f : figures) {
            b.append("<tr").append(first && r.safety().isPresent() ? " class=\"first\"" : "").append("><th>")
                    .append(Xml.esc(capital(f.label()))).append("</th><td><span class=\"fig\" data-path=\"")
                    .append(Xml.esc(f.jsonPath())).append("\">").append(f.text()).append("</span> ")
                    .append(Xml.esc(unit(f.unit()))).append("</td></tr>\n");
            first = false;
        }
        b.append("</table>\n");
        r.safety().filter(s -> s.ceilingReached()).ifPresent(s -> b.append("<p class=\"note\">The runaway stays within"
                + " the allowable speed up to the search ceiling of 16 bar(g); the figure is that ceiling, not a"
                + " limit of the rotor.</p>\n"));
        List<KeyDimension> dims = Headline.keyDimensions(r.design());
        if (!dims.isEmpty()) {
            b.append("<h2>Key dimensions</h2>\n<dl class=\"dims\">\n");
            for (KeyDimension k : dims) {
                b.append("<div><dt>").append(Xml.esc(k.label())).append("</dt><dd data-key=\"").append(Xml.esc(k.key()))
                        .append("\">").append(Xml.esc(k.display())).append("</dd></div>\n");
            }
            b.append("</dl>\n");
        }
        if (!r.omissions().isEmpty()) {
            b.append("<div class=\"omissions\"><h2>Not in this report</h2>\n<ul>\n");
            for (Omission o : r.omissions()) {
                b.append("<li><b>").append(Xml.esc(o.section())).append(":</b> ").append(Xml.esc(o.reason()))
                        .append("</li>\n");
            }
            b.append("</ul></div>\n");
        }
        b.append("</section>\n");
        return b.toString();
    }

    static String unit(String u) {
        return u.replace("N*m", "N\u00b7m");
    }

    static String capital(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
