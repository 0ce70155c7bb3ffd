package org.shearstack.job;

import java.util.Objects;
import java.util.Optional;
import org.shearstack.assembly.Kit;
import org.shearstack.check.Severity;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.io.report.ReportData;

/**
 * What one design job computed, in memory, before anything is written: the resolved design and the report's
 * content (performance, safety, findings, parts, BOM). A family command keeps these per variant.
 *
 * @param design  the resolved design
 * @param report  everything the report shows
 * @param kit     the parts with meshes, assembly, plates and BOM (empty for check-only runs or when the design
 *                has no part dimensions)
 */
public record DesignResult(ResolvedDesign design, ReportData report, Optional<Kit> kit) {

    public DesignResult {
        Objects.requireNonNull(design, "design");
        Objects.requireNonNull(report, "report");
        Objects.requireNonNull(kit, "kit");
    }

    /** OK, CAUTION or FAIL: the worst finding (an unchecked rotor is at least a CAUTION). */
    public Severity verdict() {
        return report.verdict();
    }

    /** True when some check failed (exit code 3 for the command line). */
    public boolean failed() {
        return verdict() == Severity.FAIL;
    }
}
