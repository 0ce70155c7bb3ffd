package org.shearstack.physics.supply;

/**
 * The air supply seen from the turbine: a source at a regulated pressure behind the ISO 6358 characteristic of
 * everything up to the turbine's plenum (regulator, hose, couplings).
 *
 * @param supplyPressurePa    absolute pressure upstream of the path (regulator setting)
 * @param supplyTemperatureK  stagnation temperature of the supply air
 * @param ambientPressurePa   absolute pressure the turbine exhausts into
 * @param path                ISO 6358 characteristic of the path
 */
public record SupplyPath(double supplyPressurePa, double supplyTemperatureK, double ambientPressurePa,
        FlowCharacteristic path) {

    public SupplyPath {
        if (!(supplyPressurePa > ambientPressurePa) || !(ambientPressurePa > 0)) {
            throw new IllegalArgumentException("supply pressure must exceed the ambient pressure (both absolute), found "
                    + supplyPressurePa + " Pa and " + ambientPressurePa + " Pa");
        }
        if (!(supplyTemperatureK > 0)) {
            throw new IllegalArgumentException("supply temperature must be positive kelvin, found " + supplyTemperatureK);
        }
        java.util.Objects.requireNonNull(path, "path");
    }

    /** The same path at another supply pressure. */
    public SupplyPath atPressure(double pressurePa) {
        return new SupplyPath(pressurePa, supplyTemperatureK, ambientPressurePa, path);
    }

    /** The most this path can deliver, when choked. */
    public double chokedMassFlowKgPerS() {
        return path.chokedMassFlowKgPerS(supplyPressurePa, supplyTemperatureK);
    }
}
