package org.shearstack.profile;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.Problem;

/**
 * Every profile the tool knows: the ones shipped in the jar under profiles/, extended and overridden by a
 * user folder with the same layout (printers/, filaments/, ...; a user file with a shipped name wins).
 * Immutable once loaded.
 */
public final class Profiles {

    /** The profile kinds, which are also the folder names. */
    public static final List<String> KINDS = List.of("printers", "filaments", "bearings", "fasteners", "seals", "ports");

    private final Map<String, PrinterProfile> printers;
    private final Map<String, FilamentProfile> filaments;
    private final Hardware hardware;

    private Profiles(Map<String, PrinterProfile> printers, Map<String, FilamentProfile> filaments, Hardware hardware) {
        this.printers = Collections.unmodifiableMap(printers);
        this.filaments = Collections.unmodifiableMap(filaments);
        this.hardware = hardware;
    }

    /** The shipped profiles only. */
    public static Profiles shipped() {
        return load(Optional.empty());
    }

    /**
     * Shipped profiles plus a user folder. Throws {@link BadInputException} listing every problem in every
     * file (a shipped file with a problem is a bug, caught by the tests).
     */
    public static Profiles load(Optional<Path> userDir) {
        List<Problem> problems = new ArrayList<>();
        Map<String, PrinterProfile> printers = named("printers", userDir, problems, PrinterProfile::read);
        Map<String, FilamentProfile> filaments = named("filaments", userDir, problems, FilamentProfile::read);
        Hardware hardware = Hardware.load(userDir, problems);
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        return new Profiles(printers, filaments, hardware);
    }

    public Map<String, PrinterProfile> printers() {
        return printers;
    }

    public Map<String, FilamentProfile> filaments() {
        return filaments;
    }

    /** Bearings, fasteners, seals and ports. */
    public Hardware hardware() {
        return hardware;
    }

    public Optional<PrinterProfile> printer(String name) {
        return Optional.ofNullable(printers.get(name));
    }

    public Optional<FilamentProfile> filament(String name) {
        return Optional.ofNullable(filaments.get(name));
    }

    /** Reads a printer profile from a file named in a spec. */
    public static PrinterProfile readPrinter(Path file) {
        return single(file, PrinterProfile::read);
    }

    /** Reads a filament profile from a file named in a spec. */
    public static FilamentProfile readFilament(Path file) {
        return single(file, FilamentProfile::read);
    }

    private static <T> T single(Path file, Reader<T> reader) {
        List<Problem> problems = new ArrayList<>();
        ProfileFile f;
        try {
            f = ProfileFiles.single(file);
        } catch (IOException e) {
            throw new BadInputException(List.of(new Problem(file.toString(), 1, 1, "", "a readable profile file",
                    "cannot read it (" + e.getMessage() + ")", "")));
        }
        Optional<T> value = YamlDoc.parse(f.label(), f.text(), problems).map(d -> reader.read(d, f.label(), problems));
        if (!problems.isEmpty() || value.isEmpty()) {
            throw new BadInputException(problems);
        }
        return value.get();
    }

    /** Reads one typed value from a located mapping, adding problems to the list. */
    @FunctionalInterface
    interface Reader<T> {
        T read(YamlDoc doc, String source, List<Problem> problems);
    }

    private static <T> Map<String, T> named(String kind, Optional<Path> userDir, List<Problem> problems,
                                           Reader<T> reader) {
        Map<String, T> byName = new TreeMap<>();
        List<ProfileFile> files = new ArrayList<>(ProfileFiles.shipped(kind));
        if (userDir.isPresent()) {
            try {
                files.addAll(ProfileFiles.user(userDir.get(), kind));
            } catch (IOException e) {
                problems.add(new Problem(userDir.get().toString(), 1, 1, "", "a readable profile folder",
                        "cannot read it (" + e.getMessage() + ")", ""));
            }
        }
        for (ProfileFile f : files) {
            int before = problems.size();
            Optional<YamlDoc> doc = YamlDoc.parse(f.label(), f.text(), problems);
            if (doc.isEmpty()) {
                continue;
            }
            doc.get().requireKind(kind.substring(0, kind.length() - 1));
            T value = reader.read(doc.get(), f.label(), problems);
            String name = doc.get().optionalText("name").orElse("");
            if (!name.equals(f.stem())) {
                doc.get().problem("name", "the file's name without .yaml (" + f.stem() + ")", "\"" + name + "\"");
            }
            if (problems.size() == before) {
                byName.put(name, value);
            }
        }
        return byName;
    }

    /** "unknown printer x; known: a, b, c" helper for messages. */
    public static String known(Map<String, ?> byName) {
        return String.join(", ", byName.keySet());
    }

}
