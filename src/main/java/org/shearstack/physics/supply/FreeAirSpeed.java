package org.shearstack.physics.supply;

import org.shearstack.physics.gas.Gas;
import org.shearstack.physics.gas.Isentropic;

/**
 * Why "free-air flow divided by the hose bore" is not the speed of the jet. The free-air (ANR) volume is the
 * volume the air would take at the reference atmosphere; in the hose it is compressed by p/p_ref and moves that
 * much slower, while in a nozzle it expands and reaches the sonic speed a* at the throat and up to √(2c_pT₀)
 * beyond.
 *
 * @param meanMassFlowKgPerS      mean mass flow of the test
 * @param meanFreeAirFlowM3PerS   the same as a free-air (ANR) volume flow
 * @param boreAreaM2              hose bore area
 * @param freeAirSpeedMPerS       free-air flow / bore area (a bookkeeping number, not a velocity of any air)
 * @param meanHoseSpeedMPerS      actual mean air speed in the hose at the mean line pressure
 * @param sonicJetSpeedMPerS      jet speed at a sonic throat, a*
 * @param expandedJetSpeedMPerS   jet speed after ideal expansion from the mean line pressure to ambient
 */
public record FreeAirSpeed(double meanMassFlowKgPerS, double meanFreeAirFlowM3PerS, double boreAreaM2,
        double freeAirSpeedMPerS, double meanHoseSpeedMPerS, double sonicJetSpeedMPerS,
        double expandedJetSpeedMPerS) {

    /** Figures for a blow-down test through a hose of the given bore. */
    public static FreeAirSpeed of(Gas gas, Blowdown test, double boreDiameterM, double ambientPressurePa) {
        double area = Math.PI * boreDiameterM * boreDiameterM / 4.0;
        double massFlow = test.meanMassFlowKgPerS(gas);
        double freeAir = ReferenceAtmosphere.freeAirFlowM3PerS(massFlow);
        double meanPressure = 0.5 * (test.startPressurePa() + test.endPressurePa());
        double rhoLine = gas.densityKgPerM3(meanPressure, test.tankTemperatureK());
        double t0 = test.tankTemperatureK();
        return new FreeAirSpeed(massFlow, freeAir, area, freeAir / area, massFlow / (rhoLine * area),
                Isentropic.criticalVelocity(gas, t0),
                Isentropic.expansionVelocity(gas, t0, ambientPressurePa / meanPressure));
    }
}
