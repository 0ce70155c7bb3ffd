package org.shearstack.physics.fit;

import java.util.Locale;

/**
 * A toleranced size: nominal (mm) with upper and lower deviations (µm). Holes and shafts after ISO 286, and
 * bearing rings, are all zones.
 *
 * @param nominalMm     nominal size
 * @param name          class name ("H7", "k5") or a description ("608 outer ring, normal class")
 * @param hole          true for an internal feature
 * @param upperMicrometres upper deviation
 * @param lowerMicrometres lower deviation
 */
public record ToleranceZone(double nominalMm, String name, boolean hole, double upperMicrometres,
        double lowerMicrometres) {

    public ToleranceZone {
        if (upperMicrometres < lowerMicrometres) {
            throw new IllegalArgumentException("upper deviation " + upperMicrometres + " below lower "
                    + lowerMicrometres + " µm");
        }
    }

    public double maxMm() {
        return nominalMm + upperMicrometres / 1000;
    }

    public double minMm() {
        return nominalMm + lowerMicrometres / 1000;
    }

    public SizeRange range() {
        return new SizeRange(minMm(), maxMm());
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s %s (%+.1f/%+.1f µm)", fmt(nominalMm), name, upperMicrometres,
                lowerMicrometres);
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }
}
