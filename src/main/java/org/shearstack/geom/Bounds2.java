package org.shearstack.geom;

/** An axis-aligned 2D box in mm. */
public record Bounds2(double minXMm, double minYMm, double maxXMm, double maxYMm) {

    public double widthMm() {
        return maxXMm - minXMm;
    }

    public double heightMm() {
        return maxYMm - minYMm;
    }
}
