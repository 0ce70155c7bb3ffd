package org.shearstack.physics.supply;

import org.shearstack.physics.gas.Gas;
import org.shearstack.physics.gas.Isentropic;

/**
 * The ISO 6358 flow-rate characteristic of a pneumatic component or path: sonic conductance C, critical
 * pressure ratio b and subsonic index m (m = 0.5 is the classic elliptic branch of Sanville 1971;
 * ISO 6358-1:2013 generalises the exponent). Flows in the ISO 8778 reference atmosphere (physics.md §2.1).
 *
 * @param conductanceM3PerSPa sonic conductance C, m³/(s·Pa)
 * @param criticalRatio       critical pressure ratio b, in [0, 1)
 * @param subsonicIndex       subsonic index m &gt; 0
 */
public record FlowCharacteristic(double conductanceM3PerSPa, double criticalRatio, double subsonicIndex) {

    /** b of an ideal converging nozzle for air, the critical pressure ratio of γ = 1.4. */
    public static final double IDEAL_NOZZLE_CRITICAL_RATIO = Isentropic.criticalPressureRatio(Gas.AIR.gamma());

    public FlowCharacteristic {
        if (!(conductanceM3PerSPa > 0) || Double.isInfinite(conductanceM3PerSPa)) {
            throw new IllegalArgumentException("sonic conductance C must be positive, found " + conductanceM3PerSPa);
        }
        if (!(criticalRatio >= 0 && criticalRatio < 1)) {
            throw new IllegalArgumentException("critical pressure ratio b must be in [0, 1), found " + criticalRatio);
        }
        if (!(subsonicIndex > 0)) {
            throw new IllegalArgumentException("subsonic index m must be positive, found " + subsonicIndex);
        }
    }

    /** C in dm³/(s·bar) with the classic elliptic branch (m = 0.5). */
    public static FlowCharacteristic ofDm3PerSBar(double conductanceDm3PerSBar, double criticalRatio) {
        return new FlowCharacteristic(conductanceDm3PerSBar * ReferenceAtmosphere.DM3_PER_S_BAR, criticalRatio, 0.5);
    }

    /**
     * The characteristic of a round orifice or nozzle of area A with discharge coefficient C_d treated as an
     * ideal converging nozzle: C = C_d·A·K/(√T_ref·ρ_ref), b = p* / p₀ (physics.md §2.1, PN-03).
     */
    public static FlowCharacteristic ofOrifice(Gas gas, double areaM2, double dischargeCoefficient) {
        double c = dischargeCoefficient * areaM2 * Isentropic.chokedFluxConstant(gas)
                / (Math.sqrt(ReferenceAtmosphere.TEMPERATURE_K) * ReferenceAtmosphere.DENSITY_KG_PER_M3);
        return new FlowCharacteristic(c, Isentropic.criticalPressureRatio(gas.gamma()), 0.5);
    }

    /**
     * From a measured free-air (ANR) flow Q through the path from {@code upstreamPa} to {@code downstreamPa}
     * with an assumed b and m: C = Q/(p₁·φ(p₂/p₁)) where φ is the subsonic factor (1 when choked).
     */
    public static FlowCharacteristic fromFreeAirFlow(double freeAirFlowM3PerS, double upstreamPa, double downstreamPa,
            double criticalRatio, double subsonicIndex) {
        if (!(downstreamPa < upstreamPa)) {
            throw new IllegalArgumentException("free-air flow needs downstream pressure below upstream, found "
                    + downstreamPa + " Pa >= " + upstreamPa + " Pa");
        }
        double factor = subsonicFactor(downstreamPa / upstreamPa, criticalRatio, subsonicIndex);
        return new FlowCharacteristic(freeAirFlowM3PerS / (upstreamPa * factor), criticalRatio, subsonicIndex);
    }

    /** C in dm³/(s·bar). */
    public double conductanceDm3PerSBar() {
        return conductanceM3PerSPa / ReferenceAtmosphere.DM3_PER_S_BAR;
    }

    /**
     * Effective orifice area S of an ideal (C_d = 1) nozzle with the same choked flow, m²
     * (S ≈ 5·C in mm² per dm³/(s·bar), physics.md §2.1).
     */
    public double effectiveAreaM2(Gas gas) {
        return conductanceM3PerSPa * Math.sqrt(ReferenceAtmosphere.TEMPERATURE_K)
                * ReferenceAtmosphere.DENSITY_KG_PER_M3 / Isentropic.chokedFluxConstant(gas);
    }

    /**
     * Mass flow q_m = C·p₁·ρ₀·√(T₀/T₁)·φ, φ = 1 when p₂/p₁ ≤ b, else [1 − ((p₂/p₁ − b)/(1 − b))²]^m.
     */
    public double massFlowKgPerS(double upstreamPa, double downstreamPa, double upstreamTemperatureK) {
        if (!(upstreamPa > 0)) {
            throw new IllegalArgumentException("upstream pressure must be positive, found " + upstreamPa);
        }
        if (downstreamPa >= upstreamPa) {
            return 0.0;
        }
        return chokedMassFlowKgPerS(upstreamPa, upstreamTemperatureK)
                * subsonicFactor(downstreamPa / upstreamPa, criticalRatio, subsonicIndex);
    }

    /** Choked mass flow C·p₁·ρ₀·√(T₀/T₁). */
    public double chokedMassFlowKgPerS(double upstreamPa, double upstreamTemperatureK) {
        return conductanceM3PerSPa * upstreamPa * ReferenceAtmosphere.DENSITY_KG_PER_M3
                * Math.sqrt(ReferenceAtmosphere.TEMPERATURE_K / upstreamTemperatureK);
    }

    /** The subsonic reduction factor of ISO 6358 for a pressure ratio p₂/p₁. */
    public static double subsonicFactor(double pressureRatio, double criticalRatio, double subsonicIndex) {
        if (pressureRatio <= criticalRatio) {
            return 1.0;
        }
        if (pressureRatio >= 1.0) {
            return 0.0;
        }
        double x = (pressureRatio - criticalRatio) / (1.0 - criticalRatio);
        return Math.pow(1.0 - x * x, subsonicIndex);
    }
}
