package org.shearstack.io.benchlog;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.shearstack.check.Finding;
import org.shearstack.check.Severity;

/** Which field holds what, in which unit. Index −1 means "not logged". */
record Layout(int fieldCount, int[] indices, LogTimeUnit timeUnit, SpeedUnit speedUnit, double voltageScale,
        double currentScale) {
    static final String[] NAMES = {"time", "speed", "voltage", "current"};

    /** Columns by position: time, speed, then optional voltage and current; units from the options. */
    static Layout positional(String file, int line, int fields, BenchLogOptions o) throws BenchLogException {
        List<LogProblem> problems = new ArrayList<>();
        if (fields < 2 || fields > 4) {
            problems.add(new LogProblem(file, line, 0, "2 to 4 columns (time, speed, optional voltage and current)"
                    + " or a header line naming them", fields + " columns"));
        }
        if (o.timeUnit().isEmpty()) {
            problems.add(new LogProblem(file, line, 1, "a header such as 'time [s]' or the option --time-unit s|ms",
                    "a data line without a header"));
        }
        if (o.speedUnit().isEmpty()) {
            problems.add(new LogProblem(file, line, 2, "a header such as 'speed [rpm]' or the option --speed-unit"
                    + " rpm|Hz|rad/s", "a data line without a header"));
        }
        if (!problems.isEmpty()) {
            throw new BenchLogException(problems);
        }
        int[] idx = {0, 1, fields >= 3 ? 2 : -1, fields >= 4 ? 3 : -1};
        return new Layout(fields, idx, o.timeUnit().get(), o.speedUnit().get(), 1, 1);
    }

    /** Columns named in a header line. */
    static Layout fromHeader(String file, int line, String[] fields, BenchLogOptions o, List<Finding> findings)
            throws BenchLogException {
        List<LogProblem> problems = new ArrayList<>();
        int[] idx = {-1, -1, -1, -1};
        Column[] cols = new Column[4];
        for (int i = 0; i < fields.length; i++) {
            Column c = Column.parse(fields[i]);
            int q = c.quantity().ordinal();
            if (c.quantity() == Column.Quantity.OTHER) {
                findings.add(new Finding("LOG-COLUMN-UNUSED", Severity.OK, String.format(Locale.ROOT,
                        "Column %d %s is not used (known columns: time, speed, voltage, current).", i + 1,
                        LogProblem.quote(fields[i])), Double.NaN, Double.NaN, "", Double.NaN, "", file,
                        "LOG-COLUMN-UNUSED", "", null));
                continue;
            }
            if (idx[q] >= 0) {
                problems.add(new LogProblem(file, line, i + 1, "one " + NAMES[q] + " column",
                        "a second one, " + LogProblem.quote(fields[i]) + " (first in column " + (idx[q] + 1) + ")"));
                continue;
            }
            idx[q] = i;
            cols[q] = c;
        }
        for (int q = 0; q < 2; q++) {
            if (idx[q] < 0) {
                problems.add(new LogProblem(file, line, 0, "a " + NAMES[q] + " column in the header (e.g. "
                        + (q == 0 ? "'time [s]'" : "'speed [rpm]'") + ")", "columns " + String.join(", ", quoteAll(fields))));
            }
        }
        if ((idx[2] >= 0) != (idx[3] >= 0)) {
            findings.add(new Finding("LOG-ELECTRICAL-PARTIAL", Severity.CAUTION, "Only one of voltage and current is"
                    + " logged; electrical power needs both, so the column is not used.", Double.NaN, Double.NaN, "",
                    Double.NaN, "", file, "LOG-ELECTRICAL-PARTIAL", "", null));
            idx[2] = -1;
            idx[3] = -1;
        }
        if (!problems.isEmpty()) {
            throw new BenchLogException(problems);
        }
        LogTimeUnit tu = unit(file, line, idx[0], cols[0], o.timeUnit(), LogTimeUnit::fromSymbol, "s|ms", "time",
                LogTimeUnit::symbol, problems);
        SpeedUnit su = unit(file, line, idx[1], cols[1], o.speedUnit(), SpeedUnit::fromSymbol, "rpm|Hz|rad/s",
                "speed", SpeedUnit::symbol, problems);
        double vs = electrical(file, line, idx[2], cols[2], "V or mV", problems);
        double cs = electrical(file, line, idx[3], cols[3], "A or mA", problems);
        if (!problems.isEmpty()) {
            throw new BenchLogException(problems);
        }
        return new Layout(fields.length, idx, tu, su, vs, cs);
    }

    private static <U> U unit(String file, int line, int index, Column c, Optional<U> option,
            java.util.function.Function<String, Optional<U>> parse, String allowed, String what,
            java.util.function.Function<U, String> symbol, List<LogProblem> problems) {
        if (c.unit().isEmpty()) {
            if (option.isPresent()) {
                return option.get();
            }
            problems.add(new LogProblem(file, line, index + 1, "a unit for the " + what + " column, in the header ('"
                    + c.name() + " [" + allowed.split("\\|")[0] + "]') or as --" + what + "-unit " + allowed,
                    "'" + c.name() + "' without a unit"));
            return null;
        }
        Optional<U> u = parse.apply(c.unit());
        if (u.isEmpty()) {
            problems.add(new LogProblem(file, line, index + 1, "a " + what + " unit " + allowed, "'" + c.unit() + "'"));
            return null;
        }
        if (option.isPresent() && !option.get().equals(u.get())) {
            problems.add(new LogProblem(file, line, index + 1, "the " + what + " unit given as option, "
                    + symbol.apply(option.get()), "'" + c.unit() + "' in the header"));
            return null;
        }
        return u.get();
    }

    private static double electrical(String file, int line, int index, Column c, String allowed,
            List<LogProblem> problems) {
        if (index < 0) {
            return 1;
        }
        Optional<Double> s = c.electricalScale();
        if (s.isEmpty()) {
            problems.add(new LogProblem(file, line, index + 1, "a unit " + allowed, "'" + c.unit() + "'"));
            return 1;
        }
        return s.get();
    }

    private static List<String> quoteAll(String[] fields) {
        List<String> out = new ArrayList<>();
        for (String f : fields) {
            out.add(LogProblem.quote(f));
        }
        return out;
    }

    String describe() {
        StringBuilder s = new StringBuilder();
        s.append(String.format(Locale.ROOT, "time in column %d (%s), speed in column %d (%s)", indices[0] + 1,
                timeUnit.symbol(), indices[1] + 1, speedUnit.symbol()));
        if (indices[2] >= 0) {
            s.append(String.format(Locale.ROOT, ", voltage in column %d, current in column %d", indices[2] + 1,
                    indices[3] + 1));
        }
        return s.toString();
    }
}
