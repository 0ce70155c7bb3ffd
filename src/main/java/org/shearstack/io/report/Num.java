package org.shearstack.io.report;

import java.util.Locale;

/** Number formatting for the reports: fixed rules, Locale.ROOT, never the machine's locale. */
public final class Num {

    private Num() {
    }

    /** Fixed decimals ("4.00"); "-" for NaN, "unlimited" for infinity. */
    public static String fixed(double v, int decimals) {
        if (Double.isNaN(v)) {
            return "-";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "unlimited" : "-unlimited";
        }
        String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
        return s.equals("-0") || s.matches("-0\\.0*") ? s.substring(1) : s;
    }

    /** Significant digits without exponent ("0.0123", "1230"). */
    public static String sig(double v, int digits) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return fixed(v, 0);
        }
        if (v == 0) {
            return "0";
        }
        int decimals = Math.max(0, digits - 1 - (int) Math.floor(Math.log10(Math.abs(v))));
        return fixed(v, decimals);
    }

    /** Whole rpm from rad/s. */
    public static double rpm(double radPerS) {
        return radPerS * 30.0 / Math.PI;
    }
}
