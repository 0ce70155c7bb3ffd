package org.shearstack.job;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.shearstack.check.Finding;
import org.shearstack.check.safety.BurstCheck;
import org.shearstack.check.safety.SafetySummary;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.io.report.Omission;
import org.shearstack.io.report.PerformanceData;
import org.shearstack.io.report.Preview;
import org.shearstack.io.report.ReportData;
import org.shearstack.profile.Profiles;
import org.shearstack.rules.DesignResolver;
import org.shearstack.rules.Engine;
import org.shearstack.rules.RuleCatalog;
import org.shearstack.spec.Spec;

/**
 * The one-way pipeline of one design, as a pure function: spec → rules (resolved design) → performance model →
 * checks (findings) → kit → report content. Nothing is written here (see {@link DesignOutput}); bad input throws
 * {@link org.shearstack.spec.BadInputException} before any work is done.
 */
public final class DesignJob {

    private DesignJob() {
    }

    /** Runs every registered rule. */
    public static DesignResult run(Spec spec, Profiles profiles, JobOptions options) {
        return run(spec, profiles, RuleCatalog.engine(profiles), options);
    }

    /** Runs with a given engine (tests, or a family sharing one engine across variants). */
    public static DesignResult run(Spec spec, Profiles profiles, Engine engine, JobOptions options) {
        ResolvedDesign design = DesignResolver.resolve(spec, profiles, engine);
        return fromDesign(design, options);
    }

    /** The stages after the rules, for a design resolved elsewhere. */
    public static DesignResult fromDesign(ResolvedDesign design, JobOptions options) {
        List<Omission> omissions = new ArrayList<>();
        List<Finding> findings = new ArrayList<>();

        ModelSetup.Setup setup = ModelSetup.of(design);
        omissions.addAll(setup.notes());
        Optional<PerformanceData> performance = setup.model()
                .map(m -> PerformanceStage.run(m, design, options.mapPoints()));

        double operating = performance.map(p -> p.operatingPoint().speedRadPerS()).orElse(Double.NaN);
        List<String> missing = new ArrayList<>();
        Optional<BurstCheck.Result> burst = SafetyStage.run(design, setup.model(), operating, missing);
        if (burst.isEmpty()) {
            omissions.add(new Omission("safety", "the burst check could not run: the design has no value for "
                    + String.join(", ", missing) + "."));
        }
        burst.ifPresent(b -> findings.addAll(b.findings()));
        Optional<SafetySummary> safety = burst.map(BurstCheck.Result::summary);

        omissions.add(new Omission("parts", "the kit generator (parts, meshes, assembly, plates) is not part of"
                + " this build yet; no STL or 3MF files were written."));
        omissions.add(new Omission("bom", "the bill of materials comes with the kit generator, not part of this"
                + " build yet."));
        Preview preview = Preview.none("there is no assembly to show without the kit generator.");

        ReportData report = new ReportData(design, setup.supply(), performance, safety, findings, List.of(),
                List.of(), List.of(), preview, omissions);
        return new DesignResult(design, report);
    }
}
