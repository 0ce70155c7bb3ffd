package org.shearstack.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.shearstack.family.DesignPipeline;
import org.shearstack.family.FamilyPlan;
import org.shearstack.family.FamilyRunner;
import org.shearstack.family.VaryOption;
import org.shearstack.io.family.FamilyHtml;
import org.shearstack.io.family.FamilyTable;
import org.shearstack.io.family.FamilyWriter;
import org.shearstack.io.family.Status;
import org.shearstack.profile.Profiles;
import org.shearstack.spec.FamilySection;
import org.shearstack.spec.Spec;
import org.shearstack.spec.SpecReader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code family SPEC --vary KEY=V1,V2,... [--zip] [--check-only] [-o DIR] [--jobs N]}: every variant resolved,
 * checked and generated into its own folder, in parallel, and a comparison table (family.csv, family.html).
 */
@Command(name = "family", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Design a family of turbines from one spec: vary keys over lists of values (every combination,"
                + " or zipped lists), run every variant into its own folder, and compare them in family.csv and"
                + " family.html.",
                "Without --vary, the spec's family: section says what to vary.",
                "Exit codes: 0 ok, 2 bad input (nothing written), 3 some variant failed a check or had bad values,"
                        + " 1 internal error."})
public final class FamilyCommand implements Callable<Integer> {

    /** How long Ctrl-C waits for the variants in flight before giving them up. */
    static final long STOP_WAIT_SECONDS = 60;

    @picocli.CommandLine.Spec
    CommandSpec command;

    @Parameters(index = "0", paramLabel = "SPEC", description = "The base spec (YAML).")
    Path specFile;

    @Option(names = "--vary", paramLabel = "KEY=V1,V2,...",
            description = "A spec key and its values, with units, e.g. rotor.diameter=60mm,80mm,100mm or"
                    + " filament=pla,petg. Repeat for more keys. Replaces the spec's family: section.")
    List<String> vary = new ArrayList<>();

    @Option(names = "--zip", description = "Pair the lists in order (the i-th value of each) instead of taking"
            + " every combination; the lists must be equally long.")
    boolean zip;

    @Option(names = "--check-only", description = "Resolve, model and check every variant; write the table and each"
            + " variant's report.json, but no meshes (fast sweeps).")
    boolean checkOnly;

    @Option(names = {"-o", "--output"}, paramLabel = "DIR",
            description = "Family folder: family.csv, family.html and one folder per variant; default"
                    + " generated/<name>-family.")
    Path output;

    @Option(names = "--jobs", paramLabel = "N", description = "Variants run at once (default: the number of cores).")
    Integer jobs;

    @Option(names = "--progress", paramLabel = "WHEN", description = "Progress line redrawn in place: auto (when"
            + " on a terminal), always or never (one line per tenth of the family). Default: ${DEFAULT-VALUE}.",
            defaultValue = "auto")
    ProgressMode progress;

    @Mixin
    ProfileOptions profileOptions;

    /** When the progress line is redrawn in place. */
    enum ProgressMode { AUTO, ALWAYS, NEVER }

    @Override
    public Integer call() throws IOException {
        PrintWriter out = command.commandLine().getOut();
        PrintWriter err = command.commandLine().getErr();
        Spec base = SpecReader.read(specFile).orThrow();
        List<FamilySection.Vary> varied;
        boolean zipped = zip;
        if (!vary.isEmpty()) {
            varied = VaryOption.parse(vary);
        } else {
            String text = Files.readString(specFile, StandardCharsets.UTF_8);
            FamilySection section = FamilySection.read(specFile.toString(), text).orThrow();
            varied = section.vary();
            zipped = zipped || section.zip();
        }
        FamilyPlan plan = FamilyPlan.of(base, varied, zipped);
        if (jobs != null && jobs < 1) {
            throw new picocli.CommandLine.ParameterException(command.commandLine(),
                    "--jobs: expected a whole number of at least 1, found " + jobs);
        }
        int workers = jobs != null ? jobs : Runtime.getRuntime().availableProcessors();
        Profiles profiles = profileOptions.load();
        Path folder = output != null ? output : Path.of("generated", base.name() + "-family");

        FamilyRunner.Stop stop = new FamilyRunner.Stop();
        CountDownLatch finished = new CountDownLatch(1);
        Thread hook = new Thread(() -> onInterrupt(stop, finished, folder, err), "family-stop");
        Runtime.getRuntime().addShutdownHook(hook);
        boolean inPlace = progress == ProgressMode.ALWAYS || progress == ProgressMode.AUTO && System.console() != null;
        FamilyProgress bar = new FamilyProgress(err, inPlace, System::nanoTime);
        try {
            FamilyRunner.Result result = FamilyRunner.run(plan, DesignPipeline.of(profiles, checkOnly), folder,
                    workers, checkOnly, bar, stop);
            if (result.stopped()) {
                bar.close();
            }
            FamilyWriter.write(result.table(), folder);
            printSummary(out, result, folder);
            result.firstError().ifPresent(e -> {
                err.println("shearstack: internal error in a variant (listed in the table): " + e);
                for (StackTraceElement s : e.getStackTrace()) {
                    err.println("    at " + s);
                }
            });
            err.flush();
            out.flush();
            FamilyTable t = result.table();
            if (result.firstError().isPresent()) {
                return ExitCode.INTERNAL_ERROR.code();
            }
            return t.count(Status.FAIL) + t.count(Status.BAD_INPUT) > 0 ? ExitCode.CHECK_FAILED.code()
                    : ExitCode.OK.code();
        } finally {
            finished.countDown();
            try {
                Runtime.getRuntime().removeShutdownHook(hook);
            } catch (IllegalStateException shuttingDown) {
                // the hook is running: it waits for the latch above
            }
        }
    }

    /**
     * Ctrl-C: no new variant starts; the ones in flight finish (each writes its folder atomically) and the table
     * is written with the rest marked "not run". Should that take too long, the half-written temporary folders of
     * the variants still in flight are removed so no half-written folder stays behind.
     */
    private static void onInterrupt(FamilyRunner.Stop stop, CountDownLatch finished, Path folder, PrintWriter err) {
        if (finished.getCount() == 0) {
            return;
        }
        stop.request();
        err.println();
        err.println("family: stopping; finishing the variants in flight (finished variants stay as they are)");
        err.flush();
        try {
            if (!finished.await(STOP_WAIT_SECONDS, TimeUnit.SECONDS)) {
                FamilyWriter.removeUnfinished(folder);
                err.println("family: gave up the variants in flight");
                err.flush();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private static void printSummary(PrintWriter out, FamilyRunner.Result r, Path folder) {
        FamilyTable t = r.table();
        out.println(t.name() + " family: " + t.rows().size() + " variant" + (t.rows().size() == 1 ? "" : "s") + ": "
                + t.count(Status.PASS) + " pass, " + t.count(Status.CAUTION) + " caution, " + t.count(Status.FAIL)
                + " fail, " + t.count(Status.BAD_INPUT) + " bad input, " + t.count(Status.ERROR) + " error"
                + (r.stopped() ? ", " + t.count(Status.NOT_RUN) + " not run (stopped)" : ""));
        t.rows().stream().filter(row -> row.status().failed()).limit(10).forEach(row ->
                out.println("  " + row.status().word().toUpperCase(java.util.Locale.ROOT) + " " + row.name() + ": "
                        + row.firstFailure()));
        if (t.failures() > 10) {
            out.println("  ... and " + (t.failures() - 10) + " more in the table");
        }
        out.println("  table: " + folder.resolve(FamilyHtml.FILE));
    }
}
