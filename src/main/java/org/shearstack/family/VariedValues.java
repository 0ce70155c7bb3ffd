package org.shearstack.family;

import java.util.List;
import java.util.regex.Pattern;
import org.shearstack.spec.Dimension;
import org.shearstack.spec.SpecEntry;

/** How a varied value is named (folder-safe, readable) and where it stands on a chart axis. */
final class VariedValues {

    private static final Pattern SPACE_AFTER_NUMBER = Pattern.compile("(?<=[0-9.])\\s+(?=[^0-9\\s])");
    private static final Pattern SPACES = Pattern.compile("\\s+");

    /** A value's number in the unit shown and that unit ("" for words). */
    record Shown(double number, String unit) {
    }

    private VariedValues() {
    }

    /**
     * The written value as a name: no space between a number and its unit ("60 mm" → "60mm"), other spaces as '-'
     * ("metal 8 mm" → "metal-8mm"), and characters a folder name should not hold as '_'.
     */
    static String normalise(String written) {
        String s = SPACE_AFTER_NUMBER.matcher(written.strip()).replaceAll("");
        s = SPACES.matcher(s).replaceAll("-");
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            b.append(c < 128 && (Character.isLetterOrDigit(c) || "._()+-".indexOf(c) >= 0) ? c : '_');
        }
        return b.toString();
    }

    /** The number a parsed value stands at on a chart (NaN for "auto" and words) and the unit of its key. */
    static Shown shown(List<SpecEntry> entries, String key, double ambientPa) {
        for (SpecEntry e : entries) {
            if (!e.path().equals(key)) {
                continue;
            }
            if (e instanceof SpecEntry.Value v) {
                return convert(v.quantity().value(), v.quantity().dimension(), key, ambientPa);
            }
            if (e instanceof SpecEntry.Auto) {
                Dimension d = org.shearstack.spec.SpecSchema.allKeys().get(key);
                return new Shown(Double.NaN, d == null || d == Dimension.TEXT ? "" : convert(0, d, key, ambientPa).unit());
            }
        }
        return new Shown(Double.NaN, "");
    }

    private static Shown convert(double v, Dimension d, String key, double ambientPa) {
        return switch (d) {
            case PRESSURE -> key.equals("supply.ambient") ? new Shown(v / 1e5, "bar(a)")
                    : new Shown((v - ambientPa) / 1e5, "bar(g)");
            case TEMPERATURE -> new Shown(v - 273.15, "degC");
            case ANGULAR_SPEED -> new Shown(v * 30 / Math.PI, "rpm");
            case VOLUME -> new Shown(v * 1e3, "L");
            case VOLUME_FLOW -> new Shown(v * 60e3, "L/min");
            case CONDUCTANCE -> new Shown(v * 1e8, "dm3/(s*bar)");
            case MASS -> new Shown(v * 1e3, "g");
            case COUNT -> new Shown(v, "count");
            case TEXT -> new Shown(Double.NaN, "");
            default -> new Shown(v, d.canonicalUnit());
        };
    }
}
