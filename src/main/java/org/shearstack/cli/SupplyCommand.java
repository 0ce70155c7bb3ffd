package org.shearstack.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.shearstack.physics.gas.Gas;
import org.shearstack.physics.gas.Isentropic;
import org.shearstack.physics.supply.Blowdown;
import org.shearstack.physics.supply.BlowdownEstimate;
import org.shearstack.physics.supply.FlowCharacteristic;
import org.shearstack.physics.supply.FreeAirSpeed;
import org.shearstack.physics.supply.ReferenceAtmosphere;
import org.shearstack.physics.supply.TankRunTime;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.Dimension;
import org.shearstack.spec.Problem;
import org.shearstack.spec.Quantity;
import org.shearstack.spec.QuantityParser;
import org.shearstack.spec.Spec;
import org.shearstack.spec.SpecReader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code supply [SPEC] [options]}: what an air supply delivers, from the spec's supply section or from options:
 * ISO 6358 C and b, effective area, deliverable mass and free-air flow at pressures, run time from the tank alone,
 * and why an average "free-air speed" is not the jet speed.
 */
@Command(name = "supply", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"What the air supply delivers: ISO 6358 sonic conductance C and critical ratio b (from a"
            + " conductance, a free-air flow or a tank blow-down), effective orifice area, mass and free-air flow"
            + " at pressures, run time from the tank alone, and why free-air flow / hose bore is not the jet speed.",
            "Options override the spec's supply section. Pressures: a bare bar or psi is gauge; bar(g) gauge,"
            + " bar(a) absolute."})
public final class SupplyCommand implements Callable<Integer> {

    private static final Gas AIR = Gas.AIR;
    private static final double DEFAULT_B = 0.3;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec command;

    @Parameters(index = "0", arity = "0..1", paramLabel = "SPEC", description = "A design spec (YAML) to read supply from.")
    Path specFile;

    @Option(names = "--pressure", paramLabel = "P", description = "Regulator setting, e.g. '6 bar(g)'.")
    String pressure;
    @Option(names = "--ambient", paramLabel = "P", description = "Ambient pressure, default 1.01325 bar(a).")
    String ambient;
    @Option(names = "--temperature", paramLabel = "T", description = "Air temperature, default 20 degC.")
    String temperature;
    @Option(names = "--conductance", paramLabel = "C", description = "ISO 6358 C, e.g. '0.8 dm3/(s*bar)'.")
    String conductance;
    @Option(names = "--critical-ratio", paramLabel = "B", description = "ISO 6358 b, default 0.3 (assumed).")
    String criticalRatio;
    @Option(names = "--free-air-flow", paramLabel = "Q", description = "Measured free-air flow, e.g. '90 L/min'.")
    String freeAirFlow;
    @Option(names = "--at", paramLabel = "P", description = "Pressure the free-air flow was measured at.")
    String freeAirPressure;
    @Option(names = "--tank", paramLabel = "V", description = "Blow-down: tank volume, e.g. '24 L'.")
    String tank;
    @Option(names = "--from", paramLabel = "P", description = "Blow-down: start pressure.")
    String from;
    @Option(names = "--to", paramLabel = "P", description = "Blow-down: end pressure.")
    String to;
    @Option(names = "--time", paramLabel = "T", description = "Blow-down: elapsed time, e.g. '64 s'.")
    String time;
    @Option(names = "--bore", paramLabel = "D", defaultValue = "6 mm",
            description = "Hose bore for the free-air-speed explanation (default ${DEFAULT-VALUE}).")
    String bore;

    private final List<Problem> problems = new ArrayList<>();
    private Spec spec;

    @Override
    public Integer call() {
        if (specFile != null) {
            spec = SpecReader.read(specFile).orThrow();
        }
        double pAmb = value("--ambient", ambient, "supply.ambient", Dimension.PRESSURE, 101_325.0, true, 0);
        double tK = value("--temperature", temperature, "supply.temperature", Dimension.TEMPERATURE, 293.15, false,
                pAmb);
        Optional<Double> pSupply = optional("--pressure", pressure, "supply.pressure", Dimension.PRESSURE, pAmb);
        Optional<Double> b = optional("--critical-ratio", criticalRatio, "supply.critical-ratio",
                Dimension.DIMENSIONLESS, pAmb);
        Optional<Double> c = optional("--conductance", conductance, "supply.conductance", Dimension.CONDUCTANCE, pAmb);
        Optional<Double> q = optional("--free-air-flow", freeAirFlow, "supply.free-air-flow", Dimension.VOLUME_FLOW,
                pAmb);
        Optional<Double> qAt = optional("--at", freeAirPressure, "supply.free-air-flow.pressure", Dimension.PRESSURE,
                pAmb);
        Optional<Double> v = optional("--tank", tank, "supply.blowdown.tank", Dimension.VOLUME, pAmb);
        Optional<Double> ps = optional("--from", from, "supply.blowdown.from", Dimension.PRESSURE, pAmb);
        Optional<Double> pe = optional("--to", to, "supply.blowdown.to", Dimension.PRESSURE, pAmb);
        Optional<Double> t = optional("--time", time, "supply.blowdown.time", Dimension.TIME, pAmb);
        double boreMm = value("--bore", bore, null, Dimension.LENGTH, 6.0, false, pAmb);
        double ratio = b.orElse(DEFAULT_B);
        boolean blowdown = v.isPresent() || ps.isPresent() || pe.isPresent() || t.isPresent();
        if (blowdown && !(v.isPresent() && ps.isPresent() && pe.isPresent() && t.isPresent())) {
            problems.add(new Problem("command line", 0, 0, "--tank/--from/--to/--time",
                    "all four blow-down values (tank, from, to, time)", "only some of them", ""));
        }
        if (q.isPresent() && qAt.isEmpty()) {
            problems.add(new Problem("command line", 0, 0, "--at", "the pressure the free-air flow was measured at",
                    "nothing", ""));
        }
        if (c.isEmpty() && q.isEmpty() && !blowdown && problems.isEmpty()) {
            problems.add(new Problem(specFile == null ? "command line" : specFile.toString(), 0, 0, "supply",
                    "one of --conductance, --free-air-flow with --at, or --tank --from --to --time (or a spec with"
                            + " one of them)", "none", ""));
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        PrintWriter out = command.commandLine().getOut();
        out.println("Air supply (ISO 6358 characteristic; ISO 8778 reference atmosphere 100 kPa, 20 °C, 1.185 kg/m³)");
        FlowCharacteristic path;
        Blowdown test = null;
        if (c.isPresent()) {
            path = new FlowCharacteristic(c.get(), ratio, 0.5);
            out.println("  source: conductance as given");
        } else if (q.isPresent()) {
            path = FlowCharacteristic.fromFreeAirFlow(q.get(), qAt.get(), pAmb, ratio, 0.5);
            out.printf(Locale.ROOT, "  source: free-air flow %.1f L/min (ANR) at %s into %s%n", q.get() * 60_000,
                    bar(qAt.get(), pAmb), bar(pAmb, pAmb));
        } else {
            test = new Blowdown(v.get(), ps.get(), pe.get(), t.get(), tK);
            BlowdownEstimate e = test.estimate(AIR);
            out.printf(Locale.ROOT, "  source: blow-down of %.1f L from %s to %s in %.1f s%n", v.get() * 1000,
                    bar(ps.get(), pAmb), bar(pe.get(), pAmb), t.get());
            out.printf(Locale.ROOT, "  C isothermal tank %.3f, polytropic n = 1.2 %.3f (used), adiabatic tank %.3f"
                    + " dm³/(s·bar); spread ±%.0f %%%n", dm3(e.isothermalM3PerSPa()), dm3(e.middleM3PerSPa()),
                    dm3(e.adiabaticM3PerSPa()), 100 * e.spreadFraction());
            out.println("  (a fast blow-down cools the tank gas: the truth lies between the isothermal and adiabatic"
                    + " readings; a tank packed with metal wool makes it isothermal)");
            out.printf(Locale.ROOT, "  path stayed choked to the end (p_ambient/p_end ≤ b): %s%n",
                    test.staysChoked(pAmb, ratio) ? "yes, so b cannot be told from this test" : "no: C is low");
            path = e.characteristic(ratio, 0.5);
        }
        out.printf(Locale.ROOT, "  C = %.4f dm³/(s·bar) = %.4g m³/(s·Pa)%n", path.conductanceDm3PerSBar(),
                path.conductanceM3PerSPa());
        out.printf(Locale.ROOT, "  b = %.3f%s%n", ratio, b.isPresent() ? "" : " (assumed: typical paths lie between 0.2"
                + " and 0.5; give --critical-ratio)");
        out.printf(Locale.ROOT, "  effective orifice area S = %.2f mm² (an ideal nozzle passing the same choked flow)%n",
                path.effectiveAreaM2(AIR) * 1e6);
        out.println();
        out.println("Deliverable flow through the path into the open (ISO 6358; subsonic branch where p_ambient/p > b):");
        out.println("  supply      mass flow    free air (ANR)");
        for (double gauge = 1e5; gauge <= 8e5 + 1; gauge += 1e5) {
            double p1 = pAmb + gauge;
            double m = path.massFlowKgPerS(p1, pAmb, tK);
            out.printf(Locale.ROOT, "  %-10s %7.2f g/s  %8.1f L/min%n", bar(p1, pAmb), m * 1000,
                    ReferenceAtmosphere.freeAirFlowM3PerS(m) * 60_000);
        }
        if (test != null && pSupply.isPresent()) {
            double m = path.massFlowKgPerS(pSupply.get(), pAmb, tK);
            if (test.startPressurePa() > pSupply.get() && m > 0) {
                out.println();
                out.printf(Locale.ROOT, "Tank alone (compressor off), drawing the full path flow at %s (%.2f g/s):%n",
                        bar(pSupply.get(), pAmb), m * 1000);
                out.printf(Locale.ROOT, "  from %s down to the regulator setting: about %.1f s (isothermal,"
                        + " constant flow; a turbine draws less than the open path, so it runs longer)%n",
                        bar(test.startPressurePa(), pAmb), TankRunTime.isothermalConstantFlowS(AIR, test.tankVolumeM3(),
                                test.startPressurePa(), pSupply.get(), tK, m));
            }
        }
        if (test != null) {
            FreeAirSpeed s = FreeAirSpeed.of(AIR, test, boreMm / 1000, pAmb);
            out.println();
            out.println("Free-air speed is not jet speed:");
            out.printf(Locale.ROOT, "  mean flow of the test %.2f g/s = %.0f L/min free air; divided by a %.1f mm bore"
                    + " (%.1f mm²) that is %.0f m/s%n", s.meanMassFlowKgPerS() * 1000,
                    s.meanFreeAirFlowM3PerS() * 60_000, boreMm, s.boreAreaM2() * 1e6, s.freeAirSpeedMPerS());
            out.println("  but free-air litres are litres at 1 bar: in the hose the air is compressed to the line");
            out.printf(Locale.ROOT, "  pressure and really moves at about %.0f m/s. In a nozzle it expands instead: a"
                    + " sonic throat gives a* = √(2γRT₀/(γ+1)) = %.0f m/s%n", s.meanHoseSpeedMPerS(),
                    s.sonicJetSpeedMPerS());
            out.printf(Locale.ROOT, "  whatever the flow, and full expansion to ambient at most %.0f m/s. The jet speed"
                    + " is set by the pressure ratio across%n", s.expandedJetSpeedMPerS());
            out.println("  the nozzle; the flow only sets how much air carries it.");
        }
        out.printf(Locale.ROOT, "%nJet static temperature at a sonic throat: %.1f °C (icing possible in humid air).%n",
                tK * Isentropic.criticalTemperatureRatio(AIR.gamma()) - 273.15);
        out.println("Caution: compressed air and spinning printed discs can injure. Use a regulator and relief valve,"
                + " eye protection and a guard.");
        out.flush();
        return ExitCode.OK.code();
    }

    private static double dm3(double m3PerSPa) {
        return m3PerSPa / ReferenceAtmosphere.DM3_PER_S_BAR;
    }

    private static String bar(double absolutePa, double ambientPa) {
        return String.format(Locale.ROOT, "%.2f bar(g)", (absolutePa - ambientPa) / 1e5);
    }

    private double value(String option, String text, String specPath, Dimension d, double fallback,
            boolean absoluteByNature, double ambientPa) {
        return parse(option, text, specPath, d, ambientPa, absoluteByNature).orElse(fallback);
    }

    private Optional<Double> optional(String option, String text, String specPath, Dimension d, double ambientPa) {
        return parse(option, text, specPath, d, ambientPa, false);
    }

    private Optional<Double> parse(String option, String text, String specPath, Dimension d, double ambientPa,
            boolean absoluteByNature) {
        if (text != null) {
            QuantityParser.Parsed p = QuantityParser.parse(text, d, ambientPa, absoluteByNature);
            if (!p.ok()) {
                problems.add(new Problem("command line", 0, 0, option, p.expected(), p.found(), ""));
                return Optional.empty();
            }
            return p.quantity().map(Quantity::value);
        }
        if (spec != null && specPath != null) {
            return spec.quantity(specPath).map(Quantity::value);
        }
        return Optional.empty();
    }
}
