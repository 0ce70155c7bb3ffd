package org.shearstack.io.family;

import java.util.ArrayList;
import java.util.List;

/**
 * family.csv: one header line and one line per variant, RFC 4180 (comma separated, CRLF line ends, fields with a
 * comma, quote or line break quoted, quotes doubled). Numbers are written exactly as report.json holds them (Java's
 * shortest round-trip form, always with '.'), empty when not computed.
 */
public final class FamilyCsv {

    public static final String FILE = "family.csv";
    private static final String EOL = "\r\n";

    private FamilyCsv() {
    }

    /** The header cells. */
    public static List<String> header(FamilyTable t) {
        List<String> h = new ArrayList<>(List.of("index", "variant"));
        for (VariedKey k : t.keys()) {
            h.add(k.key());
        }
        h.add("status");
        h.add("first failure");
        for (FamilyColumns.Dimension d : FamilyColumns.DIMENSIONS) {
            h.add(d.key() + (d.unit().isEmpty() ? "" : " (" + d.unit() + ")"));
        }
        for (FamilyColumns.Figure f : FamilyColumns.FIGURES) {
            h.add(f.header() + " (" + f.unit() + ")");
        }
        return h;
    }

    /** The cells of one row. */
    public static List<String> cells(FamilyRow r) {
        List<String> c = new ArrayList<>();
        c.add(Integer.toString(r.index() + 1));
        c.add(r.name());
        for (VariedValue v : r.values()) {
            c.add(v.written());
        }
        c.add(r.status().word());
        c.add(r.firstFailure());
        double[] dims = r.dimensions();
        for (int i = 0; i < dims.length; i++) {
            c.add(FamilyColumns.DIMENSIONS.get(i).text() ? r.dimensionTexts().get(i) : number(dims[i]));
        }
        for (double f : r.figures()) {
            c.add(number(f));
        }
        return c;
    }

    /** The whole file. */
    public static String text(FamilyTable t) {
        StringBuilder b = new StringBuilder();
        line(b, header(t));
        for (FamilyRow r : t.rows()) {
            line(b, cells(r));
        }
        return b.toString();
    }

    /** A finite number in its shortest round-trip form ("60.0", "1.2E-4"); "" for NaN and infinities. */
    public static String number(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "";
    }

    private static void line(StringBuilder b, List<String> cells) {
        for (int i = 0; i < cells.size(); i++) {
            if (i > 0) {
                b.append(',');
            }
            b.append(quote(cells.get(i)));
        }
        b.append(EOL);
    }

    static String quote(String s) {
        if (s.indexOf(',') < 0 && s.indexOf('"') < 0 && s.indexOf('\n') < 0 && s.indexOf('\r') < 0) {
            return s;
        }
        return '"' + s.replace("\"", "\"\"") + '"';
    }
}
