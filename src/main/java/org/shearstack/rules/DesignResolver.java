package org.shearstack.rules;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.profile.FilamentProfile;
import org.shearstack.profile.PrinterProfile;
import org.shearstack.profile.Profiles;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.Problem;
import org.shearstack.spec.Spec;
import org.shearstack.spec.SpecDefault;
import org.shearstack.spec.SpecEntry;
import org.shearstack.spec.SpecSchema;

/**
 * From a checked spec and the profiles to a resolved design: picks the printer and filament, seeds spec
 * values, profile values and stated defaults, runs the engine, and turns missing or rejected inputs into
 * located problems ({@link BadInputException}, exit code 2).
 */
public final class DesignResolver {

    private DesignResolver() {
    }

    /** Resolves with every registered rule. */
    public static ResolvedDesign resolve(Spec spec, Profiles profiles) {
        return resolve(spec, profiles, RuleCatalog.engine(profiles));
    }

    /** Resolves with a given engine (tests, or a subset of rules). */
    public static ResolvedDesign resolve(Spec spec, Profiles profiles, Engine engine) {
        List<Problem> problems = new ArrayList<>();
        Optional<PrinterProfile> printer = pick(spec, "printer", profiles.printers(), Profiles::readPrinter, problems);
        Optional<FilamentProfile> filament = pick(spec, "filament", profiles.filaments(), Profiles::readFilament,
                problems);
        HardwareNames.check(spec, profiles.hardware(), problems);
        List<Seed> calibration = org.shearstack.rules.sizing.SpecCalibration.seeds(spec, problems);
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        List<Seed> seeds = new ArrayList<>(specSeeds(spec));
        seeds.addAll(ProfileSeeds.printer(printer.orElseThrow()));
        seeds.addAll(ProfileSeeds.filament(filament.orElseThrow()));
        seeds.addAll(calibration);
        Resolution r = engine.resolve(spec.name(), spec.sourceFile(), seeds);
        java.util.Set<String> reported = new java.util.HashSet<>();
        for (MissingInput m : r.missing()) {
            if (!reported.add(m.key().name())) {
                continue; // one problem per missing key, naming the first rule that needed it
            }
            problems.add(spec.problemAt(m.key().name(), "a value for " + m.key().name() + " (rule " + m.ruleId()
                    + " needs it)", "nothing", ""));
        }
        for (InputRejectedException e : r.rejected()) {
            problems.add(spec.problemAt(e.key().name(), e.expected(), e.found(), ""));
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        return r.design();
    }

    /** Spec values (SPEC, become PINNED where a rule derives the key) and stated defaults for keys left out. */
    static List<Seed> specSeeds(Spec spec) {
        Map<String, org.shearstack.spec.Dimension> dims = SpecSchema.allKeys();
        List<Seed> seeds = new ArrayList<>();
        for (SpecEntry e : spec.entries().values()) {
            String where = spec.sourceFile() + ":" + e.line() + ":" + e.column();
            String formula = "as written: " + e.written();
            if (e instanceof SpecEntry.Value v) {
                seeds.add(Seed.number(Key.of(e.path(), dims.get(e.path())), v.quantity().value(),
                        Derivation.Origin.SPEC, e.path(), formula, where));
            } else if (e instanceof SpecEntry.Text t) {
                seeds.add(Seed.text(Key.of(e.path(), dims.get(e.path())), t.text(), Derivation.Origin.SPEC, e.path(),
                        formula, where));
            }
        }
        for (SpecDefault d : SpecSchema.defaults()) {
            if (spec.entry(d.path()).filter(e -> !(e instanceof SpecEntry.Auto)).isPresent()) {
                continue;
            }
            Key k = Key.of(d.path(), d.dimension());
            seeds.add(d.isText()
                    ? Seed.text(k, d.text(), Derivation.Origin.DEFAULT, "default", "stated default", d.reason())
                    : Seed.number(k, d.value(), Derivation.Origin.DEFAULT, "default", "stated default", d.reason()));
        }
        return seeds;
    }

    private static <T> Optional<T> pick(Spec spec, String key, Map<String, T> known, Function<Path, T> fromFile,
                                        List<Problem> problems) {
        String name = spec.text(key).orElseGet(() -> SpecSchema.defaults().stream()
                .filter(d -> d.path().equals(key)).findFirst().orElseThrow().text());
        if (name.endsWith(".yaml") || name.contains("/")) {
            Path base = Path.of(spec.sourceFile()).toAbsolutePath().getParent();
            Path file = base == null ? Path.of(name) : base.resolve(name);
            if (!java.nio.file.Files.isRegularFile(file)) {
                problems.add(spec.problemAt(key, "a " + key + " profile file", "no file " + file, ""));
                return Optional.empty();
            }
            try {
                return Optional.of(fromFile.apply(file));
            } catch (BadInputException e) {
                problems.addAll(e.problems());
                return Optional.empty();
            }
        }
        T value = known.get(name);
        if (value == null) {
            problems.add(spec.problemAt(key, "a known " + key + " (" + Profiles.known(known) + ") or a profile file",
                    "\"" + name + "\"", org.shearstack.spec.Suggest.nearest(name, known.keySet())
                            .map(s -> "did you mean " + s + "?").orElse("")));
            return Optional.empty();
        }
        return Optional.of(value);
    }
}
