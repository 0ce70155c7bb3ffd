package org.shearstack.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.shearstack.check.Finding;
import org.shearstack.check.Severity;
import org.shearstack.io.report.Headline;
import org.shearstack.io.report.Omission;
import org.shearstack.io.report.ReportData;
import org.shearstack.job.DesignJob;
import org.shearstack.job.DesignOutput;
import org.shearstack.job.DesignResult;
import org.shearstack.job.JobOptions;
import org.shearstack.profile.Profiles;
import org.shearstack.spec.Spec;
import org.shearstack.spec.SpecReader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code design SPEC [-o DIR]}: resolve, model, check and write the kit and its report. */
@Command(name = "design", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Size, check and generate a turbine from a spec; writes report.html, report.json and summary.md"
                + " (and the kit's files) into one folder, all or nothing.",
                "Exit codes: 0 ok, 2 bad input (nothing written), 3 written but a check FAILED, 1 internal error."})
public final class DesignCommand implements Callable<Integer> {

    /** Failing checks listed on the terminal before pointing to the report. */
    static final int MAX_FAILS_SHOWN = 8;

    @picocli.CommandLine.Spec
    CommandSpec command;

    @Parameters(index = "0", paramLabel = "SPEC", description = "The design spec (YAML).")
    Path specFile;

    @Option(names = {"-o", "--output"}, paramLabel = "DIR",
            description = "Output folder (replaced as a whole); default generated/<design name>.")
    Path output;

    @Option(names = "--check-only", description = "Resolve, model and check; write the report but no meshes.")
    boolean checkOnly;

    @Option(names = "--no-preview", description = "Do not try to render the assembly picture.")
    boolean noPreview;

    @Mixin
    ProfileOptions profileOptions;

    @Override
    public Integer call() {
        Spec spec = SpecReader.read(specFile).orThrow();
        Profiles profiles = profileOptions.load();
        JobOptions options = (checkOnly ? JobOptions.checkOnly() : JobOptions.full()).withPreview(!noPreview);
        DesignResult result = DesignJob.run(spec, profiles, options);
        Path folder = output != null ? output : DesignOutput.defaultFolder(result);
        PrintWriter out = command.commandLine().getOut();
        DesignOutput.Written written;
        try {
            written = DesignOutput.write(result, folder);
        } catch (IOException e) {
            PrintWriter err = command.commandLine().getErr();
            err.println("shearstack: could not write " + folder + ": " + e.getMessage()
                    + "; any previous output there is unchanged");
            err.flush();
            return ExitCode.INTERNAL_ERROR.code();
        }
        printSummary(out, result.report(), written);
        out.flush();
        return result.failed() ? ExitCode.CHECK_FAILED.code() : ExitCode.OK.code();
    }

    static void printSummary(PrintWriter out, ReportData r, DesignOutput.Written written) {
        out.println(r.design().name() + ": " + r.verdictWord().toUpperCase(java.util.Locale.ROOT));
        if (r.safety().isEmpty()) {
            out.println("  maximum safe supply pressure: NOT COMPUTED - do not run this build under pressure");
        }
        for (Headline.Figure f : Headline.figures(r)) {
            out.println(String.format(java.util.Locale.ROOT, "  %-44s %s %s", f.label(), f.text(), f.unit()));
        }
        // each failing check once per part, with how often it failed there
        java.util.Map<String, Integer> fails = new java.util.LinkedHashMap<>();
        java.util.Map<String, String> remedies = new java.util.HashMap<>();
        for (Finding f : r.findings()) {
            if (f.severity() == Severity.FAIL) {
                String what = f.code() + (f.part().isEmpty() ? "" : " (" + f.part() + ")");
                fails.merge(what, 1, Integer::sum);
                remedies.putIfAbsent(what, f.remedy());
            }
        }
        int shown = 0;
        for (var e : fails.entrySet()) {
            if (shown++ == MAX_FAILS_SHOWN) {
                out.println("  ... and " + (fails.size() - MAX_FAILS_SHOWN) + " more failing checks in the report");
                break;
            }
            String remedy = remedies.get(e.getKey());
            out.println("  FAIL " + e.getKey() + (e.getValue() > 1 ? " x" + e.getValue() : "")
                    + (remedy.isEmpty() ? "" : ": " + remedy));
        }
        for (Omission o : r.omissions()) {
            out.println("  not computed (" + o.section() + "): " + o.reason());
        }
        out.println("  report: " + written.report());
    }
}
