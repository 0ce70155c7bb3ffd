package org.shearstack.spec;

/**
 * One unit symbol of one dimension: canonical = written × factor + offset (+ ambient for gauge pressures).
 *
 * @param symbol    as written in a spec ("bar(g)", "L/min")
 * @param dimension what it measures
 * @param factor    multiplier to the dimension's canonical unit
 * @param offset    added after scaling (temperatures in degC and degF)
 * @param reference for pressures: gauge, absolute or unstated; NONE for every other dimension
 */
public record Unit(String symbol, Dimension dimension, double factor, double offset, PressureReference reference) {

    /** How a pressure unit relates to vacuum. */
    public enum PressureReference {
        /** Not a pressure unit. */
        NONE,
        /** Explicitly gauge: above ambient. */
        GAUGE,
        /** Explicitly absolute: above vacuum. */
        ABSOLUTE,
        /** A bare "bar", "psi", "kPa": gauge unless the key is absolute by nature (ambient). */
        UNSTATED
    }

    /** Converts a written number to the canonical unit, with the ambient pressure for gauge readings. */
    public double toCanonical(double written, boolean gauge, double ambientPa) {
        double value = written * factor + offset;
        return gauge ? value + ambientPa : value;
    }

    /** Converts a canonical value to this unit (gauge pressures relative to ambientPa). */
    public double fromCanonical(double canonical, boolean gauge, double ambientPa) {
        double value = gauge ? canonical - ambientPa : canonical;
        return (value - offset) / factor;
    }
}
