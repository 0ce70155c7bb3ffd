package org.shearstack.profile;

import java.util.List;
import java.util.Optional;

/** Metric fasteners and the standard screw lengths (mm). */
public record FastenerTable(String name, String source, String standard, List<Fastener> sizes,
                            List<Double> lengthsMm, String lengthsSource) {

    public FastenerTable {
        sizes = List.copyOf(sizes);
        lengthsMm = List.copyOf(lengthsMm);
    }

    public Optional<Fastener> find(String size) {
        return sizes.stream().filter(f -> f.size().equals(size)).findFirst();
    }

    /** The shortest standard length at least {@code neededMm}, if any. */
    public Optional<Double> lengthAtLeast(double neededMm) {
        return lengthsMm.stream().filter(l -> l >= neededMm).min(Double::compare);
    }
}
