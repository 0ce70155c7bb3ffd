package org.shearstack.job;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.shearstack.io.AtomicFolder;
import org.shearstack.io.kit.KitWriter;
import org.shearstack.io.report.ReportWriter;

/**
 * The write step of a design job: every file of the result into one folder, atomically (a temporary folder
 * beside the target, renamed into place; a failure leaves the previous folder as it was).
 */
public final class DesignOutput {

    private DesignOutput() {
    }

    /** The files written, relative to the folder, in a fixed order. */
    public record Written(Path folder, List<Path> files) {
        public Written {
            files = List.copyOf(files);
        }

        public Path report() {
            return folder.resolve(ReportWriter.HTML);
        }
    }

    /** Writes the result into {@code folder}. */
    public static Written write(DesignResult result, Path folder) throws IOException {
        List<Path> names = new ArrayList<>();
        Path done = AtomicFolder.write(folder, dir -> {
            if (result.kit().isPresent()) {
                // the kit writer replaces the (empty) temporary folder with the kit's files
                KitWriter.writeFiles(result.kit().get(), dir);
                KitWriter.files(result.kit().get()).forEach(f -> names.add(Path.of(f)));
            }
            for (Path p : ReportWriter.write(result.report(), dir)) {
                names.add(dir.relativize(p));
            }
        });
        return new Written(done, names);
    }

    /** The default folder of a design: generated/NAME under the working folder. */
    public static Path defaultFolder(DesignResult result) {
        return Path.of("generated", result.design().name());
    }
}
