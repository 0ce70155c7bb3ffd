package org.shearstack.io.family;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;

/**
 * Writes family.csv and family.html into the family folder. Each file is written to a temporary file beside it and
 * renamed into place, so a reader never sees half a table.
 */
public final class FamilyWriter {

    private FamilyWriter() {
    }

    /** Writes both files; returns their paths. */
    public static List<Path> write(FamilyTable table, Path folder) throws IOException {
        Files.createDirectories(folder);
        Path csv = replace(folder.resolve(FamilyCsv.FILE), FamilyCsv.text(table));
        Path html = replace(folder.resolve(FamilyHtml.FILE), FamilyHtml.page(table));
        return List.of(csv, html);
    }

    /**
     * Removes the temporary folders that variants still being written left in the family folder (hidden folders
     * whose name holds ".writing-", the atomic folder writer's temporaries). Called when a stop gives up waiting.
     */
    public static void removeUnfinished(Path folder) {
        if (!Files.isDirectory(folder)) {
            return;
        }
        try (var list = Files.list(folder)) {
            for (Path p : list.toList()) {
                String n = p.getFileName().toString();
                if (n.startsWith(".") && n.contains(".writing-") && Files.isDirectory(p)) {
                    deleteTree(p);
                }
            }
        } catch (IOException | java.io.UncheckedIOException e) {
            // best effort while the process stops
        }
    }

    private static void deleteTree(Path root) throws IOException {
        try (var walk = Files.walk(root)) {
            for (Path p : walk.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }

    private static Path replace(Path target, String text) throws IOException {
        Path temp = Files.createTempFile(target.getParent(), "." + target.getFileName() + ".", ".tmp");
        try {
            Files.writeString(temp, text, StandardCharsets.UTF_8);
            if (temp.getFileSystem().supportedFileAttributeViews().contains("posix")) {
                Files.setPosixFilePermissions(temp, java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--"));
            }
            try {
                Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temp);
        }
        return target;
    }
}
