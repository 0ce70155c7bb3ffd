package org.shearstack.spec;

import java.util.Locale;

/** Formats canonical values for people, locale-independently, in the unit a maker reads. */
public final class QuantityFormat {

    /** Standard atmosphere (ISO 2533), used only to show a gauge reading beside absolute pressures. */
    private static final double STANDARD_ATMOSPHERE_PA = 101_325.0;

    private QuantityFormat() {
    }

    /** Four significant digits, trailing zeros removed: 6.000 → "6", 0.7500 → "0.75". */
    public static String number(double v) {
        if (v == 0) {
            return "0";
        }
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return String.valueOf(v);
        }
        double a = Math.abs(v);
        String s;
        if (a >= 1e6 || a < 1e-4) {
            s = String.format(Locale.ROOT, "%.4g", v);
        } else {
            int digitsBefore = (int) Math.floor(Math.log10(a)) + 1;
            int decimals = Math.max(0, 4 - digitsBefore);
            s = String.format(Locale.ROOT, "%." + decimals + "f", v);
            if (s.contains(".")) {
                s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
            }
        }
        return s;
    }

    /** The value in a readable unit, e.g. 701325 Pa → "7.013 bar(a)", 1570.8 rad/s → "15000 rpm". */
    public static String format(double canonical, Dimension d) {
        return switch (d) {
            case PRESSURE -> number(canonical / 1e5) + " bar(a)";
            case STRESS -> number(canonical / 1e6) + " MPa";
            case TEMPERATURE -> number(canonical) + " K (" + number(canonical - 273.15) + " degC)";
            case ANGULAR_SPEED -> number(canonical * 60 / (2 * Math.PI)) + " rpm";
            case VOLUME -> number(canonical * 1e3) + " L";
            case VOLUME_FLOW -> Math.abs(canonical) < 1e-6 ? number(canonical * 1e9) + " mm3/s"
                    : number(canonical * 60e3) + " L/min";
            case CONDUCTANCE -> number(canonical * 1e8) + " dm3/(s*bar)";
            case MASS -> number(canonical * 1e3) + " g";
            case MASS_FLOW -> number(canonical * 1e3) + " g/s";
            case DIMENSIONLESS, COUNT, TEXT -> number(canonical);
            default -> number(canonical) + " " + d.canonicalUnit();
        };
    }

    /** A pressure as gauge relative to the standard atmosphere, for reports ("6 bar(g)"). */
    public static String gauge(double absolutePa) {
        return number((absolutePa - STANDARD_ATMOSPHERE_PA) / 1e5) + " bar(g)";
    }
}
