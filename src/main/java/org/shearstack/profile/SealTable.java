package org.shearstack.profile;

import java.util.List;
import java.util.Optional;

/** O-ring face glands with the squeeze and fill limits they are judged by (fractions). */
public record SealTable(String name, String source, String standard, List<Gland> glands, double squeezeMin,
                        double squeezeMax, double fillMax) {

    public SealTable {
        glands = List.copyOf(glands);
    }

    /** The gland for a cross-section, matched within {@code toleranceMm}. */
    public Optional<Gland> find(double crossSectionMm, double toleranceMm) {
        return glands.stream().filter(g -> Math.abs(g.crossSectionMm() - crossSectionMm) <= toleranceMm).findFirst();
    }
}
