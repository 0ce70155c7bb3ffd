package org.shearstack.spec;

import java.io.IOException;
import java.io.StringReader;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.Yaml;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.MarkedYAMLException;
import org.yaml.snakeyaml.error.YAMLException;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.nodes.NodeTuple;
import org.yaml.snakeyaml.nodes.ScalarNode;
import org.yaml.snakeyaml.nodes.Tag;

/**
 * Reads a YAML spec with SnakeYAML's compose API (nodes keep their line and column), checks every key
 * against {@link SpecSchema}, and returns a {@link Spec} or every problem found. Never throws for bad input.
 */
public final class SpecReader {

    /** Specs are short; anything larger is refused before parsing. */
    public static final int MAX_BYTES = 1 << 20;

    private SpecReader() {
    }

    /** Reads a spec file; the file name in problems is the path as given. */
    public static SpecResult read(Path file) {
        String label = file.toString();
        byte[] bytes;
        try {
            if (Files.isDirectory(file)) {
                return single(label, "a spec file", "a directory");
            }
            if (Files.size(file) > MAX_BYTES) {
                return single(label, "a spec of at most " + MAX_BYTES + " bytes", Files.size(file) + " bytes");
            }
            bytes = Files.readAllBytes(file);
        } catch (java.nio.file.NoSuchFileException e) {
            return single(label, "an existing spec file", "no such file");
        } catch (IOException e) {
            return single(label, "a readable file", "cannot read it (" + e.getClass().getSimpleName() + ")");
        }
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            return single(label, "UTF-8 text", "bytes that are not UTF-8");
        }
        return read(label, text);
    }

    /** Reads spec text; {@code fileLabel} names it in problems. */
    public static SpecResult read(String fileLabel, String text) {
        if (text.length() > MAX_BYTES) {
            return single(fileLabel, "a spec of at most " + MAX_BYTES + " characters", text.length() + " characters");
        }
        Node root;
        try {
            root = new Yaml(options()).compose(new StringReader(text));
        } catch (MarkedYAMLException e) {
            Mark m = e.getProblemMark() != null ? e.getProblemMark() : e.getContextMark();
            int line = m == null ? 1 : m.getLine() + 1;
            int column = m == null ? 1 : m.getColumn() + 1;
            String problem = e.getProblem() == null ? "YAML syntax error" : e.getProblem();
            return SpecResult.failed(List.of(new Problem(fileLabel, line, column, "", "valid YAML",
                    problem.replace('\n', ' '), "")));
        } catch (YAMLException e) {
            return single(fileLabel, "valid YAML", String.valueOf(e.getMessage()).replace('\n', ' '));
        }
        if (root == null) {
            return single(fileLabel, "a spec with at least a name", "an empty file");
        }
        if (!(root instanceof MappingNode map)) {
            return SpecResult.failed(List.of(located(fileLabel, root, "", "a mapping of keys such as supply:, rotor:",
                    describe(root), "")));
        }
        return new Walk(fileLabel).run(map);
    }

    private static LoaderOptions options() {
        LoaderOptions o = new LoaderOptions();
        o.setAllowDuplicateKeys(true); // we report duplicates ourselves, with locations
        o.setMaxAliasesForCollections(20);
        o.setNestingDepthLimit(20);
        o.setCodePointLimit(MAX_BYTES);
        o.setAllowRecursiveKeys(false);
        return o;
    }

    private static SpecResult single(String file, String expected, String found) {
        return SpecResult.failed(List.of(new Problem(file, 1, 1, "", expected, found, "")));
    }

    static Problem located(String file, Node node, String path, String expected, String found, String message) {
        Mark m = node.getStartMark();
        return new Problem(file, m.getLine() + 1, m.getColumn() + 1, path, expected, found, message);
    }

    static String describe(Node node) {
        if (node instanceof ScalarNode s) {
            return s.getTag().equals(Tag.NULL) ? "nothing" : QuantityParser.quoted(s.getValue());
        }
        return node instanceof MappingNode ? "a mapping" : "a list";
    }

    /** One pass over the document. */
    private static final class Walk {
        private final String file;
        private final List<Problem> problems = new ArrayList<>();
        private final List<SpecEntry> entries = new ArrayList<>();
        private final Map<String, Node> scalars = new LinkedHashMap<>();
        private double ambientPa = SpecSchema.STANDARD_ATMOSPHERE_PA;

        Walk(String file) {
            this.file = file;
        }

        SpecResult run(MappingNode root) {
            collect(root, "");
            Node ambient = scalars.get("supply.ambient");
            if (ambient instanceof ScalarNode s) {
                var parsed = QuantityParser.parse(s.getValue(), Dimension.PRESSURE, ambientPa, true);
                parsed.quantity().ifPresent(q -> ambientPa = q.value());
            }
            for (Map.Entry<String, Node> e : scalars.entrySet()) {
                parseScalar(e.getKey(), e.getValue());
            }
            Map<String, SpecEntry> byPath = new LinkedHashMap<>();
            for (SpecEntry e : entries) {
                byPath.put(e.path(), e);
            }
            String name = byPath.get("name") instanceof SpecEntry.Text t ? t.text() : "";
            if (name.isEmpty() && !scalars.containsKey("name")) {
                problems.add(new Problem(file, root.getStartMark().getLine() + 1, root.getStartMark().getColumn() + 1,
                        "name", "a design name, e.g. \"name: classroom-demo\"", "no name", ""));
            }
            if (!problems.isEmpty()) {
                return SpecResult.failed(problems);
            }
            Spec spec = new Spec(name, file, byPath);
            List<Problem> contradictions = SpecConsistency.check(spec, ambientPa);
            return contradictions.isEmpty() ? SpecResult.of(spec) : SpecResult.failed(contradictions);
        }

        private void collect(MappingNode map, String prefix) {
            Set<String> seen = new HashSet<>();
            for (NodeTuple t : map.getValue()) {
                Node keyNode = t.getKeyNode();
                Node valueNode = t.getValueNode();
                if (!(keyNode instanceof ScalarNode ks) || ks.getTag().equals(Tag.NULL)) {
                    problems.add(located(file, keyNode, prefix, "a key name", describe(keyNode), ""));
                    continue;
                }
                String path = prefix.isEmpty() ? ks.getValue() : prefix + "." + ks.getValue();
                if (!seen.add(ks.getValue())) {
                    problems.add(located(file, keyNode, path, "each key once", "a second " + path, ""));
                    continue;
                }
                if (path.equals(SpecSchema.FAMILY_SECTION)) {
                    continue; // read by FamilySection
                }
                if (SpecSchema.field(path).isPresent()) {
                    if (valueNode instanceof ScalarNode) {
                        scalars.put(path, valueNode);
                    } else {
                        problems.add(located(file, valueNode, path, "a single value", describe(valueNode), ""));
                    }
                } else if (SpecSchema.isSection(path)) {
                    if (valueNode instanceof MappingNode m) {
                        collect(m, path);
                    } else if (!(valueNode instanceof ScalarNode s && s.getTag().equals(Tag.NULL))) {
                        problems.add(located(file, valueNode, path, "a section of keys (" + path + ": then indented keys)",
                                describe(valueNode), ""));
                    }
                } else {
                    String hint = Suggest.nearest(path, SpecSchema.writablePaths()).map(s -> "did you mean " + s + "?")
                            .orElse("see the README for the spec keys");
                    problems.add(located(file, keyNode, path, "a known key", "unknown key " + path, hint));
                }
            }
        }

        private void parseScalar(String path, Node node) {
            ScalarNode s = (ScalarNode) node;
            if (s.getTag().equals(Tag.NULL) || s.getValue().isBlank()) {
                problems.add(located(file, node, path, "a value (or auto where the rules may decide)", "nothing", ""));
                return;
            }
            Mark m = node.getStartMark();
            FieldContext c = new FieldContext(file, path, s.getValue().strip(), m.getLine() + 1, m.getColumn() + 1,
                    ambientPa, entries, problems);
            SpecSchema.field(path).orElseThrow().parser().parse(s.getValue(), c);
        }
    }
}
