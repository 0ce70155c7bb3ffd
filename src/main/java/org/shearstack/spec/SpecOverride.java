package org.shearstack.spec;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * A spec with some keys set to other written values (a family's variants): each value is parsed by the key's own
 * field parser, with units and ranges, exactly as if it stood in the file, and the pinned-value consistency checks
 * run again on the result.
 */
public final class SpecOverride {

    /** Keys that cannot be varied: the name names the family, not a variant. */
    private static final List<String> FIXED = List.of("name");

    /**
     * One key set to a written value, with where the value was written (a spec's family section or a command-line
     * option) so that problems point at it.
     *
     * @param path     the key ("rotor.diameter", "filament")
     * @param written  the value as written ("60 mm", "pla")
     * @param file     where it was written (a spec file, or a description of the command-line option)
     * @param line     1-based line
     * @param column   1-based column of the value
     */
    public record Assignment(String path, String written, String file, int line, int column) {
        public Assignment {
            Objects.requireNonNull(path, "path");
            Objects.requireNonNull(written, "written");
            Objects.requireNonNull(file, "file");
        }
    }

    private SpecOverride() {
    }

    /** The keys a family may vary, in documentation order. */
    public static List<String> variableKeys() {
        List<String> keys = new ArrayList<>();
        for (SpecField f : SpecSchema.fields()) {
            if (!FIXED.contains(f.path())) {
                keys.add(f.path());
            }
        }
        return List.copyOf(keys);
    }

    /** A problem when {@code path} is not a key a family may vary (with the nearest key as a hint). */
    public static Optional<Problem> checkKey(String path, String file, int line, int column) {
        if (FIXED.contains(path)) {
            return Optional.of(new Problem(file, line, column, path, "a spec key other than name",
                    "name", "the name is the family's; each variant's folder is named after its values"));
        }
        if (SpecSchema.field(path).isPresent()) {
            return Optional.empty();
        }
        String hint = Suggest.nearest(path, variableKeys()).map(s -> "did you mean " + s + "?")
                .orElse("see the README for the spec keys");
        return Optional.of(new Problem(file, line, column, path, "a spec key such as rotor.diameter",
                "unknown key " + path, hint));
    }

    /** One value parsed alone: the entries it makes, or its problems. */
    public record Parsed(List<SpecEntry> entries, List<Problem> problems) {
        public Parsed {
            entries = List.copyOf(entries);
            problems = List.copyOf(problems);
        }

        public boolean ok() {
            return problems.isEmpty();
        }
    }

    /**
     * Parses one value alone against a base spec (whose ambient pressure reads gauge values): the entries it makes
     * (the key and any sub-key), or the problems when the value is wrong for its key.
     */
    public static Parsed parse(Spec base, Assignment a) {
        Optional<Problem> key = checkKey(a.path(), a.file(), a.line(), a.column());
        if (key.isPresent()) {
            return new Parsed(List.of(), List.of(key.get()));
        }
        List<Problem> problems = new ArrayList<>();
        List<SpecEntry> entries = new ArrayList<>();
        parse(a, ambientPa(base), entries, problems);
        return new Parsed(problems.isEmpty() ? entries : List.of(), problems);
    }

    /** The ambient pressure a spec reads gauge values against, Pa absolute. */
    public static double ambientPa(Spec base) {
        return base.quantity("supply.ambient").map(Quantity::value).orElse(SpecSchema.STANDARD_ATMOSPHERE_PA);
    }

    /**
     * The base spec with the assignments applied, named {@code name}; or every problem (a value that does not
     * parse, or pinned values that now contradict each other).
     */
    public static SpecResult apply(Spec base, String name, List<Assignment> assignments) {
        List<Problem> problems = new ArrayList<>();
        Map<String, SpecEntry> entries = new LinkedHashMap<>(base.entries());
        double ambient = ambientPa(base);
        List<Assignment> ordered = new ArrayList<>(assignments);
        // the ambient pressure first: gauge values of the other keys are read against it
        ordered.sort((x, y) -> Boolean.compare(!x.path().equals("supply.ambient"), !y.path().equals("supply.ambient")));
        for (Assignment a : ordered) {
            Optional<Problem> key = checkKey(a.path(), a.file(), a.line(), a.column());
            if (key.isPresent()) {
                problems.add(key.get());
                continue;
            }
            List<SpecEntry> parsed = new ArrayList<>();
            int before = problems.size();
            parse(a, ambient, parsed, problems);
            if (problems.size() > before) {
                continue;
            }
            for (String k : SpecSchema.field(a.path()).orElseThrow().keys().keySet()) {
                entries.remove(k);
            }
            for (SpecEntry e : parsed) {
                entries.put(e.path(), e);
                if (e.path().equals("supply.ambient") && e instanceof SpecEntry.Value v) {
                    ambient = v.quantity().value();
                }
            }
        }
        if (!problems.isEmpty()) {
            return SpecResult.failed(problems);
        }
        Spec spec = new Spec(name, base.sourceFile(), entries);
        List<Problem> contradictions = SpecConsistency.check(spec, ambient);
        return contradictions.isEmpty() ? SpecResult.of(spec) : SpecResult.failed(contradictions);
    }

    private static void parse(Assignment a, double ambientPa, List<SpecEntry> entries, List<Problem> problems) {
        if (a.written().isBlank()) {
            problems.add(new Problem(a.file(), a.line(), a.column(), a.path(), "a value", "nothing", ""));
            return;
        }
        FieldContext c = new FieldContext(a.file(), a.path(), a.written().strip(), a.line(), a.column(), ambientPa,
                entries, problems);
        SpecSchema.field(a.path()).orElseThrow().parser().parse(a.written(), c);
    }
}
