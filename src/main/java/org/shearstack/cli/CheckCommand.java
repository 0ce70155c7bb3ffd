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

/** {@code check SPEC}: every safety, fit, stack-up and printability check, without writing anything. */
@Command(name = "check", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Resolve a spec and run every check (burst at runaway, containment, rotor dynamics, bearings,"
                + " fits, stack-ups, printability). Writes nothing. Exit 0 when nothing fails, 3 when something does.")
public final class CheckCommand implements Callable<Integer> {

    @picocli.CommandLine.Spec
    CommandSpec command;

    @Parameters(index = "0", paramLabel = "SPEC", description = "The design spec (YAML).")
    Path specFile;

    @Option(names = "--no-parts", description = "Skip the printability checks of the parts (faster).")
    boolean noParts;

    @Option(names = "--all", description = "List OK findings too, not only cautions and failures.")
    boolean all;

    @Mixin
    ProfileOptions profileOptions;

    @Override
    public Integer call() {
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
                out.println(String.format(Locale.ROOT, "        at x %.2f, y %.2f, z %.2f mm (print frame)",
                        f.where().xMm(), f.where().yMm(), f.where().zMm()));
            }
            if (!f.remedy().isEmpty()) {
                out.println("        remedy: " + f.remedy());
            }
        }
        out.println();
        out.println(String.format(Locale.ROOT, "%d findings: %d fail, %d caution, %d ok", findings.size(), fail, caution,
                findings.size() - fail - caution));
        out.flush();
        return fail > 0 ? ExitCode.CHECK_FAILED.code() : ExitCode.OK.code();
    }
}
