package org.shearstack.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;

/** Prints findings on the terminal the same way for every check run; counts them by severity. */
final class FindingLines {

    private FindingLines() {
    }

    /** Counts of findings by severity. */
    record Counts(int fail, int caution, int ok) {
        int total() {
            return fail + caution + ok;
        }
    }

    /**
     * Prints the findings (OK ones only when {@code all}), each as a block: severity and code with the part, the
     * message, measured/limit/margin, location and remedy. The location is in {@code frame}.
     */
    static Counts print(PrintWriter out, List<Finding> findings, boolean all, String frame) {
        int fail = 0;
        int caution = 0;
        for (Finding f : findings) {
            if (f.severity() == Severity.FAIL) {
                fail++;
            } else if (f.severity() == Severity.CAUTION) {
                caution++;
            }
            if (f.severity() == Severity.OK && !all) {
                continue;
            }
            out.println();
            out.println(String.format(Locale.ROOT, "%-7s %s%s", f.severity(), f.code(),
                    f.part().isEmpty() ? "" : "  [" + f.part() + (f.feature().isEmpty() ? "" : ", " + f.feature()) + "]"));
            out.println("        " + f.message());
            if (!Double.isNaN(f.measured()) && !Double.isNaN(f.limit())) {
                out.println("        measured " + Findings.num(f.measured(), 4) + " " + f.unit() + ", limit "
                        + Findings.num(f.limit(), 4) + " " + f.unit()
                        + (Double.isNaN(f.margin()) ? "" : ", margin " + Findings.num(f.margin(), 3)));
            }
            if (f.where().isKnown()) {
                out.println(String.format(Locale.ROOT, "        at x %.2f, y %.2f, z %.2f mm (%s)",
                        f.where().xMm(), f.where().yMm(), f.where().zMm(), frame));
            }
            if (!f.remedy().isEmpty()) {
                out.println("        remedy: " + f.remedy());
            }
        }
        return new Counts(fail, caution, findings.size() - fail - caution);
    }

    /** The closing count line. */
    static String summary(Counts c) {
        return String.format(Locale.ROOT, "%d findings: %d fail, %d caution, %d ok", c.total(), c.fail(), c.caution(),
                c.ok());
    }
}
