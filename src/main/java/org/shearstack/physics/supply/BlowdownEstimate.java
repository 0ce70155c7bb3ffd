package org.shearstack.physics.supply;

/**
 * The conductances that explain one blow-down test under three tank processes. The isothermal reading is the
 * highest, the adiabatic the lowest; which one is right depends on how much heat the tank walls give the gas.
 *
 * @param isothermalM3PerSPa  C if the tank gas stays at its start temperature
 * @param middleM3PerSPa      C for a polytropic index of 1.2, the chosen estimate
 * @param adiabaticM3PerSPa   C if the tank gas expands isentropically
 */
public record BlowdownEstimate(double isothermalM3PerSPa, double middleM3PerSPa, double adiabaticM3PerSPa) {

    /** Half the distance between the isothermal and adiabatic readings, relative to the middle reading. */
    public double spreadFraction() {
        return 0.5 * (isothermalM3PerSPa - adiabaticM3PerSPa) / middleM3PerSPa;
    }

    /** The middle reading as a characteristic with the given b and m. */
    public FlowCharacteristic characteristic(double criticalRatio, double subsonicIndex) {
        return new FlowCharacteristic(middleM3PerSPa, criticalRatio, subsonicIndex);
    }
}
