package org.shearstack.physics.rotor;

import org.shearstack.physics.gas.Expansion;

/**
 * The coupled solution (supply → nozzle → gaps → exhaust) at one rotor speed.
 *
 * @param speedRadPerS            rotor speed
 * @param flowing                 false when the centrifugal head of the pack blocks all inflow at this speed
 * @param shaftTorqueNm           net torque on the shaft: gap torque minus parasitic drag
 * @param rotorTorqueNm           torque of the gaps alone (Euler turbine equation)
 * @param parasitic               the drag terms outside the gaps
 * @param shaftPowerW             shaft torque × speed
 * @param massFlowKgPerS          mass flow from the supply
 * @param plenumPressurePa        pressure ahead of the nozzle
 * @param rimPressurePa           static pressure at the disc rims (nozzle back pressure)
 * @param exhaustPressurePa       static pressure at the exhaust radius
 * @param jetVelocityMPerS        jet speed at the rim pressure
 * @param jetExpansion            nozzle expansion state
 * @param jetStaticTemperatureK   jet static temperature (icing caution below 273 K)
 * @param isentropicPowerW        power available from expanding the mass flow isentropically supply → ambient
 * @param efficiency              shaft power over isentropic power
 * @param exitSwirlLossW          kinetic energy of the swirl leaving the gaps, ṁ·½(Ωr₁ + κW₁)²
 * @param exhaustKineticLossW     kinetic energy of the exhaust port flow
 * @param exhaustMach             Mach number in the exhaust ports
 * @param validity                model validity at this point
 */
public record OperatingPoint(double speedRadPerS, boolean flowing, double shaftTorqueNm, double rotorTorqueNm,
        ParasiticTorques parasitic, double shaftPowerW, double massFlowKgPerS, double plenumPressurePa,
        double rimPressurePa, double exhaustPressurePa, double jetVelocityMPerS, Expansion jetExpansion,
        double jetStaticTemperatureK, double isentropicPowerW, double efficiency, double exitSwirlLossW,
        double exhaustKineticLossW, double exhaustMach, Validity validity) {

    /** Speed in revolutions per minute. */
    public double speedRpm() {
        return speedRadPerS * 30.0 / Math.PI;
    }
}
