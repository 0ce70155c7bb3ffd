package org.shearstack.physics.rotor;

import org.shearstack.physics.gas.Gas;

/**
 * The fluid model inside the gaps: compressible perfect gas with Sutherland viscosity and constant rothalpy
 * (adiabatic walls), or constant density and viscosity (for the closed-form checks).
 *
 * @param gas             the gas (its c_p and R are used in compressible mode)
 * @param compressible    compressible march when true
 * @param densityKgPerM3  fixed density in incompressible mode
 * @param viscosityPaS    fixed viscosity in incompressible mode
 */
public record GapFluid(Gas gas, boolean compressible, double densityKgPerM3, double viscosityPaS) {

    public static GapFluid compressible(Gas gas) {
        return new GapFluid(gas, true, Double.NaN, Double.NaN);
    }

    public static GapFluid incompressible(Gas gas, double densityKgPerM3, double viscosityPaS) {
        return new GapFluid(gas, false, densityKgPerM3, viscosityPaS);
    }
}
