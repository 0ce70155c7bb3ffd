package org.shearstack.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.shearstack.assembly.Kit;
import org.shearstack.check.Finding;
import org.shearstack.rules.geometry.GeoKeys;
import org.shearstack.check.Severity;
import org.shearstack.check.safety.SafetySummary;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.io.report.Omission;
import org.shearstack.io.report.PerformanceData;
import org.shearstack.job.DesignJob;
import org.shearstack.job.DesignResult;
import org.shearstack.job.JobOptions;
import org.shearstack.view.HeadlineFigure;
import org.shearstack.view.DesignScenes;
import org.shearstack.view.KitScenes;
import org.shearstack.view.ViewScene;

/**
 * What the viewer shows of a design: the design job's kit (parts, spread, sections from the layered
 * solids), every finding of the job, the headline figures (operating point, runaway against allowable
 * speed, safe supply pressure) and what the job left out. Glue between the job and the viewer, kept here
 * so the viewer does not depend on the job (which uses the viewer for its report picture).
 */
final class DesignViewScenes {

    /**
     * Watch mode rebuilds on every save: the job runs without meshes (no report picture, a coarse map) and
     * the kit is built here at the preview faceting, which roughly halves the kit's cost against 0.01 mm.
     */
    static final JobOptions VIEW_JOB = new JobOptions(false, false, 11);

    private DesignViewScenes() {
    }

    static ViewScene of(ResolvedDesign design) {
        DesignResult checked = DesignJob.fromDesign(design, VIEW_JOB);
        if (!design.has(GeoKeys.CHAMBER_DIAMETER)) {
            return of(checked, Optional.empty());
        }
        return of(checked, Optional.of(Kit.build(design, DesignScenes.previewContext(design))));
    }

    /** A finished job's result, with its own kit. */
    static ViewScene of(DesignResult result) {
        return of(result, result.kit());
    }

    private static ViewScene of(DesignResult result, Optional<Kit> kit) {
        List<HeadlineFigure> figures = new ArrayList<>();
        result.report().performance().ifPresent(p -> figures.add(operatingPoint(p)));
        if (result.report().performance().isEmpty()) {
            // the rules may still have sized an operating point even when the job's model could not run
            DesignScenes.headlines(result.design()).stream().filter(h -> h.label().equals("operating point"))
                    .forEach(figures::add);
        }
        result.report().safety().ifPresent(s -> figures.addAll(safety(s)));
        List<String> notes = new ArrayList<>();
        for (Omission o : result.report().omissions()) {
            boolean builtHere = kit.isPresent() && result.kit().isEmpty() && PARTS_SECTIONS.contains(o.section());
            if (!builtHere) {
                notes.add(o.section() + ": " + o.reason());
            }
        }
        String title = result.design().name();
        if (kit.isEmpty()) {
            return new ViewScene(title, List.of(), result.report().findings(), figures, notes);
        }
        List<Finding> findings = new ArrayList<>(result.report().findings());
        if (result.kit().isEmpty()) {
            findings.addAll(kit.get().findings());
        }
        ViewScene parts = KitScenes.from(kit.get(), figures, notes);
        return new ViewScene(title, parts.parts(), findings, figures, notes);
    }

    /** Report sections a check-only job leaves out that this class fills by building the kit itself. */
    private static final java.util.Set<String> PARTS_SECTIONS = java.util.Set.of("parts", "bom");

    private static HeadlineFigure operatingPoint(PerformanceData p) {
        return new HeadlineFigure("operating point", String.format(Locale.ROOT, "%.0f rpm, %.2f W shaft (%s)",
                p.operatingPoint().speedRpm(), p.operatingPoint().shaftPowerW(), p.operatingBasis()), Severity.OK);
    }

    private static List<HeadlineFigure> safety(SafetySummary s) {
        Severity speed = s.runawaySpeedRadPerS() > s.allowableSpeedRadPerS() ? Severity.FAIL : Severity.OK;
        HeadlineFigure runaway = new HeadlineFigure("runaway vs allowable", String.format(Locale.ROOT,
                "%.0f vs %.0f rpm (%s)", s.runawaySpeedRpm(), s.allowableSpeedRpm(), s.governingPart()), speed);
        String pressure = s.ceilingReached() ? String.format(Locale.ROOT, "no limit found up to %.2f bar(g)",
                s.maxSafeSupplyPressureBarG()) : String.format(Locale.ROOT, "%.2f bar(g)", s.maxSafeSupplyPressureBarG());
        return List.of(runaway, new HeadlineFigure("safe supply pressure", pressure, Severity.OK));
    }
}
