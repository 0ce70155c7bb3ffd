package org.shearstack.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.shearstack.io.benchlog.BenchLog;
import org.shearstack.io.benchlog.BenchLogException;
import org.shearstack.io.benchlog.BenchLogOptions;
import org.shearstack.io.benchlog.BenchLogReader;
import org.shearstack.io.benchlog.LogTimeUnit;
import org.shearstack.io.benchlog.SpeedUnit;
import org.shearstack.io.calibration.CalibrationFile;
import org.shearstack.io.calibration.CalibrationHtml;
import org.shearstack.physics.calibration.BenchCalibrator;
import org.shearstack.physics.calibration.CalibrationFit;
import org.shearstack.physics.calibration.FittedCoefficient;
import org.shearstack.physics.dyno.DynoAnalyzer;
import org.shearstack.physics.dyno.DynoInputs;
import org.shearstack.physics.dyno.DynoResult;
import org.shearstack.physics.rotor.TurbineModel;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code shearstack calibrate --design DIR|SPEC LOG.csv [LOG2.csv ...] [-o FILE]}: fits the model's loss
 * coefficients (and the admission reading when the logs can tell) to bench runs and writes a calibration file a
 * spec can reference, printing the prediction before and after against the measurement.
 */
@Command(name = "calibrate", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Fit the performance model's loss coefficients to bench runs (run-up, coast-down, no-load"
                + " speed).", "Writes a calibration file; reference it from a spec with 'calibration: FILE'."})
public final class CalibrateCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(arity = "1..*", paramLabel = "LOG.csv", description = "Speed logs of bench runs of this design.")
    List<Path> logs;

    @Option(names = "--design", required = true, paramLabel = "DIR|SPEC", description = "The design that was run.")
    Path design;

    @Option(names = "--inertia", paramLabel = "I", converter = InertiaConverter.class,
            description = "Inertia of everything that spins (replaces the design's), e.g. 9.7e-5 or '97 kg*mm^2'.")
    Double inertiaKgM2;

    @Option(names = "--extra-inertia", paramLabel = "I", converter = InertiaConverter.class, defaultValue = "0",
            description = "Inertia added to the design's: generator rotor, coupling.")
    double extraInertiaKgM2;

    @Option(names = "--time-unit", paramLabel = "s|ms", description = "Unit of the time column if the header has none.")
    String timeUnit;

    @Option(names = "--speed-unit", paramLabel = "rpm|Hz|rad/s",
            description = "Unit of the speed column if the header has none.")
    String speedUnit;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", defaultValue = "bench-calibration.yaml",
            description = "Calibration file to write (default: ${DEFAULT-VALUE}).")
    Path output;

    @picocli.CommandLine.Mixin
    ProfileOptions profileOptions;

    private final DesignLink.Source designs;

    /** The command as the command line builds it: designs are resolved from their spec. */
    public CalibrateCommand() {
        this(null);
    }

    CalibrateCommand(DesignLink.Source designs) {
        this.designs = designs;
    }

    private DesignLink.Source designs() {
        return designs != null ? designs : new SpecDesigns(profileOptions.load());
    }

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        List<DynoResult> runs = new ArrayList<>();
        TurbineModel model;
        try {
            DesignLink.Data d = DesignLink.load(design == null ? null : designs(), design, inertiaKgM2, extraInertiaKgM2);
            model = d.model().orElseThrow(() -> new IllegalArgumentException("--design " + design
                    + ": the design has no performance model to calibrate"));
            BenchLogOptions opts = new BenchLogOptions(
                    Optional.ofNullable(timeUnit).map(u -> LogTimeUnit.fromSymbol(u).orElseThrow(
                            () -> new IllegalArgumentException("--time-unit: expected s or ms, found '" + u + "'"))),
                    Optional.ofNullable(speedUnit).map(u -> SpeedUnit.fromSymbol(u).orElseThrow(
                            () -> new IllegalArgumentException("--speed-unit: expected rpm, Hz or rad/s, found '" + u
                                    + "'"))));
            for (Path log : logs) {
                BenchLog b = BenchLogReader.read(log, opts);
                try {
                    runs.add(DynoAnalyzer.analyze(b.log(), DynoInputs.of(d.inertiaKgM2())));
                } catch (IllegalArgumentException e) {
                    throw new IllegalArgumentException(log + ": " + e.getMessage(), e);
                }
            }
        } catch (BenchLogException e) {
            err.println(e.getMessage());
            return ExitCode.BAD_INPUT.code();
        } catch (IOException e) {
            err.println("cannot read: " + e.getMessage());
            return ExitCode.BAD_INPUT.code();
        } catch (IllegalArgumentException e) {
            err.println(e.getMessage());
            return ExitCode.BAD_INPUT.code();
        }
        CalibrationFit fit = BenchCalibrator.fit(model, runs);
        String text = CalibrationFile.render(fit, design.toString(), logs.stream().map(Path::toString).toList());
        String name = output.getFileName().toString();
        Path page = output.resolveSibling((name.contains(".") ? name.substring(0, name.lastIndexOf('.')) : name)
                + ".html");
        try {
            CalibrationFile.write(output, text);
            CalibrationFile.write(page, CalibrationHtml.render(fit, design.toString(),
                    logs.stream().map(Path::toString).toList()));
        } catch (IOException e) {
            err.println("cannot write " + output + ": " + e.getMessage());
            return ExitCode.INTERNAL_ERROR.code();
        }
        print(out, fit);
        out.println("wrote " + output + " (use it from a spec: calibration: " + output.getFileName() + ") and " + page);
        return ExitCode.OK.code();
    }

    private static void print(PrintWriter out, CalibrationFit f) {
        out.printf(Locale.ROOT, "%-30s %12s %12s  %s%n", "coefficient", "before", "after", "status");
        for (FittedCoefficient c : f.coefficients()) {
            String before = c.key().equals("admission") ? reading(c.before()) : num(c.before());
            String after = c.key().equals("admission") ? reading(c.after()) : num(c.after());
            out.printf(Locale.ROOT, "%-30s %12s %12s  %s%n", c.key(), before, after,
                    c.fitted() ? "fitted" : "kept: " + c.note());
        }
        double rpm = 30 / Math.PI;
        double m = f.measuredNoLoadRadPerS();
        out.printf(Locale.ROOT, "no-load speed: measured %.0f rpm; predicted before %.0f rpm (%+.1f %%), after %.0f rpm"
                + " (%+.1f %%)%n", m * rpm, f.noLoadBeforeRadPerS() * rpm, 100 * (f.noLoadBeforeRadPerS() / m - 1),
                f.noLoadAfterRadPerS() * rpm, 100 * (f.noLoadAfterRadPerS() / m - 1));
        out.printf(Locale.ROOT, "run-up shaft torque, rms model - measured: before %.3g mN*m, after %.3g mN*m%n",
                f.torqueRmsBeforeNm() * 1e3, f.torqueRmsAfterNm() * 1e3);
        out.printf(Locale.ROOT, "coast-down loss torque, rms model - measured: before %.3g mN*m, after %.3g mN*m%n",
                f.lossRmsBeforeNm() * 1e3, f.lossRmsAfterNm() * 1e3);
        for (String n : f.notes()) {
            out.println("note: " + n);
        }
    }

    private static String reading(double ordinal) {
        return org.shearstack.physics.rotor.AdmissionReading.values()[(int) ordinal].name()
                .toLowerCase(Locale.ROOT).replace('_', '-');
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
