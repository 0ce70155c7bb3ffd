package org.shearstack.geom;

import java.util.Arrays;

/**
 * One boundary ring of a {@link Region}, for drawings and checks: open (the first point is not repeated),
 * outer rings counter-clockwise, holes clockwise, coordinates in mm on the grid.
 */
public final class Ring {

    private final double[] xy;
    private final boolean hole;

    Ring(double[] xy, boolean hole) {
        this.xy = xy;
        this.hole = hole;
    }

    /** Number of distinct vertices. */
    public int size() {
        return xy.length / 2;
    }

    public double xMm(int i) {
        return xy[2 * i];
    }

    public double yMm(int i) {
        return xy[2 * i + 1];
    }

    /** A copy of the coordinates x0, y0, x1, y1, ... in mm. */
    public double[] xyMm() {
        return xy.clone();
    }

    /** True for a hole (clockwise), false for an outer boundary (counter-clockwise). */
    public boolean isHole() {
        return hole;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Ring r && r.hole == hole && Arrays.equals(r.xy, xy);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(xy) * 2 + (hole ? 1 : 0);
    }

    @Override
    public String toString() {
        return (hole ? "hole" : "shell") + "[" + size() + " vertices]";
    }
}
