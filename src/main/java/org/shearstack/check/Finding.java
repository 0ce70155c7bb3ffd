package org.shearstack.check;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * One result of one check: a value, never an exception. {@code code} is stable and greppable
 * (for example {@code BURST-RUNAWAY}); it never changes meaning once released.
 *
 * @param code     stable code of the check
 * @param severity ok, caution or fail
 * @param message  one sentence a maker understands
 * @param measured the measured or predicted value (NaN when the check has none)
 * @param limit    the limit it is compared with (NaN when none)
 * @param unit     unit of measured and limit, as printed ("MPa", "rpm", "mm"); empty when dimensionless
 * @param margin   limit/measured or the check's own margin definition, stated in the message (NaN when none)
 * @param part     the part concerned ("" for the whole design)
 * @param feature  the feature concerned (for example "bearing seat, free side")
 * @param ruleId   the rule or check that produced it
 * @param remedy   what to change, computed where the tool can ("" when nothing is needed)
 * @param where    location in the part's print frame, or {@link Location#NONE}
 */
public record Finding(
        String code,
        Severity severity,
        String message,
        double measured,
        double limit,
        String unit,
        double margin,
        String part,
        String feature,
        String ruleId,
        String remedy,
        Location where) {

    public Finding {
        Objects.requireNonNull(code, "code");
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(message, "message");
        unit = unit == null ? "" : unit;
        part = part == null ? "" : part;
        feature = feature == null ? "" : feature;
        ruleId = ruleId == null ? code : ruleId;
        remedy = remedy == null ? "" : remedy;
        where = where == null ? Location.NONE : where;
    }

    public OptionalDouble measuredValue() {
        return Double.isNaN(measured) ? OptionalDouble.empty() : OptionalDouble.of(measured);
    }

    /** A point in a part's print frame (mm), with the part name; NONE when the finding has no place. */
    public record Location(double xMm, double yMm, double zMm) {
        public static final Location NONE = new Location(Double.NaN, Double.NaN, Double.NaN);

        public boolean isKnown() {
            return !Double.isNaN(xMm);
        }
    }
}
