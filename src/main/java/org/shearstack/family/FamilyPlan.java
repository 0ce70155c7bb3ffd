package org.shearstack.family;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.shearstack.io.family.VariedKey;
import org.shearstack.io.family.VariedValue;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.FamilySection;
import org.shearstack.spec.Problem;
import org.shearstack.spec.Spec;
import org.shearstack.spec.SpecOverride;
import org.shearstack.spec.SpecResult;

/**
 * Which variants a family has: the base spec, the varied keys with their values (each checked against the key's
 * own parser before anything runs), and how the lists combine: the product (every combination, the first key
 * varying slowest) or a zip (the i-th value of every list). Variants are made on demand from their index, so a
 * large sweep holds no list of specs.
 */
public final class FamilyPlan {

    /** More variants than this is surely a typing slip. */
    public static final long MAX_VARIANTS = 1_000_000;
    /** Folder names longer than this are cut and given the variant's number. */
    static final int MAX_NAME = 120;

    private final Spec base;
    private final List<FamilySection.Vary> vary;
    private final List<VariedKey> keys;
    private final List<List<VariedValue>> values;
    private final boolean zip;
    private final int size;

    private FamilyPlan(Spec base, List<FamilySection.Vary> vary, List<VariedKey> keys, List<List<VariedValue>> values,
            boolean zip, int size) {
        this.base = base;
        this.vary = vary;
        this.keys = keys;
        this.values = values;
        this.zip = zip;
        this.size = size;
    }

    /**
     * Checks and builds a plan; throws {@link BadInputException} with every problem (an unknown key with the nearest
     * one, a value wrong for its key, lists of unequal length for a zip, a value given twice).
     */
    public static FamilyPlan of(Spec base, List<FamilySection.Vary> vary, boolean zip) {
        List<Problem> problems = new ArrayList<>();
        if (vary.isEmpty()) {
            problems.add(new Problem(base.sourceFile(), 1, 1, "family", "at least one key to vary "
                    + "(--vary KEY=V1,V2,... or a family: section)", "none", ""));
            throw new BadInputException(problems);
        }
        List<VariedKey> keys = new ArrayList<>();
        List<List<VariedValue>> values = new ArrayList<>();
        Set<String> seenKeys = new HashSet<>();
        for (FamilySection.Vary v : vary) {
            java.util.Optional<Problem> badKey = SpecOverride.checkKey(v.key(), v.file(), v.line(), v.column());
            if (badKey.isPresent()) {
                problems.add(badKey.get());
                keys.add(new VariedKey(v.key(), ""));
                values.add(List.of());
                continue;
            }
            if (!seenKeys.add(v.key())) {
                problems.add(new Problem(v.file(), v.line(), v.column(), v.key(), "each varied key once",
                        "a second " + v.key(), ""));
            }
            List<VariedValue> vs = new ArrayList<>();
            Set<String> seen = new HashSet<>();
            String unit = "";
            for (SpecOverride.Assignment a : v.values()) {
                SpecOverride.Parsed p = SpecOverride.parse(base, a);
                problems.addAll(p.problems());
                String written = VariedValues.normalise(a.written());
                if (!zip && !seen.add(written)) {
                    problems.add(new Problem(a.file(), a.line(), a.column(), a.path(), "each value once",
                            "\"" + a.written() + "\" again", ""));
                }
                if (p.ok()) {
                    VariedValues.Shown shown = VariedValues.shown(p.entries(), a.path(), SpecOverride.ambientPa(base));
                    unit = unit.isEmpty() ? shown.unit() : unit;
                    vs.add(new VariedValue(written, shown.number()));
                }
            }
            keys.add(new VariedKey(v.key(), unit));
            values.add(vs);
        }
        if (zip) {
            FamilySection.Vary first = vary.get(0);
            for (FamilySection.Vary v : vary) {
                if (v.values().size() != first.values().size()) {
                    problems.add(new Problem(v.file(), v.line(), v.column(), v.key(), first.values().size()
                            + " values (as many as " + first.key() + ") to zip the lists", v.values().size()
                            + " values", "zipped lists pair their values in order; leave out --zip for every"
                            + " combination"));
                }
            }
        }
        long count = zip ? vary.get(0).values().size() : 1;
        if (!zip) {
            for (FamilySection.Vary v : vary) {
                count = Math.min(count * v.values().size(), MAX_VARIANTS + 1);
            }
        }
        if (count > MAX_VARIANTS) {
            FamilySection.Vary v = vary.get(0);
            problems.add(new Problem(v.file(), v.line(), v.column(), v.key(), "at most " + MAX_VARIANTS
                    + " variants", "more", "vary fewer keys or fewer values"));
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        FamilyPlan plan = new FamilyPlan(base, List.copyOf(vary), List.copyOf(keys), List.copyOf(values), zip,
                (int) count);
        if (zip) {
            Map<String, Integer> names = new HashMap<>();
            for (int i = 0; i < plan.size(); i++) {
                Integer before = names.put(plan.variant(i).name(), i);
                if (before != null) {
                    FamilySection.Vary v = vary.get(0);
                    problems.add(new Problem(v.file(), v.line(), v.column(), v.key(), "each zipped combination once",
                            "variants " + (before + 1) + " and " + (i + 1) + " are both " + plan.variant(i).name(), ""));
                }
            }
            if (!problems.isEmpty()) {
                throw new BadInputException(problems);
            }
        }
        return plan;
    }

    public Spec base() {
        return base;
    }

    public List<VariedKey> keys() {
        return keys;
    }

    public boolean zip() {
        return zip;
    }

    public int size() {
        return size;
    }

    /** The variant at an index, 0 to size() - 1. */
    public Variant variant(int index) {
        if (index < 0 || index >= size) {
            throw new IndexOutOfBoundsException("variant " + index + " of " + size);
        }
        int[] pick = new int[vary.size()];
        int rest = index;
        for (int k = vary.size() - 1; k >= 0; k--) {
            int n = vary.get(k).values().size();
            pick[k] = zip ? index : rest % n;
            rest = zip ? rest : rest / n;
        }
        List<VariedValue> vs = new ArrayList<>();
        List<SpecOverride.Assignment> as = new ArrayList<>();
        StringBuilder name = new StringBuilder();
        for (int k = 0; k < vary.size(); k++) {
            VariedValue v = values.get(k).get(pick[k]);
            vs.add(v);
            as.add(vary.get(k).values().get(pick[k]));
            name.append(k == 0 ? "" : ",").append(vary.get(k).key()).append('=').append(v.written());
        }
        return new Variant(index, folderName(name.toString(), index), vs, as);
    }

    /** The variant's spec: the base with its values set and its name ("base name=value"), or the problems. */
    public SpecResult spec(Variant v) {
        return SpecOverride.apply(base, base.name() + " " + v.name(), v.assignments());
    }

    /** The folder name of a variant: its name, cut and numbered when very long. */
    static String folderName(String s, int index) {
        if (s.length() > MAX_NAME) {
            s = s.substring(0, MAX_NAME - 8) + "~" + String.format(java.util.Locale.ROOT, "%07d", index + 1);
        }
        return s;
    }
}
