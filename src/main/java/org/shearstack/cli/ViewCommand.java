package org.shearstack.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.shearstack.view.DisplayUnavailableException;
import org.shearstack.view.SceneLoadException;
import org.shearstack.view.SceneSource;
import org.shearstack.view.SceneSources;
import org.shearstack.view.SnapshotOptions;
import org.shearstack.view.ViewLauncher;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code view SPEC|KIT_DIR|FILE.3mf}: the 3D window, or with {@code --snapshot} a picture and exit.
 * Imports no JavaFX: everything graphical is behind {@link ViewLauncher}, which checks for a display first.
 */
@Command(name = "view", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Show a design in 3D: turn, move and zoom it, hide parts, spread them apart, cut through the "
                + "axis, and see findings on the model. Saving the spec updates the window.",
            "With --snapshot, render a picture and exit. Needs a display; without one use: xvfb-run -a shearstack view ..."})
public final class ViewCommand implements Callable<Integer> {

    @picocli.CommandLine.Spec
    CommandSpec command;

    @Parameters(index = "0", arity = "0..1", paramLabel = "SPEC|KIT_DIR|FILE.3mf",
            description = "A design spec (YAML), a kit folder or a 3MF file.")
    Path input;

    @Option(names = "--sample", description = "Show the built-in sample assembly (plain shapes, invented figures).")
    boolean sample;

    @Option(names = "--snapshot", paramLabel = "OUT.png", description = "Render a PNG picture and exit.")
    Path snapshot;

    @Option(names = "--size", paramLabel = "WxH", defaultValue = "1200x800",
            description = "Picture size in pixels for --snapshot (default ${DEFAULT-VALUE}).")
    String size;

    @Option(names = "--exploded", description = "Picture with the parts spread apart along the axis.")
    boolean exploded;

    @Option(names = "--section", description = "Picture cut through the axis, front half removed.")
    boolean section;

    @Option(names = "--no-watch", description = "Do not reload when the spec file is saved.")
    boolean noWatch;

    @Mixin
    ProfileOptions profileOptions;

    @Override
    public Integer call() throws IOException, InterruptedException {
        PrintWriter out = command.commandLine().getOut();
        PrintWriter err = command.commandLine().getErr();
        List<String> problems = new ArrayList<>();
        if ((input == null) == !sample) {
            problems.add("command line: SPEC: expected a spec, kit folder or .3mf file, or --sample (one of them), found "
                    + (sample ? "both" : "neither"));
        }
        SnapshotOptions options = null;
        try {
            int[] wh = SnapshotOptions.parseSize(size);
            options = new SnapshotOptions(wh[0], wh[1], exploded, section);
        } catch (IllegalArgumentException e) {
            problems.add("command line: --size: " + e.getMessage());
        }
        if (!problems.isEmpty()) {
            return badInput(err, problems);
        }
        try {
            SceneSource source = sample ? SceneSources.sample() : SceneSources.forPath(input, profileOptions.load(),
                    DesignViewScenes::of);
            if (!ViewLauncher.displayAvailable()) {
                err.println("shearstack: view needs a display, and none is set (DISPLAY is empty). "
                        + "Headless, run: xvfb-run -a shearstack view ...");
                err.flush();
                return ExitCode.INTERNAL_ERROR.code();
            }
            if (snapshot != null) {
                byte[] png = ViewLauncher.snapshot(source, options);
                writeAtomically(snapshot, png);
                out.println(String.format(Locale.ROOT, "wrote %s (%dx%d%s%s)", snapshot, options.widthPx(),
                        options.heightPx(), exploded ? ", spread" : "", section ? ", cut" : ""));
            } else {
                ViewLauncher.openWindow(source, !noWatch, out::println);
            }
            out.flush();
            return ExitCode.OK.code();
        } catch (SceneLoadException e) {
            return badInput(err, List.of(e.getMessage()));
        } catch (DisplayUnavailableException e) {
            err.println("shearstack: " + e.getMessage());
            err.flush();
            return ExitCode.INTERNAL_ERROR.code();
        }
    }

    private static int badInput(PrintWriter err, List<String> problems) {
        problems.forEach(err::println);
        err.println("shearstack: nothing written");
        err.flush();
        return ExitCode.BAD_INPUT.code();
    }

    /** Writes next to the target and moves into place, so a failed run leaves no half-written picture. */
    private static void writeAtomically(Path target, byte[] bytes) throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        Path tmp = dir.resolve("." + target.getFileName() + ".part");
        try {
            Files.write(tmp, bytes);
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
