package org.shearstack.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.concurrent.Callable;
import org.shearstack.check.Finding;
import org.shearstack.check.Severity;
import org.shearstack.io.benchlog.BenchLog;
import org.shearstack.io.benchlog.BenchLogException;
import org.shearstack.io.benchlog.BenchLogOptions;
import org.shearstack.io.benchlog.BenchLogReader;
import org.shearstack.io.benchlog.LogTimeUnit;
import org.shearstack.io.benchlog.SpeedUnit;
import org.shearstack.io.dyno.DynoReport;
import org.shearstack.io.dyno.DynoReportWriter;
import org.shearstack.physics.dyno.DynoAnalyzer;
import org.shearstack.physics.dyno.DynoInputs;
import org.shearstack.physics.dyno.DynoResult;
import org.shearstack.physics.dyno.DynoSummary;
import org.shearstack.physics.dyno.TimeRange;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code shearstack dyno LOG.csv --design DIR|SPEC [--extra-inertia ...] [-o DIR]}: torque and power from a
 * tachometer log by the inertia method; writes dyno.html, dyno.csv and dyno.json.
 */
@Command(name = "dyno", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Torque and power from a run-up / coast-down speed log, without a torque sensor.",
            "Writes dyno.html, dyno.csv and dyno.json."})
public final class DynoCommand implements Callable<Integer> {
    private static final int EXIT_BAD_INPUT = ExitCode.BAD_INPUT.code();

    @Spec
    CommandSpec spec;

    @picocli.CommandLine.Mixin
    ProfileOptions profileOptions;

    private final DesignLink.Source designs;

    /** The command as the command line builds it: designs are resolved from their spec. */
    public DynoCommand() {
        this(null);
    }

    DynoCommand(DesignLink.Source designs) {
        this.designs = designs;
    }

    private DesignLink.Source designs() {
        return designs != null ? designs : new SpecDesigns(profileOptions.load());
    }

    @Parameters(index = "0", paramLabel = "LOG.csv", description = "Speed log: time, speed, optional voltage and current.")
    Path log;

    @Option(names = "--design", paramLabel = "DIR|SPEC",
            description = "Design folder or spec file: the rotor inertia and the predicted torque come from it.")
    Path design;

    @Option(names = "--inertia", paramLabel = "I", converter = InertiaConverter.class,
            description = "Inertia of everything that spins (replaces the design's), e.g. 9.7e-5 or '97 kg*mm^2'.")
    Double inertiaKgM2;

    @Option(names = "--extra-inertia", paramLabel = "I", converter = InertiaConverter.class, defaultValue = "0",
            description = "Inertia added to the design's: generator rotor, coupling, hub (kg*m^2 unless a unit is"
                    + " given).")
    double extraInertiaKgM2;

    @Option(names = "--time-unit", paramLabel = "s|ms", description = "Unit of the time column if the header has none.")
    String timeUnit;

    @Option(names = "--speed-unit", paramLabel = "rpm|Hz|rad/s",
            description = "Unit of the speed column if the header has none.")
    String speedUnit;

    @Option(names = "--run-up", paramLabel = "START:END", description = "Run-up time range in seconds (default: detected).")
    String runUp;

    @Option(names = "--coast-down", paramLabel = "START:END",
            description = "Coast-down time range in seconds (default: detected).")
    String coastDown;

    @Option(names = "--window", paramLabel = "POINTS",
            description = "Savitzky-Golay window in samples, odd (default: chosen from the sample rate).")
    Integer window;

    @Option(names = {"-o", "--output"}, paramLabel = "DIR", description = "Output folder (default: dyno-<log name>).")
    Path output;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        try {
            BenchLogOptions opts = new BenchLogOptions(
                    Optional.ofNullable(timeUnit).map(u -> LogTimeUnit.fromSymbol(u).orElseThrow(
                            () -> new IllegalArgumentException("--time-unit: expected s or ms, found '" + u + "'"))),
                    Optional.ofNullable(speedUnit).map(u -> SpeedUnit.fromSymbol(u).orElseThrow(
                            () -> new IllegalArgumentException("--speed-unit: expected rpm, Hz or rad/s, found '" + u
                                    + "'"))));
            BenchLog bench;
            try {
                bench = BenchLogReader.read(log, opts);
            } catch (IOException e) {
                err.println(log + ": cannot read: " + e.getMessage());
                return EXIT_BAD_INPUT;
            }
            DesignLink.Data d;
            try {
                d = DesignLink.load(design == null ? null : designs(), design, inertiaKgM2, extraInertiaKgM2);
            } catch (IllegalArgumentException e) {
                err.println(e.getMessage());
                return EXIT_BAD_INPUT;
            }
            DynoInputs in = new DynoInputs(d.inertiaKgM2(),
                    Optional.ofNullable(runUp).map(r -> range("--run-up", r)),
                    Optional.ofNullable(coastDown).map(r -> range("--coast-down", r)),
                    window == null ? OptionalInt.empty() : OptionalInt.of(window), d.prediction());
            DynoResult r = DynoAnalyzer.analyze(bench.log(), in);
            r = withReaderFindings(r, bench);
            Path folder = output != null ? output : Path.of("dyno-" + stem(log));
            DynoReportWriter.write(new DynoReport(r, log.toString(), bench.columns(), d.inertiaSource()), folder);
            print(out, r, folder);
            return ExitCode.OK.code();
        } catch (BenchLogException e) {
            err.println(e.getMessage());
            return EXIT_BAD_INPUT;
        } catch (IllegalArgumentException e) {
            err.println(log + ": " + e.getMessage());
            return EXIT_BAD_INPUT;
        } catch (IOException e) {
            err.println("cannot write the results: " + e.getMessage());
            return ExitCode.INTERNAL_ERROR.code();
        }
    }

    private static TimeRange range(String option, String text) {
        try {
            return TimeRange.parse(text);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(option + ": " + e.getMessage(), e);
        }
    }

    private static DynoResult withReaderFindings(DynoResult r, BenchLog b) {
        java.util.List<Finding> all = new java.util.ArrayList<>(b.findings());
        all.addAll(r.findings());
        return new DynoResult(r.inertiaKgM2(), r.log(), r.segments(), r.windows(), r.loss(), r.runUp(), r.curve(),
                r.coastDown(), r.summary(), r.comparison(), all);
    }

    private static String stem(Path p) {
        String n = p.getFileName().toString();
        int dot = n.lastIndexOf('.');
        return dot > 0 ? n.substring(0, dot) : n;
    }

    private static void print(PrintWriter out, DynoResult r, Path folder) {
        DynoSummary s = r.summary();
        double rpm = 30 / Math.PI;
        out.printf(Locale.ROOT, "inertia %.4g kg*m^2; segments: %s%n", r.inertiaKgM2(), r.segments().all().stream()
                .map(x -> String.format(Locale.ROOT, "%s %.2f-%.2f s", x.kind().label(), r.log().timeS(x.from()),
                        r.log().timeS(x.to() - 1))).reduce((a, b) -> a + ", " + b).orElse("none"));
        out.printf(Locale.ROOT, "peak shaft power %.4g W at %.0f rpm; stall torque %.4g mN*m; no-load speed %.0f rpm%n",
                s.peakShaftPowerW(), s.speedAtPeakShaftPowerRadPerS() * rpm, s.stallRotorTorqueNm() * 1e3,
                s.noLoadSpeedRadPerS() * rpm);
        r.loss().ifPresent(l -> out.printf(Locale.ROOT, "loss torque %.4g + %.4g*w + %.4g*w^2 N*m (w in rad/s)%n",
                l.law().constantNm(), l.law().viscousNmPerRadPerS(), l.law().quadraticNmPerRadPerSSquared()));
        for (Finding f : r.findings()) {
            if (f.severity() != Severity.OK) {
                out.println(f.severity() + " " + f.code() + ": " + f.message());
            }
        }
        out.println("wrote " + folder.resolve(DynoReportWriter.HTML) + ", " + DynoReportWriter.CSV + ", "
                + DynoReportWriter.JSON);
    }

}
