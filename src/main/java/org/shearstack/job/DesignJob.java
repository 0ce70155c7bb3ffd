package org.shearstack.job;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.shearstack.assembly.Kit;
import org.shearstack.check.Finding;
import org.shearstack.check.safety.SafetySummary;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.geom.GeometryContext;
import org.shearstack.io.report.BomLine;
import org.shearstack.io.report.Omission;
import org.shearstack.io.report.PartData;
import org.shearstack.io.report.PerformanceData;
import org.shearstack.io.report.PlateData;
import org.shearstack.io.report.Preview;
import org.shearstack.io.report.ReportData;
import org.shearstack.profile.Profiles;
import org.shearstack.rules.DesignResolver;
import org.shearstack.rules.Engine;
import org.shearstack.rules.RuleCatalog;
import org.shearstack.rules.geometry.GeoKeys;
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

    /** The geometry context of the design: the default grid and the spec's chord tolerance. */
    static GeometryContext geometryContext(ResolvedDesign design) {
        return design.key("output.chord-tolerance").flatMap(design::find)
                .map(GeometryContext::withChordTolerance).orElseGet(GeometryContext::standard);
    }

    /** The stages after the rules, for a design resolved elsewhere. */
    public static DesignResult fromDesign(ResolvedDesign design, JobOptions options) {
        List<Omission> omissions = new ArrayList<>();
        List<Finding> findings = new ArrayList<>();

        ModelSetup.Setup setup = ModelSetup.of(design);
        omissions.addAll(setup.notes());
        Optional<PerformanceData> performance = setup.model()
                .map(m -> PerformanceStage.run(m, design, options.mapPoints()));

        ChecksStage.Checks checks = ChecksStage.run(design, setup.model(), performance);
        findings.addAll(checks.findings());
        Optional<SafetySummary> safety = checks.safety();
        if (safety.isEmpty()) {
            omissions.add(new Omission("safety", "the burst check could not run: the design lacks the rotor or"
                    + " filament values it needs (see the BURST-RUNAWAY finding)."));
        }

        Optional<Kit> kit = Optional.empty();
        Preview preview;
        if (!options.meshes()) {
            omissions.add(new Omission("parts", "a check-only run: no parts, meshes or plates were built."));
            omissions.add(new Omission("bom", "a check-only run builds no kit, so there is no bill of materials."));
            preview = Preview.none("a check-only run builds no assembly.");
        } else if (!design.has(GeoKeys.CHAMBER_DIAMETER)) {
            omissions.add(new Omission("parts", "the design has no part dimensions (housing.chamber-diameter and the"
                    + " other GEO- values): the geometry rules did not run, so no kit was built."));
            omissions.add(new Omission("bom", "no kit was built, so there is no bill of materials."));
            preview = Preview.none("no kit was built, so there is no assembly to show.");
        } else {
            Kit k = Kit.build(design, geometryContext(design));
            kit = Optional.of(k);
            findings.addAll(k.findings());
            findings.addAll(ChecksStage.printability(design, k));
            preview = PreviewStage.render(k, options.preview());
        }
        List<PartData> parts = kit.map(k -> KitStage.parts(k, design)).orElse(List.of());
        List<BomLine> bom = kit.map(KitStage::bom).orElse(List.of());
        List<PlateData> plates = kit.map(KitStage::plates).orElse(List.of());

        ReportData report = new ReportData(design, setup.supply(), performance, safety, findings, parts, bom,
                plates, preview, omissions);
        return new DesignResult(design, report, kit);
    }
}
