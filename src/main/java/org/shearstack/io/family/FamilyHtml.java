package org.shearstack.io.family;

import org.shearstack.io.Html;
import java.util.Locale;

/**
 * family.html: one self-contained page (inline CSS and SVG, no scripts, no external files) with the cautions, the
 * charts and the comparison table. Failing variants are marked red with their first failing finding; each variant
 * links to its own report when it has one.
 */
public final class FamilyHtml {

    public static final String FILE = "family.html";

    private static final String CSS = """
            body{font-family:system-ui,sans-serif;margin:1.5em;color:#222;max-width:1400px}
            h1{font-size:1.5em}h2{font-size:1.15em;margin-top:1.6em}
            .caution{border-left:4px solid #c60;background:#fff4e6;padding:.6em 1em}
            table{border-collapse:collapse;font-size:.85em}th,td{border:1px solid #ccc;padding:3px 6px}
            th{background:#f0f0f0;vertical-align:bottom}td.n{text-align:right;font-variant-numeric:tabular-nums}
            tr.fail td,tr.bad-input td,tr.error td{background:#fde8e8}tr.caution td.status{background:#fff4e6}
            tr.not-run td{color:#888}td.status{font-weight:bold}td.why{min-width:22em;font-size:.92em}
            .charts{display:flex;flex-wrap:wrap;gap:1em}
            svg.chart{border:1px solid #ddd;background:#fff}
            svg .title{font-size:13px;font-weight:bold}svg .tick{font-size:10px;fill:#333}svg .axis{font-size:11px}
            svg .frame{fill:none;stroke:#888}svg .grid{stroke:#eee}svg .ref{stroke:#c00;stroke-dasharray:5 3}
            svg .ref-label{fill:#c00}svg polyline.line{fill:none;stroke-width:1.5}svg .missing{fill:#c00;font-size:14px}
                        svg .s0{stroke:#1f77b4;fill:#1f77b4}svg .s1{stroke:#ff7f0e;fill:#ff7f0e}svg .s2{stroke:#2ca02c;fill:#2ca02c}
            svg .s3{stroke:#9467bd;fill:#9467bd}svg .s4{stroke:#8c564b;fill:#8c564b}svg .s5{stroke:#e377c2;fill:#e377c2}
            svg .s6{stroke:#7f7f7f;fill:#7f7f7f}svg .s7{stroke:#17becf;fill:#17becf}svg circle.pt{stroke-width:1}svg circle.pt.fail{stroke:#d00;stroke-width:2.5}
            """;

    private FamilyHtml() {
    }

    /** The page. */
    public static String page(FamilyTable t) {
        StringBuilder b = new StringBuilder();
        b.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>")
                .append(Html.escape(t.name())).append(" family</title>\n<style>\n").append(CSS).append("</style>\n")
                .append("</head>\n<body>\n");
        b.append("<h1>").append(Html.escape(t.name())).append(" family: ").append(t.rows().size()).append(" variant")
                .append(t.rows().size() == 1 ? "" : "s").append("</h1>\n");
        b.append("<p>From <code>").append(Html.escape(t.sourceFile())).append("</code>, varying ");
        for (int i = 0; i < t.keys().size(); i++) {
            b.append(i == 0 ? "" : i == t.keys().size() - 1 ? " and " : ", ").append("<code>")
                    .append(Html.escape(t.keys().get(i).key())).append("</code>");
        }
        b.append(t.keys().size() > 1 ? (t.zip() ? " together (zipped lists)" : " over every combination") : "")
                .append(t.checkOnly() ? "; checked only, no meshes." : ".").append("</p>\n");
        b.append("<p>").append(t.count(Status.PASS)).append(" pass, ").append(t.count(Status.CAUTION))
                .append(" caution, ").append(t.count(Status.FAIL)).append(" fail, ").append(t.count(Status.BAD_INPUT))
                .append(" bad input, ").append(t.count(Status.ERROR)).append(" error");
        if (t.count(Status.NOT_RUN) > 0) {
            b.append(", ").append(t.count(Status.NOT_RUN)).append(" not run (the family was stopped)");
        }
        b.append(".</p>\n");
        b.append("<div class=\"caution\"><strong>Caution.</strong> A printed rotor spinning fast can burst and a "
                + "pressurised printed housing can split. Wear eye protection, run behind a guard, keep a regulator "
                + "and a relief valve in the line, and never exceed a variant's maximum safe supply pressure or "
                + "allowable speed. These are estimates for hobby and teaching use; local codes and licensed "
                + "professional practice prevail.</div>\n");
        b.append("<h2>Charts</h2>\n<div class=\"charts\">\n");
        for (FamilyChart.Spec c : FamilyPlots.of(t)) {
            b.append(FamilyChart.svg(c));
        }
        b.append("</div>\n<p>Points ringed in red: variants whose checks failed. A red cross on the axis: a variant without"
                + " that value (bad input, error, not run or not computed).</p>\n");
        b.append("<h2>Comparison</h2>\n");
        table(b, t);
        b.append("<h2>How the figures are read</h2>\n<ul>\n");
        for (FamilyColumns.Figure f : FamilyColumns.FIGURES) {
            b.append("<li>").append(Html.escape(f.header())).append(" (").append(Html.escape(f.unit())).append("): ")
                    .append(f.reportPath().isEmpty() ? Html.escape(f.derivation())
                            : "report.json <code>" + Html.escape(f.reportPath()) + "</code>")
                    .append("</li>\n");
        }
        b.append("</ul>\n</body>\n</html>\n");
        return b.toString();
    }

    private static void table(StringBuilder b, FamilyTable t) {
        b.append("<table>\n<thead><tr><th>#</th><th>variant</th>");
        for (VariedKey k : t.keys()) {
            b.append("<th>").append(Html.escape(k.key())).append("</th>");
        }
        b.append("<th>verdict</th><th>first failure</th>");
        for (FamilyColumns.Dimension d : FamilyColumns.DIMENSIONS) {
            b.append("<th>").append(Html.escape(d.header())).append(d.unit().isEmpty() ? "" : " (" + d.unit() + ")")
                    .append("</th>");
        }
        for (FamilyColumns.Figure f : FamilyColumns.FIGURES) {
            b.append("<th>").append(Html.escape(f.header())).append(" (").append(Html.escape(f.unit())).append(")</th>");
        }
        b.append("</tr></thead>\n<tbody>\n");
        for (FamilyRow r : t.rows()) {
            String cls = r.status().word().replace(' ', '-');
            b.append("<tr class=\"").append(cls).append("\"><td class=\"n\">").append(r.index() + 1).append("</td><td>");
            boolean linked = r.status() != Status.BAD_INPUT && r.status() != Status.ERROR
                    && r.status() != Status.NOT_RUN;
            if (linked) {
                b.append("<a href=\"").append(Html.escape(href(r.name()))).append("/report.html\">")
                        .append(Html.escape(r.name())).append("</a>");
            } else {
                b.append(Html.escape(r.name()));
            }
            b.append("</td>");
            for (VariedValue v : r.values()) {
                b.append("<td>").append(Html.escape(v.written())).append("</td>");
            }
            b.append("<td class=\"status\">").append(r.status().word()).append("</td><td class=\"why\">")
                    .append(Html.escape(r.firstFailure())).append("</td>");
            double[] dims = r.dimensions();
            for (int i = 0; i < dims.length; i++) {
                boolean text = FamilyColumns.DIMENSIONS.get(i).text();
                b.append(text ? "<td>" : "<td class=\"n\">")
                        .append(Html.escape(text ? r.dimensionTexts().get(i) : trim(sig(dims[i], 4)))).append("</td>");
            }
            double[] figs = r.figures();
            for (int i = 0; i < figs.length; i++) {
                FamilyColumns.Figure f = FamilyColumns.FIGURES.get(i);
                b.append("<td class=\"n\">").append(format(figs[i], f.digits(), f.roundDown())).append("</td>");
            }
            b.append("</tr>\n");
        }
        b.append("</tbody>\n</table>\n");
    }

    /** Percent-encodes the characters of a folder name that a relative link cannot hold as they are. */
    static String href(String folder) {
        StringBuilder b = new StringBuilder();
        for (byte c : folder.getBytes(java.nio.charset.StandardCharsets.UTF_8)) {
            int u = c & 0xff;
            if (Character.isLetterOrDigit(u) && u < 128 || "-._~=,()+".indexOf(u) >= 0) {
                b.append((char) u);
            } else {
                b.append('%').append(String.format(Locale.ROOT, "%02X", u));
            }
        }
        return b.toString();
    }

    /** A number with fixed decimals (digits >= 0) or significant digits (digits < 0); "-" when not computed. */
    static String format(double v, int digits, boolean roundDown) {
        if (!Double.isFinite(v)) {
            return "-";
        }
        if (digits < 0) {
            return sig(v, -digits);
        }
        double shown = roundDown ? Math.floor(v * Math.pow(10, digits)) / Math.pow(10, digits) : v;
        return fixed(shown, digits);
    }

    /** "60.00" → "60", "0.8000" → "0.8". */
    static String trim(String s) {
        return s.contains(".") ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
    }

    static String sig(double v, int digits) {
        if (!Double.isFinite(v)) {
            return "-";
        }
        if (v == 0) {
            return "0";
        }
        int decimals = Math.max(0, digits - 1 - (int) Math.floor(Math.log10(Math.abs(v))));
        return fixed(v, decimals);
    }

    private static String fixed(double v, int decimals) {
        String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
        return s.matches("-0(\\.0*)?") ? s.substring(1) : s;
    }
}
