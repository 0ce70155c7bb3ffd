package org.shearstack.view;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Exploded offsets for parts that came without them (a 3MF file): parts are ordered by the centre of
 * their placed bounds along Z (the axis) and pulled apart so that, at full spread, consecutive parts are
 * separated by their own height plus a gap; the part nearest the middle stays put.
 */
public final class ExplodePlanner {

    private ExplodePlanner() {
    }

    /**
     * Parts with offsets along Z.
     *
     * @param gapMm extra clearance between neighbours at full spread, mm (zero or more)
     */
    public static List<ViewPart> alongAxis(List<ViewPart> parts, double gapMm) {
        if (!(gapMm >= 0)) {
            throw new IllegalArgumentException("explode gap: expected 0 mm or more, found " + gapMm);
        }
        record Item(int index, double minZ, double maxZ) {
            double centre() {
                return (minZ + maxZ) / 2;
            }
        }
        List<Item> items = new ArrayList<>();
        for (int i = 0; i < parts.size(); i++) {
            Box3 b = Box3.of(parts.get(i).placedMesh());
            items.add(b.isEmpty() ? new Item(i, 0, 0) : new Item(i, b.minZ(), b.maxZ()));
        }
        items.sort(Comparator.comparingDouble(Item::centre).thenComparingInt(Item::index));
        double[] offset = new double[parts.size()];
        double shift = 0;
        for (int k = 1; k < items.size(); k++) {
            Item below = items.get(k - 1);
            Item here = items.get(k);
            // move this part up so it starts above the (moved) part below, plus the gap
            double overlap = below.maxZ() - here.minZ();
            shift += Math.max(0, overlap) + gapMm;
            offset[here.index()] = shift;
        }
        if (!items.isEmpty()) {
            double keep = offset[items.get(items.size() / 2).index()];
            for (int i = 0; i < offset.length; i++) {
                offset[i] -= keep;
            }
        }
        List<ViewPart> out = new ArrayList<>();
        for (int i = 0; i < parts.size(); i++) {
            out.add(parts.get(i).withExplodedOffset(new OffsetMm(0, 0, offset[i])));
        }
        return out;
    }
}
