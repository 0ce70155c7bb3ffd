package org.shearstack.physics.rotor;

/**
 * The state at which flow enters one gap at the disc rim.
 *
 * @param massFlowPerGapKgPerS       ṁ_g, inward
 * @param speedRadPerS               rotor speed Ω
 * @param inletPressurePa            static pressure at r₂
 * @param stagnationTemperatureK     stagnation temperature of the supply (compressible mode)
 * @param inletRelativeSwirlMPerS    gap-mean relative swirl W₂
 */
public record GapInlet(double massFlowPerGapKgPerS, double speedRadPerS, double inletPressurePa,
        double stagnationTemperatureK, double inletRelativeSwirlMPerS) {
}
