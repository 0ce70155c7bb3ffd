package org.shearstack.view;

/** A displacement in the assembly frame, mm (used for the exploded view). */
public record OffsetMm(double xMm, double yMm, double zMm) {

    public static final OffsetMm ZERO = new OffsetMm(0, 0, 0);

    public OffsetMm {
        if (!Double.isFinite(xMm) || !Double.isFinite(yMm) || !Double.isFinite(zMm)) {
            throw new IllegalArgumentException("offset: expected finite mm values, found (" + xMm + ", " + yMm + ", " + zMm + ")");
        }
    }

    public OffsetMm scaled(double factor) {
        return new OffsetMm(xMm * factor, yMm * factor, zMm * factor);
    }
}
