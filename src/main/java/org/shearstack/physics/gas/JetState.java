package org.shearstack.physics.gas;

/**
 * What a nozzle delivers at a given stagnation state and back pressure.
 *
 * @param massFlowKgPerS            actual mass flow (discharge coefficient applied)
 * @param choked                    true when the throat is sonic
 * @param exitMach                  Mach number in the exit plane
 * @param exitPressurePa            static pressure in the exit plane
 * @param exitVelocityMPerS         ideal velocity in the exit plane
 * @param jetVelocityMPerS          velocity of the jet once at the back pressure (momentum-equivalent when the
 *                                  exit pressure differs from it), times the velocity coefficient
 * @param jetStaticTemperatureK     static temperature of the jet at that velocity, T₀ − V²/(2c_p)
 * @param expansion                 expansion state (flag for over- and under-expansion)
 */
public record JetState(double massFlowKgPerS, boolean choked, double exitMach, double exitPressurePa,
        double exitVelocityMPerS, double jetVelocityMPerS, double jetStaticTemperatureK, Expansion expansion) {
}
