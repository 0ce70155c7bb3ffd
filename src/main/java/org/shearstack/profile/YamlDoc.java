package org.shearstack.profile;

import java.io.StringReader;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.shearstack.spec.Dimension;
import org.shearstack.spec.Problem;
import org.shearstack.spec.Quantity;
import org.shearstack.spec.QuantityParser;
import org.shearstack.spec.Range;
import org.shearstack.spec.DimensionText;
import org.shearstack.spec.Suggest;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.Yaml;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.MarkedYAMLException;
import org.yaml.snakeyaml.error.YAMLException;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.nodes.NodeTuple;
import org.yaml.snakeyaml.nodes.ScalarNode;
import org.yaml.snakeyaml.nodes.SequenceNode;
import org.yaml.snakeyaml.nodes.Tag;

/**
 * A located view of one YAML mapping from a profile file: typed getters that collect problems
 * (file:line:column, key, expected, found) instead of throwing. Profile values use absolute pressures.
 */
final class YamlDoc {

    private final String file;
    private final MappingNode map;
    private final String prefix;
    private final List<Problem> problems;
    private final Map<String, NodeTuple> byKey = new LinkedHashMap<>();

    private YamlDoc(String file, MappingNode map, String prefix, List<Problem> problems) {
        this.file = file;
        this.map = map;
        this.prefix = prefix;
        this.problems = problems;
        for (NodeTuple t : map.getValue()) {
            if (t.getKeyNode() instanceof ScalarNode k) {
                if (byKey.putIfAbsent(k.getValue(), t) != null) {
                    problems.add(at(k, path(k.getValue()), "each key once", "a second " + k.getValue(), ""));
                }
            } else {
                problems.add(at(t.getKeyNode(), prefix, "a key name", "a " + kind(t.getKeyNode()), ""));
            }
        }
    }

    /** Parses text; returns empty (with a problem) when it is not a YAML mapping. */
    static Optional<YamlDoc> parse(String file, String text, List<Problem> problems) {
        LoaderOptions o = new LoaderOptions();
        o.setMaxAliasesForCollections(20);
        o.setNestingDepthLimit(20);
        o.setCodePointLimit(4 << 20);
        Node root;
        try {
            root = new Yaml(o).compose(new StringReader(text));
        } catch (MarkedYAMLException e) {
            Mark m = e.getProblemMark() != null ? e.getProblemMark() : e.getContextMark();
            problems.add(new Problem(file, m == null ? 1 : m.getLine() + 1, m == null ? 1 : m.getColumn() + 1, "",
                    "valid YAML", String.valueOf(e.getProblem()).replace('\n', ' '), ""));
            return Optional.empty();
        } catch (YAMLException e) {
            problems.add(new Problem(file, 1, 1, "", "valid YAML", String.valueOf(e.getMessage()), ""));
            return Optional.empty();
        }
        if (!(root instanceof MappingNode m)) {
            problems.add(new Problem(file, 1, 1, "", "a mapping of profile keys", root == null ? "an empty file"
                    : "a " + kind(root), ""));
            return Optional.empty();
        }
        return Optional.of(new YamlDoc(file, m, "", problems));
    }

    String file() {
        return file;
    }

    int line() {
        return map.getStartMark().getLine() + 1;
    }

    /** Reports a missing or different {@code kind:} (a printer file in the filaments folder, say). */
    void requireKind(String kind) {
        String found = optionalText("kind").orElse("");
        if (!found.equals(kind)) {
            problem("kind", "kind: " + kind, found.isEmpty() ? "no kind" : "\"" + found + "\"");
        }
    }

    /** Reports keys not in the allowed set, with the nearest allowed one. */
    void allowOnly(Set<String> allowed) {
        for (Map.Entry<String, NodeTuple> e : byKey.entrySet()) {
            if (!allowed.contains(e.getKey())) {
                String hint = Suggest.nearest(e.getKey(), allowed).map(s -> "did you mean " + path(s) + "?").orElse("");
                problems.add(at(e.getValue().getKeyNode(), path(e.getKey()), "a known key", "unknown key "
                        + path(e.getKey()), hint));
            }
        }
    }

    boolean has(String key) {
        return byKey.containsKey(key);
    }

    /** A required text value; "" with a problem when missing. */
    String text(String key) {
        return optionalText(key).orElseGet(() -> {
            missing(key, "text");
            return "";
        });
    }

    Optional<String> optionalText(String key) {
        NodeTuple t = byKey.get(key);
        if (t == null) {
            return Optional.empty();
        }
        if (t.getValueNode() instanceof ScalarNode s && !s.getTag().equals(Tag.NULL)) {
            return Optional.of(s.getValue().strip());
        }
        problems.add(at(t.getValueNode(), path(key), "text", "a " + kind(t.getValueNode()), ""));
        return Optional.empty();
    }

    /** A required quantity in canonical units; NaN with a problem when missing or wrong. */
    double quantity(String key, Dimension d, Range range) {
        if (!byKey.containsKey(key)) {
            missing(key, DimensionText.noun(d) + " such as \"" + DimensionText.example(d) + "\"");
            return Double.NaN;
        }
        return optionalQuantity(key, d, range).orElse(Double.NaN);
    }

    Optional<Double> optionalQuantity(String key, Dimension d, Range range) {
        NodeTuple t = byKey.get(key);
        if (t == null) {
            return Optional.empty();
        }
        if (!(t.getValueNode() instanceof ScalarNode s) || s.getTag().equals(Tag.NULL)) {
            problems.add(at(t.getValueNode(), path(key), DimensionText.noun(d), describe(t.getValueNode()), ""));
            return Optional.empty();
        }
        QuantityParser.Parsed p = QuantityParser.parse(s.getValue(), d, 0, true);
        if (!p.ok()) {
            problems.add(at(s, path(key), p.expected(), p.found(), ""));
            return Optional.empty();
        }
        Quantity q = p.quantity().get();
        if (!range.contains(q.value(), 0)) {
            problems.add(at(s, path(key), DimensionText.noun(d) + " " + range.words(), "\"" + s.getValue() + "\"", ""));
            return Optional.empty();
        }
        return Optional.of(q.value());
    }

    /** A list of mappings (a table); empty with a problem when missing or not a list of mappings. */
    List<YamlDoc> table(String key) {
        NodeTuple t = byKey.get(key);
        if (t == null) {
            missing(key, "a list of entries");
            return List.of();
        }
        if (!(t.getValueNode() instanceof SequenceNode seq)) {
            problems.add(at(t.getValueNode(), path(key), "a list of entries (lines starting with '- ')",
                    describe(t.getValueNode()), ""));
            return List.of();
        }
        List<YamlDoc> rows = new ArrayList<>();
        int i = 0;
        for (Node n : seq.getValue()) {
            if (n instanceof MappingNode m) {
                rows.add(new YamlDoc(file, m, path(key) + "[" + i + "]", problems));
            } else {
                problems.add(at(n, path(key) + "[" + i + "]", "an entry of keys", describe(n), ""));
            }
            i++;
        }
        return rows;
    }

    /** A list of scalar quantities, e.g. standard screw lengths. */
    List<Double> quantities(String key, Dimension d, Range range) {
        NodeTuple t = byKey.get(key);
        if (t == null) {
            missing(key, "a list of values");
            return List.of();
        }
        if (!(t.getValueNode() instanceof SequenceNode seq)) {
            problems.add(at(t.getValueNode(), path(key), "a list of values", describe(t.getValueNode()), ""));
            return List.of();
        }
        List<Double> values = new ArrayList<>();
        for (Node n : seq.getValue()) {
            if (n instanceof ScalarNode s) {
                QuantityParser.Parsed p = QuantityParser.parse(s.getValue(), d, 0, true);
                if (p.ok() && range.contains(p.quantity().get().value(), 0)) {
                    values.add(p.quantity().get().value());
                } else {
                    problems.add(at(s, path(key), p.ok() ? DimensionText.noun(d) + " " + range.words() : p.expected(),
                            p.ok() ? "\"" + s.getValue() + "\"" : p.found(), ""));
                }
            } else {
                problems.add(at(n, path(key), "a value", describe(n), ""));
            }
        }
        return values;
    }

    /** A located problem under this mapping. */
    void problem(String key, String expected, String found) {
        NodeTuple t = byKey.get(key);
        Node n = t == null ? map : t.getValueNode();
        problems.add(at(n, path(key), expected, found, ""));
    }

    private void missing(String key, String expected) {
        problems.add(at(map, path(key), expected, "no " + key, ""));
    }

    private String path(String key) {
        return prefix.isEmpty() ? key : prefix + "." + key;
    }

    private Problem at(Node n, String path, String expected, String found, String message) {
        Mark m = n.getStartMark();
        return new Problem(file, m.getLine() + 1, m.getColumn() + 1, path, expected, found, message);
    }

    private static String describe(Node n) {
        if (n instanceof ScalarNode s) {
            return s.getTag().equals(Tag.NULL) ? "nothing" : "\"" + s.getValue() + "\"";
        }
        return "a " + kind(n);
    }

    private static String kind(Node n) {
        return n instanceof MappingNode ? "mapping" : n instanceof SequenceNode ? "list" : "value";
    }
}
