package org.shearstack.io.report;

import org.shearstack.check.Finding;
import org.shearstack.check.Severity;

/** summary.md: the headline, the cautions and the failing and caution findings, for a terminal or a notebook. */
public final class SummaryMarkdown {

    private SummaryMarkdown() {
    }

    public static String text(ReportData r) {
        StringBuilder b = new StringBuilder(4096);
        b.append("# ").append(r.design().name()).append(": ").append(r.verdictWord().toUpperCase(java.util.Locale.ROOT))
                .append("\n\n");
        if (r.safety().isEmpty()) {
            b.append("**Maximum safe supply pressure: not computed.** Do not run this build under pressure.\n\n");
        }
        for (Headline.Figure f : Headline.figures(r)) {
            b.append("- ").append(HeadlineSection.capital(f.label())).append(": **").append(f.text()).append(' ')
                    .append(f.unit()).append("**\n");
        }
        if (!Headline.keyDimensions(r.design()).isEmpty()) {
            b.append("\n## Key dimensions\n\n");
            for (KeyDimension k : Headline.keyDimensions(r.design())) {
                b.append("- ").append(k.label()).append(": ").append(k.display()).append('\n');
            }
        }
        b.append("\n## Cautions\n\n");
        for (String c : Cautions.lines(r.safety())) {
            b.append("- ").append(c).append('\n');
        }
        long ok = r.findings().stream().filter(f -> f.severity() == Severity.OK).count();
        b.append("\n## Findings\n\n");
        for (Finding f : r.findings()) {
            if (f.severity() == Severity.OK) {
                continue;
            }
            b.append("- ").append(f.severity() == Severity.FAIL ? "**FAIL**" : "CAUTION").append(' ').append(f.code())
                    .append(f.part().isEmpty() ? "" : " (" + f.part() + ")").append(": ").append(f.message());
            if (!f.remedy().isEmpty()) {
                b.append(" Remedy: ").append(f.remedy());
            }
            b.append('\n');
        }
        b.append("- ").append(ok).append(" more checks passed (see report.html)\n");
        if (!r.omissions().isEmpty()) {
            b.append("\n## Not in this report\n\n");
            for (Omission o : r.omissions()) {
                b.append("- ").append(o.section()).append(": ").append(o.reason()).append('\n');
            }
        }
        return b.toString();
    }
}
