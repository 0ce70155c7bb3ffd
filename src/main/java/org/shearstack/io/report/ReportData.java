package org.shearstack.io.report;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.shearstack.check.Finding;
import org.shearstack.check.Severity;
import org.shearstack.check.safety.SafetySummary;
import org.shearstack.design.ResolvedDesign;

/**
 * Everything one design's report shows, computed before anything is written. Immutable.
 *
 * @param design       the resolved design (values and derivations)
 * @param supply       the supply characteristic, when known
 * @param performance  the predicted performance, when the design carries what the model needs
 * @param safety       the burst-at-runaway summary, when it could be computed
 * @param findings     every finding (sorted here: FAIL first, then CAUTION, then OK; by code within)
 * @param parts        the printed parts
 * @param bom          bill of materials
 * @param plates       print plates
 * @param preview      the assembly picture or why there is none
 * @param omissions    what could not be shown and why
 */
public record ReportData(ResolvedDesign design, Optional<SupplyData> supply, Optional<PerformanceData> performance,
        Optional<SafetySummary> safety, List<Finding> findings, List<PartData> parts, List<BomLine> bom,
        List<PlateData> plates, Preview preview, List<Omission> omissions) {

    /** FAIL first, then CAUTION, then OK; then by code, part and feature (stable order). */
    public static final Comparator<Finding> BY_SEVERITY = Comparator
            .comparing(Finding::severity, Comparator.reverseOrder())
            .thenComparing(Finding::code).thenComparing(Finding::part).thenComparing(Finding::feature)
            .thenComparing(Finding::message);

    public ReportData {
        Objects.requireNonNull(design, "design");
        Objects.requireNonNull(supply, "supply");
        Objects.requireNonNull(performance, "performance");
        Objects.requireNonNull(safety, "safety");
        List<Finding> sorted = new ArrayList<>(findings);
        sorted.sort(BY_SEVERITY);
        findings = List.copyOf(sorted);
        parts = List.copyOf(parts);
        bom = List.copyOf(bom);
        plates = List.copyOf(plates);
        Objects.requireNonNull(preview, "preview");
        omissions = List.copyOf(omissions);
    }

    /**
     * The verdict: FAIL when any finding fails; CAUTION when any finding is a caution or the safety summary
     * could not be computed (an unchecked rotor is never a pass); otherwise OK (shown as "pass").
     */
    public Severity verdict() {
        Severity worst = safety.isPresent() ? Severity.OK : Severity.CAUTION;
        for (Finding f : findings) {
            worst = worst.worst(f.severity());
        }
        return worst;
    }

    /** The verdict as the report prints it: pass, caution or fail. */
    public String verdictWord() {
        return switch (verdict()) {
            case OK -> "pass";
            case CAUTION -> "caution";
            case FAIL -> "fail";
        };
    }
}
