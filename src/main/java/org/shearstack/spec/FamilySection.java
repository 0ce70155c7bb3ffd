package org.shearstack.spec;

import java.io.StringReader;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.Yaml;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.YAMLException;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.nodes.NodeTuple;
import org.yaml.snakeyaml.nodes.ScalarNode;
import org.yaml.snakeyaml.nodes.SequenceNode;
import org.yaml.snakeyaml.nodes.Tag;

/**
 * The optional {@code family:} section of a spec: which keys to vary over which written values, and whether to
 * take the product of the lists (every combination, the default) or zip them (the i-th value of each list):
 *
 * <pre>
 * family:
 *   combine: product          # or zip
 *   vary:
 *     rotor.diameter: 60 mm, 80 mm, 100 mm
 *     filament: [pla, petg]
 * </pre>
 *
 * Values are checked later against the key's own parser ({@link SpecOverride}); this reader checks the shape and
 * the key names and keeps every value's location.
 *
 * @param vary  the varied keys in the order written (empty when the spec has no family section)
 * @param zip   true for {@code combine: zip}
 */
public record FamilySection(List<Vary> vary, boolean zip) {

    public static final String PRODUCT = "product";
    public static final String ZIP = "zip";

    public FamilySection {
        vary = List.copyOf(vary);
    }

    /**
     * One varied key with its values.
     *
     * @param key     the spec key
     * @param file    where it was written
     * @param line    1-based line of the key
     * @param column  1-based column of the key
     * @param values  the values, each with its own location
     */
    public record Vary(String key, String file, int line, int column, List<SpecOverride.Assignment> values) {
        public Vary {
            Objects.requireNonNull(key, "key");
            values = List.copyOf(values);
        }
    }

    /** The section, or every problem with its shape. */
    public record Result(Optional<FamilySection> section, List<Problem> problems) {
        public Result {
            problems = List.copyOf(problems);
        }

        public FamilySection orThrow() {
            if (!problems.isEmpty()) {
                throw new BadInputException(problems);
            }
            return section.orElseThrow();
        }
    }

    /** Splits a written list "60 mm, 80 mm" into located values; empty items are kept (and refused later). */
    public static List<SpecOverride.Assignment> split(String key, String text, String file, int line, int column) {
        List<SpecOverride.Assignment> out = new ArrayList<>();
        int start = 0;
        while (true) {
            int comma = text.indexOf(',', start);
            String piece = comma < 0 ? text.substring(start) : text.substring(start, comma);
            int lead = piece.length() - piece.stripLeading().length();
            out.add(new SpecOverride.Assignment(key, piece.strip(), file, line, column + start + lead));
            if (comma < 0) {
                return out;
            }
            start = comma + 1;
        }
    }

    /** Reads the family section of spec text (already read as a spec, so it is valid YAML). */
    public static Result read(String fileLabel, String text) {
        Node root;
        try {
            LoaderOptions o = new LoaderOptions();
            o.setMaxAliasesForCollections(20);
            o.setNestingDepthLimit(20);
            o.setCodePointLimit(SpecReader.MAX_BYTES);
            root = new Yaml(o).compose(new StringReader(text));
        } catch (YAMLException e) {
            return new Result(Optional.empty(), List.of(new Problem(fileLabel, 1, 1, "", "valid YAML",
                    String.valueOf(e.getMessage()).replace('\n', ' '), "")));
        }
        if (!(root instanceof MappingNode map)) {
            return new Result(Optional.of(new FamilySection(List.of(), false)), List.of());
        }
        for (NodeTuple t : map.getValue()) {
            if (t.getKeyNode() instanceof ScalarNode k && k.getValue().equals(SpecSchema.FAMILY_SECTION)) {
                return section(fileLabel, t.getValueNode());
            }
        }
        return new Result(Optional.of(new FamilySection(List.of(), false)), List.of());
    }

    private static Result section(String file, Node node) {
        List<Problem> problems = new ArrayList<>();
        String f = SpecSchema.FAMILY_SECTION;
        if (!(node instanceof MappingNode m)) {
            problems.add(SpecReader.located(file, node, f, "a section with vary: (and combine: product or zip)",
                    SpecReader.describe(node), ""));
            return new Result(Optional.empty(), problems);
        }
        boolean zip = false;
        List<Vary> vary = new ArrayList<>();
        boolean sawVary = false;
        for (NodeTuple t : m.getValue()) {
            String name = t.getKeyNode() instanceof ScalarNode k ? k.getValue() : "";
            Node value = t.getValueNode();
            if (name.equals("combine")) {
                String w = value instanceof ScalarNode s ? s.getValue().strip() : "";
                if (w.equals(ZIP) || w.equals(PRODUCT)) {
                    zip = w.equals(ZIP);
                } else {
                    problems.add(SpecReader.located(file, value, f + ".combine", "product or zip",
                            SpecReader.describe(value), ""));
                }
            } else if (name.equals("vary")) {
                sawVary = true;
                vary(file, value, vary, problems);
            } else {
                String hint = Suggest.nearest(name, List.of("combine", "vary")).map(s -> "did you mean " + s + "?")
                        .orElse("a family section has vary: and combine:");
                problems.add(SpecReader.located(file, t.getKeyNode(), f + "." + name, "vary or combine",
                        "unknown key " + f + "." + name, hint));
            }
        }
        if (!sawVary && problems.isEmpty()) {
            problems.add(SpecReader.located(file, node, f, "a vary: mapping of keys to lists of values",
                    "no vary", "e.g. vary: {rotor.diameter: 60 mm, 80 mm}"));
        }
        return problems.isEmpty() ? new Result(Optional.of(new FamilySection(vary, zip)), List.of())
                : new Result(Optional.empty(), problems);
    }

    private static void vary(String file, Node node, List<Vary> out, List<Problem> problems) {
        String path = SpecSchema.FAMILY_SECTION + ".vary";
        if (!(node instanceof MappingNode m) || m.getValue().isEmpty()) {
            problems.add(SpecReader.located(file, node, path, "a mapping of spec keys to lists of values, e.g. "
                    + "rotor.diameter: 60 mm, 80 mm", SpecReader.describe(node), ""));
            return;
        }
        Set<String> seen = new HashSet<>();
        for (NodeTuple t : m.getValue()) {
            Node keyNode = t.getKeyNode();
            if (!(keyNode instanceof ScalarNode ks) || ks.getTag().equals(Tag.NULL)) {
                problems.add(SpecReader.located(file, keyNode, path, "a spec key", SpecReader.describe(keyNode), ""));
                continue;
            }
            String key = ks.getValue();
            Mark km = keyNode.getStartMark();
            int line = km.getLine() + 1;
            int column = km.getColumn() + 1;
            Optional<Problem> bad = SpecOverride.checkKey(key, file, line, column);
            if (bad.isPresent()) {
                problems.add(bad.get());
                continue;
            }
            if (!seen.add(key)) {
                problems.add(new Problem(file, line, column, key, "each varied key once", "a second " + key, ""));
                continue;
            }
            List<SpecOverride.Assignment> values = values(file, key, t.getValueNode(), problems);
            if (!values.isEmpty()) {
                out.add(new Vary(key, file, line, column, values));
            }
        }
    }

    private static List<SpecOverride.Assignment> values(String file, String key, Node node, List<Problem> problems) {
        List<SpecOverride.Assignment> values = new ArrayList<>();
        if (node instanceof ScalarNode s && !s.getTag().equals(Tag.NULL) && !s.getValue().isBlank()) {
            Mark mk = s.getStartMark();
            boolean plainOneLine = s.getScalarStyle() == org.yaml.snakeyaml.DumperOptions.ScalarStyle.PLAIN
                    && s.getEndMark().getLine() == mk.getLine();
            if (plainOneLine) {
                values.addAll(split(key, s.getValue(), file, mk.getLine() + 1, mk.getColumn() + 1));
            } else {
                for (SpecOverride.Assignment a : split(key, s.getValue(), file, mk.getLine() + 1, mk.getColumn() + 1)) {
                    values.add(new SpecOverride.Assignment(key, a.written(), file, mk.getLine() + 1,
                            mk.getColumn() + 1));
                }
            }
        } else if (node instanceof SequenceNode seq && !seq.getValue().isEmpty()) {
            for (Node item : seq.getValue()) {
                if (item instanceof ScalarNode s) {
                    Mark mk = s.getStartMark();
                    values.add(new SpecOverride.Assignment(key, s.getValue().strip(), file, mk.getLine() + 1,
                            mk.getColumn() + 1));
                } else {
                    problems.add(SpecReader.located(file, item, key, "a single value", SpecReader.describe(item), ""));
                }
            }
        } else {
            problems.add(SpecReader.located(file, node, key, "a list of values, e.g. \"60 mm, 80 mm\" or [pla, petg]",
                    SpecReader.describe(node), ""));
        }
        return values;
    }
}
