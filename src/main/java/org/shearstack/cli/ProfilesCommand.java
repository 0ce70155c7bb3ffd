package org.shearstack.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.shearstack.profile.FilamentProfile;
import org.shearstack.profile.PrinterProfile;
import org.shearstack.profile.Profiles;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.Problem;
import org.shearstack.spec.QuantityFormat;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;

/** {@code profiles [KIND] [NAME]}: lists the known profiles, or shows one. */
@Command(name = "profiles", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "List profile kinds, the profiles of one kind, or show one profile.")
public final class ProfilesCommand implements Callable<Integer> {

    @picocli.CommandLine.Spec
    CommandSpec command;

    @Parameters(index = "0", arity = "0..1", paramLabel = "KIND",
            description = "printers, filaments, bearings, fasteners, seals or ports.")
    String kind;

    @Parameters(index = "1", arity = "0..1", paramLabel = "NAME", description = "A profile name of that kind.")
    String name;

    @Mixin
    ProfileOptions profileOptions;

    @Override
    public Integer call() {
        Profiles p = profileOptions.load();
        PrintWriter out = command.commandLine().getOut();
        if (kind == null) {
            out.println("printers:  " + Profiles.known(p.printers()));
            out.println("filaments: " + Profiles.known(p.filaments()));
            HardwareText.summary(p.hardware(), out);
        } else if (kind.equals("printers")) {
            if (name == null) {
                p.printers().values().forEach(x -> out.println(x.name() + "  " + x.description()));
            } else {
                printer(p.printer(name).orElseThrow(() -> unknown("printer", name, Profiles.known(p.printers()))), out);
            }
        } else if (kind.equals("filaments")) {
            if (name == null) {
                p.filaments().values().forEach(x -> out.println(x.name() + "  " + x.description()));
            } else {
                filament(p.filament(name).orElseThrow(() -> unknown("filament", name, Profiles.known(p.filaments()))),
                        out);
            }
        } else if (Profiles.KINDS.contains(kind)) {
            HardwareText.show(p.hardware(), kind, name, out);
        } else {
            throw unknown("profile kind", kind, String.join(", ", Profiles.KINDS));
        }
        out.flush();
        return ExitCode.OK.code();
    }

    static BadInputException unknown(String what, String found, String known) {
        return new BadInputException(List.of(new Problem("command line", 0, 0, what,
                "a known " + what + " (" + known + ")", "\"" + found + "\"", "")));
    }

    private static void printer(PrinterProfile x, PrintWriter out) {
        out.println("printer " + x.name() + "  (" + x.source() + ")");
        out.println("  " + x.description());
        row(out, "nozzle-diameter", x.nozzleDiameterMm(), "mm");
        row(out, "line-width", x.lineWidthMm(), "mm");
        row(out, "layer-height", x.layerHeightMm(), "mm");
        row(out, "first-layer-height", x.firstLayerHeightMm(), "mm");
        out.println(String.format(Locale.ROOT, "  %-22s %s x %s x %s mm", "bed", QuantityFormat.number(x.bedXMm()),
                QuantityFormat.number(x.bedYMm()), QuantityFormat.number(x.bedZMm())));
        row(out, "hole-compensation", x.holeCompensationMm(), "mm");
        row(out, "outer-compensation", x.outerCompensationMm(), "mm");
        row(out, "compensation-scatter", x.compensationScatterMm(), "mm");
        row(out, "min-clearance", x.minClearanceMm(), "mm");
        row(out, "min-wall", x.minWallMm(), "mm");
        row(out, "max-overhang", x.maxOverhangDeg(), "deg");
        row(out, "max-bridge", x.maxBridgeMm(), "mm");
        row(out, "volumetric-flow", x.volumetricFlowMm3PerS(), "mm3/s");
    }

    private static void filament(FilamentProfile x, PrintWriter out) {
        out.println("filament " + x.name() + "  (" + x.source() + ")");
        out.println("  " + x.description());
        row(out, "density", x.densityKgPerM3() / 1000, "g/cm3");
        row(out, "elastic-modulus", x.elasticModulusPa() / 1e9, "GPa");
        row(out, "poisson-ratio", x.poissonRatio(), "");
        row(out, "tensile-strength-xy", x.tensileStrengthXyPa() / 1e6, "MPa");
        row(out, "tensile-strength-z", x.tensileStrengthZPa() / 1e6, "MPa");
        row(out, "softening-temperature", x.softeningK() - 273.15, "degC");
        out.println("  sources: " + x.sources());
    }

    static void row(PrintWriter out, String key, double value, String unit) {
        out.println(String.format(Locale.ROOT, "  %-22s %s %s", key, QuantityFormat.number(value), unit).stripTrailing());
    }
}
