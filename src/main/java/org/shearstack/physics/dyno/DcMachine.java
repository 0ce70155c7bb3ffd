package org.shearstack.physics.dyno;

/**
 * A small permanent-magnet DC machine used as generator and load (physics.md §8.3): E = k_e ω,
 * T = k_t I with k_t = k_e in SI units, V = E − I R_a.
 */
public final class DcMachine {
    private DcMachine() {
    }

    /** Back-EMF constant k_e (V·s/rad) from an open-circuit voltage at a speed. */
    public static double backEmfConstantVsPerRad(double openCircuitVoltageV, double speedRadPerS) {
        if (!(speedRadPerS > 0)) {
            throw new IllegalArgumentException("speed must be positive, found " + speedRadPerS);
        }
        return openCircuitVoltageV / speedRadPerS;
    }

    /** Largest power into a load (W), reached when the load resistance equals R_a: E² / (4 R_a). */
    public static double maxLoadPowerW(double emfV, double armatureResistanceOhm) {
        return emfV * emfV / (4 * armatureResistanceOhm);
    }

    /** Armature resistance (Ω) from open-circuit E and terminal V_L across load R_L: R_L (E/V_L − 1). */
    public static double armatureResistanceOhm(double emfV, double loadedVoltageV, double loadResistanceOhm) {
        return loadResistanceOhm * (emfV / loadedVoltageV - 1);
    }

    /** Electromagnetic torque (N·m) for a current: k_t I with k_t = k_e. */
    public static double torqueNm(double backEmfConstantVsPerRad, double currentA) {
        return backEmfConstantVsPerRad * currentA;
    }
}
