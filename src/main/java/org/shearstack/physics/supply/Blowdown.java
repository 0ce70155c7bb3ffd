package org.shearstack.physics.supply;

import org.shearstack.physics.gas.Gas;

/**
 * A tank blow-down test: compressor off, a tank of volume V at p_s discharges through the supply path to the
 * atmosphere and reaches p_e after t seconds (physics.md §2.3; framing after G. Bar-Meir, Fundamentals of
 * Compressible Fluid Mechanics, ch. 11, and the isothermal/isentropic tank-discharge notes of LMNO Engineering).
 * With the path choked the whole time, the sonic conductance C is the only unknown.
 *
 * @param tankVolumeM3       tank (receiver) volume
 * @param startPressurePa    absolute start pressure
 * @param endPressurePa      absolute end pressure
 * @param elapsedS           time between the two readings
 * @param tankTemperatureK   tank temperature at the start
 */
public record Blowdown(double tankVolumeM3, double startPressurePa, double endPressurePa, double elapsedS,
        double tankTemperatureK) {

    /** Polytropic index of the middle reading between isothermal and adiabatic. */
    public static final double MIDDLE_INDEX = 1.2;

    public Blowdown {
        positive(tankVolumeM3, "tank volume");
        positive(endPressurePa, "end pressure");
        positive(elapsedS, "elapsed time");
        positive(tankTemperatureK, "tank temperature");
        if (!(startPressurePa > endPressurePa)) {
            throw new IllegalArgumentException("blow-down start pressure must exceed the end pressure, found "
                    + startPressurePa + " Pa <= " + endPressurePa + " Pa");
        }
    }

    /**
     * Sonic conductance that explains the test under a tank process with polytropic index n:
     * isothermal C = V·ln(p_s/p_e)/(ρ₀R√(T T₀)·t); polytropic C = (2/(n−1))·[(p_s/p_e)^((n−1)/(2n)) − 1]·V/(ρ₀R√(T_s T₀)·t).
     */
    public double conductanceM3PerSPa(Gas gas, TankProcess process) {
        double scale = tankVolumeM3 / (ReferenceAtmosphere.DENSITY_KG_PER_M3 * gas.gasConstantJPerKgK()
                * Math.sqrt(tankTemperatureK * ReferenceAtmosphere.TEMPERATURE_K) * elapsedS);
        double ratio = startPressurePa / endPressurePa;
        if (process.isothermal()) {
            return Math.log(ratio) * scale;
        }
        double n = process.index();
        return 2.0 / (n - 1.0) * (Math.pow(ratio, (n - 1.0) / (2.0 * n)) - 1.0) * scale;
    }

    /** The three readings (isothermal, polytropic n = 1.2, adiabatic) and their spread. */
    public BlowdownEstimate estimate(Gas gas) {
        double iso = conductanceM3PerSPa(gas, TankProcess.ISOTHERMAL);
        double mid = conductanceM3PerSPa(gas, TankProcess.polytropic(MIDDLE_INDEX));
        double adi = conductanceM3PerSPa(gas, TankProcess.adiabatic(gas.gamma()));
        return new BlowdownEstimate(iso, mid, adi);
    }

    /** True when the path stays choked to the end of the test: p_ambient/p_e ≤ b. */
    public boolean staysChoked(double ambientPressurePa, double criticalRatio) {
        return ambientPressurePa / endPressurePa <= criticalRatio;
    }

    /** Mass that left the tank, isothermal reading V(p_s − p_e)/(RT). */
    public double massDeliveredKg(Gas gas) {
        return tankVolumeM3 * (startPressurePa - endPressurePa) / (gas.gasConstantJPerKgK() * tankTemperatureK);
    }

    /** Mean mass flow over the test, isothermal reading. */
    public double meanMassFlowKgPerS(Gas gas) {
        return massDeliveredKg(gas) / elapsedS;
    }

    private static void positive(double v, String what) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException("blow-down " + what + " must be positive, found " + v);
        }
    }
}
