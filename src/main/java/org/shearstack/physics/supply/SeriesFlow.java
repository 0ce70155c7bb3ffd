package org.shearstack.physics.supply;

import org.shearstack.physics.gas.JetState;

/**
 * The operating point of the supply path and the nozzle in series.
 *
 * @param plenumPressurePa   pressure between path and nozzle where the two mass flows agree
 * @param massFlowKgPerS     the common mass flow
 * @param jet                the nozzle's jet at that point
 */
public record SeriesFlow(double plenumPressurePa, double massFlowKgPerS, JetState jet) {

    /** Conductance of the path and nozzle together, referred to the supply pressure: ṁ/(p_s·ρ₀·√(T₀/T_s)). */
    public double equivalentConductanceM3PerSPa(SupplyPath supply) {
        return massFlowKgPerS / (supply.supplyPressurePa() * ReferenceAtmosphere.DENSITY_KG_PER_M3
                * Math.sqrt(ReferenceAtmosphere.TEMPERATURE_K / supply.supplyTemperatureK()));
    }
}
