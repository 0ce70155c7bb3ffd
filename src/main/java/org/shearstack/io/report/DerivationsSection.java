package org.shearstack.io.report;

import java.util.Locale;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.rules.Derivation;
import org.shearstack.rules.Key;

/** Section 5: every value of the design with the rule that set it, its inputs and its source, expandable. */
final class DerivationsSection {

    private DerivationsSection() {
    }

    static String html(ReportData r) {
        ResolvedDesign d = r.design();
        StringBuilder b = new StringBuilder(65536);
        b.append("<section id=\"derivations\">\n<h2>Where every value comes from</h2>\n<p>")
                .append(d.keys().size()).append(" values. Open one to see its rule, inputs and source;")
                .append(" <code>shearstack explain SPEC KEY</code> prints the whole tree.</p>\n");
        String group = "";
        for (Key k : d.keys()) {
            String g = k.name().contains(".") ? k.name().substring(0, k.name().indexOf('.')) : k.name();
            if (!g.equals(group)) {
                if (!group.isEmpty()) {
                    b.append("</div>\n");
                }
                b.append("<h3>").append(Xml.esc(g)).append("</h3>\n<div class=\"group\">\n");
                group = g;
            }
            Derivation der = d.derivation(k);
            String origin = der.origin().name().toLowerCase(Locale.ROOT);
            b.append("<details data-key=\"").append(Xml.esc(k.name())).append("\"><summary><code>")
                    .append(Xml.esc(k.name())).append("</code> = <b>").append(Xml.esc(d.display(k)))
                    .append("</b> <span class=\"origin o-").append(origin).append("\">").append(origin)
                    .append("</span></summary>\n<dl>");
            b.append("<dt>rule</dt><dd><code>").append(Xml.esc(der.ruleId())).append("</code></dd>");
            if (der.formula() != null && !der.formula().isEmpty()) {
                b.append("<dt>how</dt><dd>").append(Xml.esc(der.formula())).append("</dd>");
            }
            if (!der.inputs().isEmpty()) {
                b.append("<dt>inputs</dt><dd><ul class=\"inputs\">");
                for (Derivation.Input in : der.inputs()) {
                    b.append("<li><code>").append(Xml.esc(in.key().name())).append("</code> = ")
                            .append(Xml.esc(in.value())).append("</li>");
                }
                b.append("</ul></dd>");
            }
            if (der.source() != null && !der.source().isEmpty()) {
                b.append("<dt>source</dt><dd>").append(Xml.esc(der.source())).append("</dd>");
            }
            d.overridden(k).ifPresent(o -> b.append("<dt>pinned</dt><dd>the rules would have chosen ")
                    .append(Xml.esc(o.value())).append(" (rule <code>").append(Xml.esc(o.derivation().ruleId()))
                    .append("</code>)</dd>"));
            b.append("</dl></details>\n");
        }
        if (!group.isEmpty()) {
            b.append("</div>\n");
        }
        b.append("</section>\n");
        return b.toString();
    }
}
