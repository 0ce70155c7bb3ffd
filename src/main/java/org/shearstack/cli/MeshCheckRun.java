package org.shearstack.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.shearstack.check.Findings;
import org.shearstack.check.mesh.ForeignMeshCheck;
import org.shearstack.check.mesh.ForeignMeshCheck.MeshObject;
import org.shearstack.check.print.PrintLimits;
import org.shearstack.geom.GeometryContext;
import org.shearstack.io.mesh.MeshFiles;
import org.shearstack.io.mesh.MeshFormatException;
import org.shearstack.profile.FilamentProfile;
import org.shearstack.profile.PrinterProfile;
import org.shearstack.profile.Profiles;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.Problem;

/** {@code check FILE.stl|FILE.3mf --printer NAME}: validity, printability by slicing, and interference of a 3MF. */
final class MeshCheckRun {

    private static final Pattern LINE = Pattern.compile("line (\\d+): ");

    private MeshCheckRun() {
    }

    static int run(PrintWriter out, Path file, MeshFiles.Kind kind, Profiles profiles, String printerName,
            String filamentName, int layersPerSlab, boolean all) {
        PrinterProfile printer = printer(profiles, printerName);
        Optional<FilamentProfile> filament = filament(profiles, filamentName);
        List<MeshObject> objects = read(file, kind);
        PrintLimits limits = new PrintLimits(printer.nozzleDiameterMm(), printer.lineWidthMm(), printer.layerHeightMm(),
                printer.minClearanceMm(), printer.maxOverhangDeg(), printer.maxBridgeMm(),
                PrintLimits.DEFAULT_MIN_FIRST_LAYER_AREA_MM2);
        ForeignMeshCheck.Settings settings = ForeignMeshCheck.Settings
                .of(limits, printer.firstLayerHeightMm(), GeometryContext.standard()).withLayersPerSlab(layersPerSlab);
        ForeignMeshCheck.Result result = ForeignMeshCheck.run(objects, settings);

        out.println("mesh " + file + " (" + (kind == MeshFiles.Kind.STL ? "STL" : "3MF") + ", " + objects.size()
                + (objects.size() == 1 ? " object" : " objects placed by the build") + "), printer " + printer.name()
                + filament.map(f -> ", filament " + f.name()).orElse(""));
        out.println("CAUTION: these checks see geometry only; they say nothing about the strength of a part that"
                + " spins or holds pressure.");
        for (ForeignMeshCheck.ObjectResult r : result.objects()) {
            out.println("object " + r.name() + ": " + r.report().summary());
            r.plan().ifPresent(p -> out.println("        " + p.describe()));
            r.solid().ifPresent(s -> out.println("        layered volume " + Findings.num(s.volumeMm3(), 6) + " mm³"
                    + filament.map(f -> ", about " + Findings.num(r.report().signedVolumeMm3() * 1e-9
                            * f.densityKgPerM3() * 1e3, 3) + " g of " + f.name() + " if printed solid").orElse("")));
        }
        List<org.shearstack.check.Finding> findings = result.findings();
        FindingLines.Counts counts = FindingLines.print(out, findings, all, "file frame");
        out.println();
        out.println(FindingLines.summary(counts));
        out.flush();
        return counts.fail() > 0 ? ExitCode.CHECK_FAILED.code() : ExitCode.OK.code();
    }

    private static PrinterProfile printer(Profiles profiles, String name) {
        if (name == null) {
            throw bad("--printer", "a printer name for a mesh check (one of " + Profiles.known(profiles.printers()) + ")",
                    "none");
        }
        return profiles.printer(name).orElseThrow(() -> bad("--printer",
                "one of " + Profiles.known(profiles.printers()), "\"" + name + "\""));
    }

    private static Optional<FilamentProfile> filament(Profiles profiles, String name) {
        if (name == null) {
            return Optional.empty();
        }
        return Optional.of(profiles.filament(name).orElseThrow(() -> bad("--filament",
                "one of " + Profiles.known(profiles.filaments()), "\"" + name + "\"")));
    }

    private static List<MeshObject> read(Path file, MeshFiles.Kind kind) {
        try {
            return MeshFiles.read(file, kind);
        } catch (NoSuchFileException e) {
            throw new BadInputException(List.of(new Problem(file.toString(), 0, 0, "", "a readable mesh file",
                    "no such file", "")));
        } catch (IOException e) {
            throw new BadInputException(List.of(new Problem(file.toString(), 0, 0, "", "", "",
                    "cannot read the file: " + e.getMessage())));
        } catch (MeshFormatException e) {
            String message = e.getMessage();
            String prefix = file + ": ";
            if (message.startsWith(prefix)) {
                message = message.substring(prefix.length());
            }
            Matcher m = LINE.matcher(message);
            int line = 0;
            if (m.lookingAt()) {
                line = Integer.parseInt(m.group(1));
                message = message.substring(m.end());
            }
            return throwProblem(file, line, message);
        }
    }

    private static List<MeshObject> throwProblem(Path file, int line, String message) {
        List<Problem> problems = new ArrayList<>();
        problems.add(new Problem(file.toString(), line, 0, "", "", "", message));
        throw new BadInputException(problems);
    }

    private static BadInputException bad(String option, String expected, String found) {
        return new BadInputException(List.of(new Problem("command line", 0, 0, option, expected, found, "")));
    }
}
