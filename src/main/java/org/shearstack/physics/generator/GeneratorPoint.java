package org.shearstack.physics.generator;

/**
 * The turbine and the generator running together on a resistive load.
 *
 * @param loadResistanceOhm    R_L
 * @param speedRadPerS         coupled speed
 * @param currentA             load current
 * @param terminalVoltageV     voltage across the load
 * @param electricalPowerW     power into the load
 * @param shaftPowerW          turbine shaft power at that speed
 */
public record GeneratorPoint(double loadResistanceOhm, double speedRadPerS, double currentA, double terminalVoltageV,
        double electricalPowerW, double shaftPowerW) {
}
