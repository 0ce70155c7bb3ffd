package org.shearstack.io.report;

/**
 * The air supply as the model sees it (ISO 6358 characteristic of the path to the turbine).
 *
 * @param supplyPressurePa        regulator setting, absolute
 * @param ambientPressurePa       ambient, absolute
 * @param conductanceDm3PerSBar   sonic conductance C in dm³/(s·bar)
 * @param criticalPressureRatio   critical pressure ratio b
 */
public record SupplyData(double supplyPressurePa, double ambientPressurePa, double conductanceDm3PerSBar,
        double criticalPressureRatio) {

    public double supplyPressureBarG() {
        return (supplyPressurePa - ambientPressurePa) / 1e5;
    }
}
