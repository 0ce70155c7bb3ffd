package org.shearstack.check;

import java.util.Locale;

/** Small helpers to build {@link Finding}s and format their numbers the same way everywhere (Locale.ROOT). */
public final class Findings {

    private Findings() {
    }

    /** A finding without a location. */
    public static Finding of(String code, Severity severity, String message, double measured, double limit,
            String unit, double margin, String part, String feature, String remedy) {
        return new Finding(code, severity, message, measured, limit, unit, margin, part, feature, code, remedy,
                Finding.Location.NONE);
    }

    /** A finding at a place in a part's print frame. */
    public static Finding at(String code, Severity severity, String message, double measured, double limit,
            String unit, double margin, String part, String feature, String remedy, double xMm, double yMm,
            double zMm) {
        return new Finding(code, severity, message, measured, limit, unit, margin, part, feature, code, remedy,
                new Finding.Location(xMm, yMm, zMm));
    }

    /** Formats with a number of significant digits, never in the locale's style. */
    public static String num(double v, int significant) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return Double.toString(v);
        }
        if (v == 0) {
            return "0";
        }
        int digits = Math.max(0, significant - 1 - (int) Math.floor(Math.log10(Math.abs(v))));
        String s = String.format(Locale.ROOT, "%." + digits + "f", v);
        if (s.indexOf('.') >= 0) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s;
    }

    /** rad/s to rpm, rounded to a whole number for messages. */
    public static String rpm(double radPerS) {
        return String.format(Locale.ROOT, "%.0f", radPerS * 60 / (2 * Math.PI));
    }

    /** Pa (gauge) to bar, 2 decimals. */
    public static String bar(double pa) {
        return String.format(Locale.ROOT, "%.2f", pa / 1e5);
    }

    /** Pa to MPa, 3 significant digits. */
    public static String mpa(double pa) {
        return num(pa / 1e6, 3);
    }

    /** The severity for a margin (limit/measured style, larger is better) against two thresholds. */
    public static Severity grade(double margin, double failBelow, double cautionBelow) {
        if (margin < failBelow) {
            return Severity.FAIL;
        }
        return margin < cautionBelow ? Severity.CAUTION : Severity.OK;
    }
}
