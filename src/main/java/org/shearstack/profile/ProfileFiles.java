package org.shearstack.profile;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.URI;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystem;
import java.nio.file.FileSystemAlreadyExistsException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

/** Lists and reads the YAML files of one profile kind, shipped in the jar or in a user folder. */
final class ProfileFiles {

    static final String RESOURCE_ROOT = "profiles";
    private static final long MAX_BYTES = 4L << 20;

    private ProfileFiles() {
    }

    /** The shipped files of a kind ("printers"), sorted by name. */
    static List<ProfileFile> shipped(String kind) {
        URL url = ProfileFiles.class.getClassLoader().getResource(RESOURCE_ROOT + "/" + kind);
        if (url == null) {
            return List.of();
        }
        try {
            URI uri = url.toURI();
            if ("jar".equals(uri.getScheme())) {
                FileSystem fs;
                try {
                    fs = FileSystems.newFileSystem(uri, Map.of());
                } catch (FileSystemAlreadyExistsException e) {
                    fs = FileSystems.getFileSystem(uri);
                }
                return list(fs.getPath(RESOURCE_ROOT, kind), RESOURCE_ROOT + "/" + kind + "/");
            }
            return list(Path.of(uri), RESOURCE_ROOT + "/" + kind + "/");
        } catch (URISyntaxException | IOException e) {
            throw new IllegalStateException("cannot list shipped profiles " + kind + ": " + e, e);
        }
    }

    /** The user's files of a kind under dir/kind, sorted; empty when the folder does not exist. */
    static List<ProfileFile> user(Path dir, String kind) throws IOException {
        Path folder = dir.resolve(kind);
        if (!Files.isDirectory(folder)) {
            return List.of();
        }
        return list(folder, null);
    }

    /** One file given by path (a spec's "printer: my-printer.yaml"). */
    static ProfileFile single(Path file) throws IOException {
        if (Files.size(file) > MAX_BYTES) {
            throw new IOException("larger than " + MAX_BYTES + " bytes");
        }
        return new ProfileFile(file.toString(), stem(file), Files.readString(file, StandardCharsets.UTF_8));
    }

    private static List<ProfileFile> list(Path folder, String labelPrefix) throws IOException {
        List<ProfileFile> files = new ArrayList<>();
        try (Stream<Path> s = Files.list(folder)) {
            for (Path p : s.sorted().toList()) {
                String n = p.getFileName().toString();
                if (!n.endsWith(".yaml") || Files.isDirectory(p)) {
                    continue;
                }
                if (Files.size(p) > MAX_BYTES) {
                    throw new IOException(p + " is larger than " + MAX_BYTES + " bytes");
                }
                String label = labelPrefix == null ? p.toString() : labelPrefix + n;
                files.add(new ProfileFile(label, stem(p), Files.readString(p, StandardCharsets.UTF_8)));
            }
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
        return files;
    }

    private static String stem(Path p) {
        String n = p.getFileName().toString();
        return n.endsWith(".yaml") ? n.substring(0, n.length() - 5) : n;
    }
}
