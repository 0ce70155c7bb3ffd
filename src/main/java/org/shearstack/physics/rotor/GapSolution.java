package org.shearstack.physics.rotor;

/**
 * Result of marching one gap from the rim to the exhaust radius.
 *
 * @param ok                          false when the march failed (the gap flow choked or the pressure collapsed)
 * @param outletRelativeSwirlMPerS    W₁
 * @param outletPressurePa            p₁ static at r₁
 * @param outletTemperatureK          T₁ static at r₁
 * @param outletDensityKgPerM3        ρ₁
 * @param maxReynolds                 largest ρ|V_rel|·2b/μ along the march
 * @param maxRelativeMach             largest |V_rel|/a along the march
 */
public record GapSolution(boolean ok, double outletRelativeSwirlMPerS, double outletPressurePa,
        double outletTemperatureK, double outletDensityKgPerM3, double maxReynolds, double maxRelativeMach) {

    static GapSolution failed(double maxReynolds, double maxMach) {
        return new GapSolution(false, Double.NaN, 0.0, Double.NaN, Double.NaN, maxReynolds, maxMach);
    }
}
