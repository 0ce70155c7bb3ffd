package org.shearstack.check.mesh;

import java.util.Arrays;
import java.util.Locale;

/**
 * Where a foreign mesh is cut into slabs: the first layer from the object's lowest point, then every
 * {@code layersPerSlab} layers up to its top. Small objects are cut at every layer; an object that would need more
 * than a slab budget is cut every N layers (N the smallest whole number within the budget), which keeps the checks
 * fast on tall parts at the price of missing features thinner than N layers in Z.
 *
 * @param firstLayerMm   first-layer height
 * @param layerMm        layer height above the first layer
 * @param layersPerSlab  layers per slab above the first layer (1 = every layer)
 * @param boundariesMm   ascending slab boundaries, from the object's bottom to at or above its top
 */
public record SlicePlan(double firstLayerMm, double layerMm, int layersPerSlab, double[] boundariesMm) {

    /** Slabs per object before the plan coarsens to every N layers. */
    public static final int DEFAULT_MAX_SLABS = 300;

    public SlicePlan {
        boundariesMm = boundariesMm.clone();
    }

    @Override
    public double[] boundariesMm() {
        return boundariesMm.clone();
    }

    /**
     * The plan for an object spanning {@code minZMm}..{@code maxZMm}.
     *
     * @param requestedLayersPerSlab layers per slab asked for, or 0 to choose: every layer when that stays within
     *                               {@code maxSlabs}, else the fewest layers per slab that do
     */
    public static SlicePlan of(double minZMm, double maxZMm, double firstLayerMm, double layerMm,
            int requestedLayersPerSlab, int maxSlabs) {
        if (!(maxZMm > minZMm) || !(firstLayerMm > 0) || !(layerMm > 0) || requestedLayersPerSlab < 0 || maxSlabs < 2) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "slice plan: expected a positive height span and layers, found z %s..%s, first %s, layer %s,"
                            + " %d layers per slab, %d slabs",
                    minZMm, maxZMm, firstLayerMm, layerMm, requestedLayersPerSlab, maxSlabs));
        }
        double above = Math.max(0, maxZMm - minZMm - firstLayerMm);
        long layers = (long) Math.ceil(above / layerMm - 1e-9);
        int n = requestedLayersPerSlab > 0 ? requestedLayersPerSlab
                : (int) Math.max(1, (layers + maxSlabs - 2) / (maxSlabs - 1));
        long slabsAbove = (layers + n - 1) / n;
        double[] b = new double[(int) slabsAbove + 2];
        b[0] = minZMm;
        b[1] = minZMm + firstLayerMm;
        for (int i = 2; i < b.length; i++) {
            // each boundary from the bottom, not by accumulation, so heights do not drift
            b[i] = minZMm + firstLayerMm + (long) (i - 1) * n * layerMm;
        }
        return new SlicePlan(firstLayerMm, layerMm, n, b);
    }

    public int slabCount() {
        return boundariesMm.length - 1;
    }

    /** The height of a slab above the first layer. */
    public double slabHeightMm() {
        return layersPerSlab * layerMm;
    }

    /** One sentence saying how the object was sliced. */
    public String describe() {
        String every = layersPerSlab == 1 ? "at every layer" : "every " + layersPerSlab + " layers (to keep the check fast;"
                + " features thinner than " + fmt(slabHeightMm()) + " mm in Z are not seen)";
        return String.format(Locale.ROOT, "sliced %s: first layer %s mm, then %s mm slabs, %d slabs from z %s to %s mm",
                every, fmt(firstLayerMm), fmt(slabHeightMm()), slabCount(), fmt(boundariesMm[0]),
                fmt(boundariesMm[boundariesMm.length - 1]));
    }

    private static String fmt(double v) {
        return org.shearstack.check.Findings.num(v, 5);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SlicePlan p && p.firstLayerMm == firstLayerMm && p.layerMm == layerMm
                && p.layersPerSlab == layersPerSlab && Arrays.equals(p.boundariesMm, boundariesMm);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(boundariesMm) * 31 + layersPerSlab;
    }

    @Override
    public String toString() {
        return describe();
    }
}
