package org.shearstack.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.shearstack.check.CheckCatalog;
import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.check.design.RunawaySource;
import org.shearstack.check.print.PartPrintability;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.geom.GeometryContext;
import org.shearstack.rules.DesignResolver;
import org.shearstack.spec.Spec;
import org.shearstack.spec.SpecReader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code check SPEC}: every safety, fit, stack-up and printability check, without writing anything;
 * {@code check FILE.stl|FILE.3mf --printer NAME}: a mesh made elsewhere (see {@link MeshCheckRun}).
 */
@Command(name = "check", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Resolve a spec and run every check (burst at runaway, containment, rotor dynamics, bearings,"
                + " fits, stack-ups, printability). Writes nothing. Exit 0 when nothing fails, 3 when something does,"
                + " 2 on bad input.",
                "Given an STL or 3MF file (by extension or content) instead, checks it as a solid (closed, oriented,"
                + " shells, genus), slices it at the printer's layers for the printability checks and, for a 3MF,"
                + " checks its objects placed by the build for interference."})
public final class CheckCommand implements Callable<Integer> {

    @picocli.CommandLine.Spec
    CommandSpec command;

    @Parameters(index = "0", paramLabel = "SPEC|MESH", description = "The design spec (YAML), or an STL or 3MF file.")
    Path specFile;

    @Option(names = "--printer", paramLabel = "NAME",
            description = "Printer profile for a mesh check (required for STL/3MF; a spec names its own).")
    String printerName;

    @Option(names = "--filament", paramLabel = "NAME",
            description = "Filament profile for a mesh check (optional: mass estimate).")
    String filamentName;

    @Option(names = "--layers-per-slab", paramLabel = "N", defaultValue = "0",
            description = "Mesh check: slice every N layers (default: every layer, coarser for tall objects so that"
                    + " at most " + org.shearstack.check.mesh.SlicePlan.DEFAULT_MAX_SLABS + " slabs are checked).")
    int layersPerSlab;

    @Option(names = "--no-parts", description = "Skip the printability checks of the parts (faster).")
    boolean noParts;

    @Option(names = "--all", description = "List OK findings too, not only cautions and failures.")
    boolean all;

    @Mixin
    ProfileOptions profileOptions;

    @Override
    public Integer call() throws java.io.IOException {
        java.util.Optional<org.shearstack.io.mesh.MeshFiles.Kind> kind = org.shearstack.io.mesh.MeshFiles.kindOf(specFile);
        if (layersPerSlab < 0) {
            throw optionProblem("--layers-per-slab", "a whole number of layers, 1 or more (0 to choose)",
                    Integer.toString(layersPerSlab));
        }
        if (kind.isPresent()) {
            return MeshCheckRun.run(command.commandLine().getOut(), specFile, kind.get(), profileOptions.load(),
                    printerName, filamentName, layersPerSlab, all);
        }
        if (printerName != null || filamentName != null) {
            throw optionProblem(printerName != null ? "--printer" : "--filament",
                    "no printer or filament option with a spec (the spec names them), or an STL/3MF file",
                    "a spec: " + specFile);
        }
        Spec spec = SpecReader.read(specFile).orThrow();
        ResolvedDesign design = DesignResolver.resolve(spec, profileOptions.load());
        RunawaySource runaway = RunawaySource.performanceModelOrBound();
        List<Finding> findings = new ArrayList<>(CheckCatalog.run(design, runaway));
        if (!noParts) {
            double chord = design.key("output.chord-tolerance").flatMap(design::find)
                    .orElse(GeometryContext.DEFAULT_CHORD_TOLERANCE_MM);
            findings.addAll(PartPrintability.run(design, GeometryContext.withChordTolerance(chord)));
        }
        PrintWriter out = command.commandLine().getOut();
        out.println("design " + design.name() + " (" + specFile + ")");
        CheckCatalog.safetySummary(design, runaway).ifPresentOrElse(s -> out.println(String.format(Locale.ROOT,
                "SAFETY: maximum safe supply pressure %.2f bar(g)%s; runaway %.0f rpm at the spec's supply pressure,"
                        + " allowable %.0f rpm (%s)",
                s.maxSafeSupplyPressureBarG(), s.ceilingReached() ? " or more" : "", s.runawaySpeedRpm(),
                s.allowableSpeedRpm(), s.governingPart())),
                () -> out.println("SAFETY: the maximum safe supply pressure could not be computed (see BURST-RUNAWAY)"));
        out.println("CAUTION: spinning printed discs can burst and a printed housing holds compressed air: run behind"
                + " a guard, with eye protection, a regulator and a relief valve.");
        FindingLines.Counts counts = FindingLines.print(out, findings, all, "print frame");
        out.println();
        out.println(FindingLines.summary(counts));
        out.flush();
        return counts.fail() > 0 ? ExitCode.CHECK_FAILED.code() : ExitCode.OK.code();
    }

    private static org.shearstack.spec.BadInputException optionProblem(String option, String expected, String found) {
        return new org.shearstack.spec.BadInputException(List.of(new org.shearstack.spec.Problem("command line", 0, 0,
                option, expected, found, "")));
    }
}
