package org.shearstack.io.benchlog;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.shearstack.check.Finding;
import org.shearstack.check.Severity;
import org.shearstack.physics.dyno.SpeedLog;

/**
 * Reads a tachometer log in CSV-like text: '#' comment lines and blank lines are skipped; the separator
 * is ';', tab, ',' or spaces (first found in that order); a first line with a non-number is the header,
 * naming the time, speed and optional voltage and current columns with their units ("time [s]",
 * "speed (rpm)", "t_ms", "Hz"); decimal commas are accepted when the separator is not a comma. Bad data
 * lines are skipped and reported; a log where more than a tenth of the lines are bad, time runs
 * backwards, or fewer than {@link #MIN_SAMPLES} samples remain is refused with located problems.
 */
public final class BenchLogReader {
    /** Fewest samples a usable log has. */
    public static final int MIN_SAMPLES = 20;
    /** Largest file read, in bytes. */
    public static final long MAX_BYTES = 64L << 20;

    private BenchLogReader() {
    }

    /** Reads a log file. */
    public static BenchLog read(Path file, BenchLogOptions options) throws BenchLogException, IOException {
        String name = file.toString();
        long size = Files.size(file);
        if (size > MAX_BYTES) {
            throw new BenchLogException(new LogProblem(name, 0, 0, "a log of at most " + (MAX_BYTES >> 20) + " MiB",
                    (size >> 20) + " MiB"));
        }
        try (InputStream in = Files.newInputStream(file)) {
            return read(new InputStreamReader(in, StandardCharsets.UTF_8), name, options);
        }
    }

    /** Reads a log from text; {@code name} is used in messages. */
    public static BenchLog read(Reader text, String name, BenchLogOptions options)
            throws BenchLogException, IOException {
        List<String> lines = new ArrayList<>();
        try (BufferedReader r = new BufferedReader(text)) {
            for (String l = r.readLine(); l != null; l = r.readLine()) {
                lines.add(lines.isEmpty() && l.startsWith("\uFEFF") ? l.substring(1) : l);
            }
        }
        return new Parse(name, lines, options).run();
    }

    /** One parse of one file. */
    private static final class Parse {
        private final String file;
        private final List<String> lines;
        private final BenchLogOptions options;
        private final List<Finding> findings = new ArrayList<>();
        private final List<LogProblem> badLines = new ArrayList<>();

        Parse(String file, List<String> lines, BenchLogOptions options) {
            this.file = file;
            this.lines = lines;
            this.options = options;
        }

        BenchLog run() throws BenchLogException {
            List<Integer> content = new ArrayList<>();
            for (int i = 0; i < lines.size(); i++) {
                String t = lines.get(i).trim();
                if (!t.isEmpty() && !t.startsWith("#") && !t.startsWith("//")) {
                    content.add(i);
                }
            }
            if (content.isEmpty()) {
                throw new BenchLogException(new LogProblem(file, 0, 0, "a header line and samples", "no data lines"));
            }
            Separator sep = Separator.detect(lines, content);
            int first = content.get(0);
            String[] firstFields = sep.split(lines.get(first));
            boolean hasHeader = false;
            for (String f : firstFields) {
                if (sep.number(f) == null) {
                    hasHeader = true;
                    break;
                }
            }
            Layout layout = hasHeader ? Layout.fromHeader(file, first + 1, firstFields, options, findings)
                    : Layout.positional(file, first + 1, firstFields.length, options);
            List<double[]> rows = new ArrayList<>();
            List<Integer> rowLines = new ArrayList<>();
            int dataLines = 0;
            for (int k = hasHeader ? 1 : 0; k < content.size(); k++) {
                int lineNo = content.get(k) + 1;
                dataLines++;
                double[] row = parseRow(sep, layout, lines.get(content.get(k)), lineNo);
                if (row != null) {
                    rows.add(row);
                    rowLines.add(lineNo);
                }
            }
            if (badLines.size() > Math.max(3, dataLines / 10)) {
                List<LogProblem> shown = new ArrayList<>(badLines.subList(0, Math.min(20, badLines.size())));
                shown.add(new LogProblem(file, 0, 0, "at most a tenth of the data lines bad",
                        badLines.size() + " of " + dataLines + " bad"));
                throw new BenchLogException(shown);
            }
            for (LogProblem p : badLines) {
                findings.add(finding("LOG-BAD-LINE", "Skipped " + p.message() + ".", p.line()));
            }
            return build(rows, rowLines, layout);
        }

        private double[] parseRow(Separator sep, Layout layout, String line, int lineNo) {
            String[] f = sep.split(line);
            if (f.length != layout.fieldCount()) {
                String hint = sep == Separator.COMMA && f.length > layout.fieldCount()
                        ? " (decimal commas need ';' or tab as separator)" : "";
                badLines.add(new LogProblem(file, lineNo, 0, layout.fieldCount() + " fields" + hint,
                        f.length + " fields"));
                return null;
            }
            double[] row = new double[4];
            int[] cols = layout.indices();
            for (int q = 0; q < 4; q++) {
                if (cols[q] < 0) {
                    row[q] = Double.NaN;
                    continue;
                }
                Double v = sep.number(f[cols[q]]);
                if (v == null || !Double.isFinite(v)) {
                    badLines.add(new LogProblem(file, lineNo, cols[q] + 1, "a number for " + Layout.NAMES[q],
                            LogProblem.quote(f[cols[q]].trim())));
                    return null;
                }
                if (q == 1 && v < 0) {
                    badLines.add(new LogProblem(file, lineNo, cols[q] + 1, "a speed >= 0", LogProblem.quote(f[cols[q]].trim())));
                    return null;
                }
                row[q] = v;
            }
            return row;
        }

        private BenchLog build(List<double[]> rows, List<Integer> rowLines, Layout layout) throws BenchLogException {
            List<double[]> kept = new ArrayList<>();
            List<Integer> repeats = new ArrayList<>();
            for (int k = 0; k < rows.size(); k++) {
                double t = rows.get(k)[0];
                if (!kept.isEmpty()) {
                    double prev = kept.get(kept.size() - 1)[0];
                    int prevLine = (int) kept.get(kept.size() - 1)[4];
                    if (t < prev) {
                        throw new BenchLogException(new LogProblem(file, rowLines.get(k), layout.indices()[0] + 1,
                                String.format(Locale.ROOT, "a time after %s %s (line %d); samples must be in time"
                                        + " order (two logs joined together?)", fmt(prev), layout.timeUnit().symbol(),
                                        prevLine), fmt(t) + " " + layout.timeUnit().symbol()));
                    }
                    if (t == prev) {
                        repeats.add(rowLines.get(k));
                        continue;
                    }
                }
                double[] r = rows.get(k);
                kept.add(new double[] {r[0], r[1], r[2], r[3], rowLines.get(k)});
            }
            if (!repeats.isEmpty()) {
                findings.add(finding("LOG-TIME-REPEAT", String.format(Locale.ROOT, "Skipped %d sample(s) that repeat"
                        + " the time of the line before (lines %s); the first sample at each time is kept.",
                        repeats.size(), listLines(repeats)), repeats.get(0)));
            }
            if (kept.size() < MIN_SAMPLES) {
                throw new BenchLogException(new LogProblem(file, 0, 0, "at least " + MIN_SAMPLES + " samples",
                        kept.size() + (badLines.isEmpty() && repeats.isEmpty() ? "" : " after skipping bad lines")));
            }
            int n = kept.size();
            double[] t = new double[n];
            double[] w = new double[n];
            double[] v = layout.indices()[2] >= 0 ? new double[n] : null;
            double[] a = layout.indices()[3] >= 0 ? new double[n] : null;
            for (int k = 0; k < n; k++) {
                double[] r = kept.get(k);
                t[k] = layout.timeUnit().toSeconds(r[0]);
                w[k] = layout.speedUnit().toRadPerS(r[1]);
                if (v != null) {
                    v[k] = r[2] * layout.voltageScale();
                }
                if (a != null) {
                    a[k] = r[3] * layout.currentScale();
                }
            }
            return new BenchLog(file, SpeedLog.of(t, w, v, a), findings, layout.describe());
        }

        private Finding finding(String code, String message, int line) {
            return new Finding(code, Severity.CAUTION, message, line, Double.NaN, "line", Double.NaN, "",
                    file, code, "", null);
        }
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v).replaceAll("\\.?0+$", "").replaceAll("\\.?0+e", "e");
    }

    private static String listLines(List<Integer> lines) {
        StringBuilder s = new StringBuilder();
        for (int k = 0; k < Math.min(10, lines.size()); k++) {
            s.append(k == 0 ? "" : ", ").append(lines.get(k));
        }
        return lines.size() > 10 ? s + ", …" : s.toString();
    }
}
