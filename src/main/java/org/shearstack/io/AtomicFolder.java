package org.shearstack.io;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;

/**
 * Writes a whole output folder or nothing: the content goes to a temporary folder beside the target, which then
 * replaces the target by rename. When filling fails, the temporary folder is removed and the previous target is
 * left as it was.
 */
public final class AtomicFolder {

    /** Fills a folder with files. */
    @FunctionalInterface
    public interface Filler {
        void fill(Path folder) throws IOException;
    }

    private AtomicFolder() {
    }

    /** Writes {@code target} through {@code filler}; returns the target. */
    public static Path write(Path target, Filler filler) throws IOException {
        Path abs = target.toAbsolutePath().normalize();
        Path parent = abs.getParent();
        if (parent == null) {
            throw new IOException("cannot write to the file system root: " + target);
        }
        Files.createDirectories(parent);
        if (Files.exists(abs) && !Files.isDirectory(abs)) {
            throw new IOException(target + " exists and is not a folder");
        }
        String base = abs.getFileName().toString();
        Path temp = Files.createTempDirectory(parent, "." + base + ".writing-");
        openUp(temp);
        try {
            filler.fill(temp);
        } catch (IOException | RuntimeException e) {
            deleteTree(temp);
            throw e;
        }
        Path old = null;
        if (Files.exists(abs)) {
            old = Files.createTempDirectory(parent, "." + base + ".old-");
            Files.delete(old);
            move(abs, old);
        }
        try {
            move(temp, abs);
        } catch (IOException e) {
            if (old != null) {
                move(old, abs);
            }
            deleteTree(temp);
            throw e;
        }
        if (old != null) {
            deleteTree(old);
        }
        return abs;
    }

    /** Temporary folders are created private; the output folder gets the usual rwxr-xr-x where POSIX applies. */
    private static void openUp(Path folder) throws IOException {
        if (folder.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            Files.setPosixFilePermissions(folder, java.nio.file.attribute.PosixFilePermissions.fromString("rwxr-xr-x"));
        }
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to);
        }
    }

    /** Deletes a folder and everything in it; quietly does nothing when it is gone. */
    public static void deleteTree(Path root) {
        if (!Files.exists(root)) {
            return;
        }
        try {
            Files.walkFileTree(root, new SimpleFileVisitor<>() {
                @Override
                public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                    Files.delete(file);
                    return FileVisitResult.CONTINUE;
                }

                @Override
                public FileVisitResult postVisitDirectory(Path dir, IOException exc) throws IOException {
                    Files.delete(dir);
                    return FileVisitResult.CONTINUE;
                }
            });
        } catch (IOException e) {
            throw new UncheckedIOException("could not remove " + root, e);
        }
    }
}
