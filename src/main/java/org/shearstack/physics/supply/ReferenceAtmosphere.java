package org.shearstack.physics.supply;

/**
 * The standard reference atmosphere of ISO 8778:2003 in which ISO 6358 conductances and "ANR" free-air volumes
 * are stated: 100 kPa, 293.15 K, 1.185 kg/m³ (physics.md §2.1; the values are corroborated by secondary sources).
 */
public final class ReferenceAtmosphere {

    /** Reference pressure, Pa. */
    public static final double PRESSURE_PA = 100_000.0;
    /** Reference temperature, K. */
    public static final double TEMPERATURE_K = 293.15;
    /** Reference density, kg/m³. */
    public static final double DENSITY_KG_PER_M3 = 1.185;
    /** One dm³/(s·bar) in m³/(s·Pa). */
    public static final double DM3_PER_S_BAR = 1e-8;

    private ReferenceAtmosphere() {
    }

    /** Free-air (ANR) volume flow, m³/s, of a mass flow. */
    public static double freeAirFlowM3PerS(double massFlowKgPerS) {
        return massFlowKgPerS / DENSITY_KG_PER_M3;
    }

    /** Mass flow of a free-air (ANR) volume flow. */
    public static double massFlowKgPerS(double freeAirFlowM3PerS) {
        return freeAirFlowM3PerS * DENSITY_KG_PER_M3;
    }
}
