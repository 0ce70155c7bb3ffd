package org.shearstack.io.calibration;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.shearstack.physics.calibration.CalibrationFit;
import org.shearstack.physics.calibration.FittedCoefficient;
import org.shearstack.physics.rotor.AdmissionReading;
import org.shearstack.physics.rotor.Calibration;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.Dimension;
import org.shearstack.spec.Problem;
import org.shearstack.spec.QuantityParser;
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

/**
 * The calibration file a spec can reference ({@code calibration: my-bench.yaml}): the fitted coefficients of a
 * {@link Calibration}, which of them the bench data determined, and the before/after figures. Written by
 * {@code shearstack calibrate}; read back with located problems (file:line:column, key, expected, found).
 */
public final class CalibrationFile {
    /** Format identifier, the first key of the file. */
    public static final String FORMAT = "shearstack-calibration/1";
    private static final long MAX_BYTES = 1 << 20;
    private static final Set<String> KEYS = Set.of("format", "admission", "end-face-scale", "rim-scale",
            "bearing-friction-coefficient", "bearing-speed-factor", "seal-torque-per-bearing", "discharge-scale",
            "fitted", "from", "before-after");

    private CalibrationFile() {
    }

    /** What a calibration file holds. */
    public record Contents(Calibration calibration, Set<String> fittedKeys) {
        public Contents {
            fittedKeys = Set.copyOf(fittedKeys);
        }
    }

    /** The file text for a fit; {@code design} and {@code logs} are recorded as given. */
    public static String render(CalibrationFit fit, String design, List<String> logs) {
        Calibration c = fit.after();
        Set<String> fitted = new TreeSet<>();
        for (FittedCoefficient f : fit.coefficients()) {
            if (f.fitted()) {
                switch (f.key()) {
                    case "windage-scale" -> {
                        fitted.add("end-face-scale");
                        fitted.add("rim-scale");
                    }
                    case "seal-torque-per-bearing-nm" -> fitted.add("seal-torque-per-bearing");
                    default -> fitted.add(f.key());
                }
            }
        }
        StringBuilder s = new StringBuilder();
        s.append("# Loss coefficients fitted to bench runs by 'shearstack calibrate'.\n");
        s.append("# Use it from a spec with:  calibration: <this file>\n");
        s.append("# Coefficients not listed under 'fitted' are the prior (nominal) values: the logs could not tell.\n");
        s.append("format: ").append(FORMAT).append('\n');
        s.append("admission: ").append(c.admission().name().toLowerCase(Locale.ROOT).replace('_', '-'))
                .append("   # jet-fraction-only or rim-struck-capped\n");
        s.append("end-face-scale: ").append(num(c.endFaceScale())).append("   # times the Daily & Nece end-face moment\n");
        s.append("rim-scale: ").append(num(c.rimScale())).append("   # times the rim friction moment\n");
        s.append("bearing-friction-coefficient: ").append(num(c.bearingFrictionCoefficient()))
                .append("   # mu of the bearing load term\n");
        s.append("bearing-speed-factor: ").append(num(c.bearingSpeedFactor())).append("   # Palmgren f0\n");
        s.append("seal-torque-per-bearing: ").append(num(c.sealTorquePerBearingNm() * 1e3)).append(" mN*m\n");
        s.append("discharge-scale: ").append(num(c.dischargeScale())).append("   # times the nozzle discharge"
                + " coefficient\n");
        s.append("fitted: [").append(String.join(", ", fitted)).append("]\n");
        s.append("from:\n  design: ").append(quote(design)).append("\n  logs:\n");
        for (String l : logs) {
            s.append("    - ").append(quote(l)).append('\n');
        }
        s.append("before-after:\n");
        s.append("  measured-no-load-speed: ").append(num(fit.measuredNoLoadRadPerS())).append(" rad/s\n");
        s.append("  predicted-no-load-speed-before: ").append(num(fit.noLoadBeforeRadPerS())).append(" rad/s\n");
        s.append("  predicted-no-load-speed-after: ").append(num(fit.noLoadAfterRadPerS())).append(" rad/s\n");
        s.append("  coast-down-loss-rms-before: ").append(num(fit.lossRmsBeforeNm() * 1e3)).append(" mN*m\n");
        s.append("  coast-down-loss-rms-after: ").append(num(fit.lossRmsAfterNm() * 1e3)).append(" mN*m\n");
        s.append("  run-up-torque-rms-before: ").append(num(fit.torqueRmsBeforeNm() * 1e3)).append(" mN*m\n");
        s.append("  run-up-torque-rms-after: ").append(num(fit.torqueRmsAfterNm() * 1e3)).append(" mN*m\n");
        return s.toString();
    }

    /** Reads a calibration file. @throws BadInputException with every located problem */
    public static Contents read(Path file) throws IOException {
        String name = file.toString();
        if (Files.size(file) > MAX_BYTES) {
            throw new BadInputException(List.of(new Problem(name, 1, 1, "", "a calibration file under 1 MiB",
                    Files.size(file) + " bytes", "")));
        }
        return parse(name, Files.readString(file, StandardCharsets.UTF_8));
    }

    /** Parses calibration text; {@code name} is used in problems. */
    public static Contents parse(String name, String text) {
        List<Problem> problems = new ArrayList<>();
        LoaderOptions o = new LoaderOptions();
        o.setMaxAliasesForCollections(10);
        o.setNestingDepthLimit(10);
        o.setAllowDuplicateKeys(false);
        Node root;
        try {
            root = new Yaml(o).compose(new StringReader(text));
        } catch (MarkedYAMLException e) {
            Mark m = e.getProblemMark();
            throw new BadInputException(List.of(new Problem(name, m == null ? 1 : m.getLine() + 1,
                    m == null ? 1 : m.getColumn() + 1, "", "valid YAML", String.valueOf(e.getProblem()), "")));
        } catch (YAMLException e) {
            throw new BadInputException(List.of(new Problem(name, 1, 1, "", "valid YAML", e.getMessage(), "")));
        }
        if (!(root instanceof MappingNode map)) {
            throw new BadInputException(List.of(new Problem(name, 1, 1, "", "a mapping of calibration keys",
                    root == null ? "an empty file" : "a " + root.getNodeId().name().toLowerCase(Locale.ROOT), "")));
        }
        Map<String, NodeTuple> byKey = new LinkedHashMap<>();
        for (NodeTuple t : map.getValue()) {
            String k = t.getKeyNode() instanceof ScalarNode s ? s.getValue() : "";
            if (!KEYS.contains(k)) {
                problems.add(at(name, t.getKeyNode(), k, "one of " + new TreeSet<>(KEYS), "unknown key '" + k + "'"));
            } else if (byKey.put(k, t) != null) {
                problems.add(at(name, t.getKeyNode(), k, "each key once", "a second '" + k + "'"));
            }
        }
        String format = scalar(name, byKey, "format", problems);
        if (format != null && !format.equals(FORMAT)) {
            problems.add(at(name, byKey.get("format").getValueNode(), "format", FORMAT, "'" + format + "'"));
        }
        Calibration nominal = Calibration.nominal();
        AdmissionReading adm = nominal.admission();
        String a = scalar(name, byKey, "admission", problems);
        if (a != null) {
            try {
                adm = AdmissionReading.valueOf(a.toUpperCase(Locale.ROOT).replace('-', '_'));
            } catch (IllegalArgumentException e) {
                problems.add(at(name, byKey.get("admission").getValueNode(), "admission",
                        "jet-fraction-only or rim-struck-capped", "'" + a + "'"));
            }
        }
        double end = number(name, byKey, "end-face-scale", Dimension.DIMENSIONLESS, problems);
        double rim = number(name, byKey, "rim-scale", Dimension.DIMENSIONLESS, problems);
        double mu = number(name, byKey, "bearing-friction-coefficient", Dimension.DIMENSIONLESS, problems);
        double f0 = number(name, byKey, "bearing-speed-factor", Dimension.DIMENSIONLESS, problems);
        double seal = number(name, byKey, "seal-torque-per-bearing", Dimension.TORQUE, problems);
        double dis = number(name, byKey, "discharge-scale", Dimension.DIMENSIONLESS, problems);
        if (dis == 0 && byKey.containsKey("discharge-scale")) {
            problems.add(at(name, byKey.get("discharge-scale").getValueNode(), "discharge-scale", "a number > 0", "0"));
        }
        Set<String> fitted = new TreeSet<>();
        NodeTuple ft = byKey.get("fitted");
        if (ft != null) {
            if (ft.getValueNode() instanceof SequenceNode seq) {
                for (Node n : seq.getValue()) {
                    String v = n instanceof ScalarNode s ? s.getValue() : "";
                    if (KEYS.contains(v) && !Set.of("format", "fitted", "from", "before-after").contains(v)) {
                        fitted.add(v);
                    } else {
                        problems.add(at(name, n, "fitted", "a coefficient key", "'" + v + "'"));
                    }
                }
            } else {
                problems.add(at(name, ft.getValueNode(), "fitted", "a list of coefficient keys", "a single value"));
            }
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        return new Contents(new Calibration(adm, or(end, nominal.endFaceScale()), or(rim, nominal.rimScale()),
                or(mu, nominal.bearingFrictionCoefficient()), or(f0, nominal.bearingSpeedFactor()),
                or(seal, nominal.sealTorquePerBearingNm()), or(dis, nominal.dischargeScale()), "calibrated"), fitted);
    }

    private static double or(double v, double fallback) {
        return Double.isNaN(v) ? fallback : v;
    }

    private static String scalar(String file, Map<String, NodeTuple> byKey, String key, List<Problem> problems) {
        NodeTuple t = byKey.get(key);
        if (t == null) {
            if (key.equals("format")) {
                problems.add(new Problem(file, 1, 1, "format", "the key 'format: " + FORMAT + "'", "no format key", ""));
            }
            return null;
        }
        if (t.getValueNode() instanceof ScalarNode s) {
            return s.getValue().strip();
        }
        problems.add(at(file, t.getValueNode(), key, "a single value", "a list or mapping"));
        return null;
    }

    /** A non-negative number in canonical units (N·m for torques); NaN when absent or wrong. */
    private static double number(String file, Map<String, NodeTuple> byKey, String key, Dimension d,
            List<Problem> problems) {
        String text = scalar(file, byKey, key, problems);
        if (text == null) {
            return Double.NaN;
        }
        QuantityParser.Parsed p = QuantityParser.parse(text, d, 101325, true);
        if (!p.ok()) {
            problems.add(at(file, byKey.get(key).getValueNode(), key, p.expected(), p.found()));
            return Double.NaN;
        }
        double v = p.quantity().get().value();
        if (!(v >= 0) || Double.isInfinite(v)) {
            problems.add(at(file, byKey.get(key).getValueNode(), key, "a value >= 0", "'" + text + "'"));
            return Double.NaN;
        }
        return v;
    }

    private static Problem at(String file, Node n, String key, String expected, String found) {
        return new Problem(file, n.getStartMark().getLine() + 1, n.getStartMark().getColumn() + 1, key, expected,
                found, "");
    }

    private static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.6g", v).replaceAll("(\\.\\d*?)0+$", "$1")
                .replaceAll("\\.$", "") : ".nan";
    }

    private static String quote(String s) {
        return "'" + s.replace("'", "''") + "'";
    }

    /** Writes the file atomically (temporary name, then moved into place). */
    public static void write(Path file, String text) throws IOException {
        Path dir = file.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        Path tmp = Files.createTempFile(dir, "." + file.getFileName() + "-", ".tmp");
        try {
            Files.writeString(tmp, text, StandardCharsets.UTF_8);
            Files.move(tmp, file, java.nio.file.StandardCopyOption.REPLACE_EXISTING,
                    java.nio.file.StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
