package org.shearstack.physics.fit;

/** A closed range of sizes in mm, min ≤ max. */
public record SizeRange(double minMm, double maxMm) {

    public SizeRange {
        if (!(minMm <= maxMm)) {
            throw new IllegalArgumentException("size range min " + minMm + " mm above max " + maxMm + " mm");
        }
    }

    public static SizeRange centred(double meanMm, double halfWidthMm) {
        return new SizeRange(meanMm - halfWidthMm, meanMm + halfWidthMm);
    }

    public double meanMm() {
        return (minMm + maxMm) / 2;
    }
}
