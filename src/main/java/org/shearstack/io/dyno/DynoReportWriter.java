package org.shearstack.io.dyno;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Writes dyno.html, dyno.csv and dyno.json into a folder. Everything is rendered in memory first and each
 * file is written to a temporary name and moved into place, so a failed run leaves earlier files as they were.
 */
public final class DynoReportWriter {
    public static final String HTML = "dyno.html";
    public static final String CSV = "dyno.csv";
    public static final String JSON = "dyno.json";

    private DynoReportWriter() {
    }

    /** The three files' contents by name, in writing order. */
    public static Map<String, String> render(DynoReport report) {
        Map<String, String> out = new LinkedHashMap<>();
        out.put(CSV, DynoCsv.render(report.result()));
        out.put(JSON, DynoJson.render(report));
        out.put(HTML, DynoHtml.render(report));
        return out;
    }

    /** Writes the files and returns their paths. */
    public static List<Path> write(DynoReport report, Path folder) throws IOException {
        Map<String, String> files = render(report);
        Files.createDirectories(folder);
        Map<Path, Path> staged = new LinkedHashMap<>();
        try {
            for (Map.Entry<String, String> e : files.entrySet()) {
                Path tmp = Files.createTempFile(folder, "." + e.getKey() + "-", ".tmp");
                staged.put(tmp, folder.resolve(e.getKey()));
                Files.writeString(tmp, e.getValue(), StandardCharsets.UTF_8);
            }
            for (Map.Entry<Path, Path> e : staged.entrySet()) {
                try {
                    Files.move(e.getKey(), e.getValue(), StandardCopyOption.REPLACE_EXISTING,
                            StandardCopyOption.ATOMIC_MOVE);
                } catch (AtomicMoveNotSupportedException x) {
                    Files.move(e.getKey(), e.getValue(), StandardCopyOption.REPLACE_EXISTING);
                }
            }
        } finally {
            for (Path tmp : staged.keySet()) {
                Files.deleteIfExists(tmp);
            }
        }
        return List.copyOf(staged.values());
    }
}
