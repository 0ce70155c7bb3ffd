package org.shearstack.physics.supply;

import org.shearstack.physics.gas.Gas;

/** How long a tank alone (compressor off or too small) keeps a turbine running (physics.md §2.2). */
public final class TankRunTime {

    private TankRunTime() {
    }

    /**
     * Isothermal tank, constant mass flow: t = V(p_start − p_min)/(R T ṁ).
     */
    public static double isothermalConstantFlowS(Gas gas, double tankVolumeM3, double startPressurePa,
            double minimumPressurePa, double temperatureK, double massFlowKgPerS) {
        if (!(massFlowKgPerS > 0)) {
            throw new IllegalArgumentException("mass flow must be positive, found " + massFlowKgPerS);
        }
        if (!(startPressurePa > minimumPressurePa)) {
            return 0.0;
        }
        return tankVolumeM3 * (startPressurePa - minimumPressurePa)
                / (gas.gasConstantJPerKgK() * temperatureK * massFlowKgPerS);
    }

    /**
     * Continuous running is possible when the compressor's free-air delivery covers the consumption:
     * ṁ ≤ ρ₀·Q_FAD (ISO 8778 reference density).
     */
    public static boolean compressorKeepsUp(double massFlowKgPerS, double compressorFreeAirDeliveryM3PerS) {
        return massFlowKgPerS <= ReferenceAtmosphere.massFlowKgPerS(compressorFreeAirDeliveryM3PerS);
    }
}
