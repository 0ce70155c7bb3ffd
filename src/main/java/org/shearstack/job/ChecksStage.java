package org.shearstack.job;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.shearstack.assembly.Kit;
import org.shearstack.check.CheckCatalog;
import org.shearstack.check.DesignValues;
import org.shearstack.check.Finding;
import org.shearstack.check.design.Caching;
import org.shearstack.check.design.RunawaySource;
import org.shearstack.check.design.TurbineRunaway;
import org.shearstack.check.flow.FlowChecks;
import org.shearstack.check.print.PrintLimits;
import org.shearstack.check.print.Printability;
import org.shearstack.check.safety.RunawayModel;
import org.shearstack.check.safety.SafetySummary;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.io.report.PerformanceData;
import org.shearstack.physics.rotor.TurbineModel;

/**
 * Every check of the design: the catalogue (burst at runaway, containment, rotor dynamics, bearings, fits,
 * stack-ups), the flow model's own findings, and printability of the kit's parts. The runaway comes from the
 * performance model's band when the design has a model (one cached model shared by every check), otherwise
 * from the locked-flow bound (an upper bound without losses, so it errs on the safe side).
 */
final class ChecksStage {

    /** The findings and the safety summary (empty when the burst check lacked inputs). */
    record Checks(List<Finding> findings, Optional<SafetySummary> safety) {
    }

    private ChecksStage() {
    }

    static Checks run(ResolvedDesign design, Optional<TurbineModel> model, Optional<PerformanceData> performance) {
        RunawaySource source = model.isPresent() ? shared(Caching.wrap(new TurbineRunaway(model.get())))
                : RunawaySource.lockedFlowBound();
        List<Finding> findings = new ArrayList<>(CheckCatalog.run(design, source));
        Optional<SafetySummary> safety = CheckCatalog.safetySummary(design, source);
        if (model.isPresent() && performance.isPresent()) {
            Values v = new Values(design);
            double delivery = v.optional("supply.compressor-delivery");
            findings.addAll(FlowChecks.check(model.get(), performance.get().map(),
                    Double.isNaN(delivery) ? OptionalDouble.empty() : OptionalDouble.of(delivery)));
        }
        return new Checks(findings, safety);
    }

    /**
     * Printability of every printed part of the kit, on the solids already built. Parts are checked in parallel
     * (each check is a pure function of its part); the findings keep the kit's part order.
     */
    static List<Finding> printability(ResolvedDesign design, Kit kit) {
        PrintLimits limits = PrintLimits.of(new DesignValues(design));
        return kit.printedParts().parallelStream()
                .map(p -> Printability.check(p.name(), p.solid(), limits))
                .flatMap(List::stream)
                .toList();
    }

    private static RunawaySource shared(RunawayModel m) {
        return v -> m;
    }
}
