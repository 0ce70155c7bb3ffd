package org.shearstack.profile;

import java.util.List;
import java.util.Optional;

/**
 * Bearings with their standard, ring tolerances and a generic speed-factor limit.
 *
 * @param speedFactorLimitRpmMm n·dm limit (rpm × mean diameter in mm)
 */
public record BearingTable(String name, String source, String standard, List<Bearing> bearings,
                           List<BearingTolerance> tolerances, double speedFactorLimitRpmMm,
                           String speedFactorSource) {

    public BearingTable {
        bearings = List.copyOf(bearings);
        tolerances = List.copyOf(tolerances);
    }

    public Optional<Bearing> find(String designation) {
        return bearings.stream().filter(b -> b.designation().equals(designation)).findFirst();
    }

    /** The tolerance row for a bore diameter. */
    public Optional<BearingTolerance> forBore(double boreMm) {
        return tolerances.stream().filter(t -> t.covers(boreMm)).findFirst();
    }

    /** The tolerance row for an outside diameter (the same ranges, outer columns). */
    public Optional<BearingTolerance> forOuter(double outerMm) {
        return tolerances.stream().filter(t -> t.covers(outerMm)).findFirst();
    }
}
