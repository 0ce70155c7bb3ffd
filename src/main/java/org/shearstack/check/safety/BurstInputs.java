package org.shearstack.check.safety;

import java.util.List;
import org.shearstack.physics.stress.SafetyFactor;

/**
 * What the burst-at-runaway check needs.
 *
 * @param parts                 spinning parts (at least one)
 * @param densityKgPerM3        filament density
 * @param poisson               filament Poisson ratio
 * @param tensileXyPa           filament tensile strength printed flat (lower bound of the profile)
 * @param factor                required safety factor on stress
 * @param supplyPressurePa      supply pressure, absolute
 * @param ambientPressurePa     ambient (exhaust) pressure, absolute
 * @param operatingSpeedRadPerS design operating speed (NaN when unknown)
 * @param runaway               the runaway model
 */
public record BurstInputs(List<SpinningPart> parts, double densityKgPerM3, double poisson, double tensileXyPa,
        SafetyFactor factor, double supplyPressurePa, double ambientPressurePa, double operatingSpeedRadPerS,
        RunawayModel runaway) {

    public BurstInputs {
        parts = List.copyOf(parts);
        if (parts.isEmpty()) {
            throw new IllegalArgumentException("the burst check needs at least one spinning part");
        }
        if (!(supplyPressurePa > ambientPressurePa && ambientPressurePa > 0)) {
            throw new IllegalArgumentException("supply pressure must exceed ambient, found " + supplyPressurePa
                    + " Pa and " + ambientPressurePa + " Pa");
        }
    }
}
