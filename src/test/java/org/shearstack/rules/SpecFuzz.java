package org.shearstack.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.shearstack.profile.Profiles;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.Problem;
import org.shearstack.spec.SpecReader;
import org.shearstack.spec.SpecResult;

/**
 * Mutates a valid spec and checks the outcome: either a design, or located problems; never another
 * exception. Shared by the quick test and the bench-tagged long run.
 */
final class SpecFuzz {

    private static final String[] TOKENS = {"auto", "0", "-1 mm", "1e308 mm", "6 bar(g)", "6 mm", "", "~", "[1, 2]",
        "{a: b}", "metal", "o-ring x", "9 V at", "at", "G1/8", "608", "nan mm", "1/0", "&a x", "*a", "\"", "'",
        "0.75", "20 degC", "15000 rpm", "M3", "generic-0.4", "petg", "true", "push-in 6 mm", ": :", "- x", "\t"};

    /** Outcome counts. */
    record Counts(int designs, int rejected) {
    }

    private SpecFuzz() {
    }

    static Counts run(String valid, int cases, long seed) {
        Random random = new Random(seed);
        Profiles profiles = Profiles.shipped();
        Engine engine = RuleCatalog.engine(profiles);
        int designs = 0;
        int rejected = 0;
        for (int i = 0; i < cases; i++) {
            String mutated = mutate(valid, random);
            try {
                SpecResult r = SpecReader.read("fuzz.yaml", mutated);
                if (!r.ok()) {
                    checkLocated(r.problems(), mutated);
                    rejected++;
                    continue;
                }
                try {
                    DesignResolver.resolve(r.spec().orElseThrow(), profiles, engine);
                    designs++;
                } catch (BadInputException e) {
                    checkLocated(e.problems(), mutated);
                    rejected++;
                }
            } catch (RuntimeException | AssertionError e) {
                throw new AssertionError("case " + i + " (seed " + seed + ") failed on:\n" + mutated, e);
            }
        }
        return new Counts(designs, rejected);
    }

    private static void checkLocated(List<Problem> problems, String text) {
        if (problems.isEmpty()) {
            throw new AssertionError("rejected without problems");
        }
        long lines = text.lines().count() + 2;
        for (Problem p : problems) {
            if (!p.file().equals("fuzz.yaml") || p.line() < 1 || p.line() > lines || p.column() < 1
                    || p.format().isBlank()) {
                throw new AssertionError("badly located problem: " + p.format());
            }
        }
    }

    static String mutate(String valid, Random r) {
        List<String> lines = new ArrayList<>(valid.lines().toList());
        int edits = 1 + r.nextInt(3);
        for (int e = 0; e < edits && !lines.isEmpty(); e++) {
            int i = r.nextInt(lines.size());
            String line = lines.get(i);
            switch (r.nextInt(7)) {
                case 0 -> lines.remove(i);
                case 1 -> lines.add(i, line);
                case 2 -> {
                    int colon = line.indexOf(':');
                    if (colon >= 0) {
                        lines.set(i, line.substring(0, colon + 1) + " " + TOKENS[r.nextInt(TOKENS.length)]);
                    }
                }
                case 3 -> {
                    if (!line.isEmpty()) {
                        int at = r.nextInt(line.length());
                        lines.set(i, line.substring(0, at) + line.substring(at + 1));
                    }
                }
                case 4 -> {
                    int at = r.nextInt(line.length() + 1);
                    char c = (char) (32 + r.nextInt(95));
                    lines.set(i, line.substring(0, at) + c + line.substring(at));
                }
                case 5 -> lines.set(i, (r.nextBoolean() ? "  " : "") + line.strip());
                default -> {
                    int j = r.nextInt(lines.size());
                    lines.set(i, lines.get(j));
                    lines.set(j, line);
                }
            }
        }
        return String.join("\n", lines) + "\n";
    }
}
