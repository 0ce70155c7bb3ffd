package org.shearstack.physics.generator;

/**
 * A small permanent-magnet DC machine used as a generator: E = k_e ω, terminal voltage V = E − I R_a, shaft torque
 * k_t I + friction with k_t = k_e in SI units (physics.md §8.3). k_e comes from a measured open-circuit voltage at a
 * known speed; friction is measured separately (coast-down).
 *
 * @param keVoltSecondPerRad      back-EMF constant k_e (= k_t, N·m/A)
 * @param windingResistanceOhm    armature (winding) resistance R_a
 * @param frictionTorqueNm        the machine's own no-load friction torque
 */
public record DcGenerator(double keVoltSecondPerRad, double windingResistanceOhm, double frictionTorqueNm) {

    public DcGenerator {
        if (!(keVoltSecondPerRad > 0) || !(windingResistanceOhm > 0) || !(frictionTorqueNm >= 0)) {
            throw new IllegalArgumentException("generator needs k_e > 0, R_a > 0 and friction >= 0, found "
                    + keVoltSecondPerRad + ", " + windingResistanceOhm + ", " + frictionTorqueNm);
        }
    }

    /** From an open-circuit reading E at speed ω: k_e = E/ω. */
    public static DcGenerator fromOpenCircuit(double openCircuitVoltageV, double speedRadPerS,
            double windingResistanceOhm, double frictionTorqueNm) {
        if (!(openCircuitVoltageV > 0) || !(speedRadPerS > 0)) {
            throw new IllegalArgumentException("open-circuit voltage and speed must be positive, found "
                    + openCircuitVoltageV + " V at " + speedRadPerS + " rad/s");
        }
        return new DcGenerator(openCircuitVoltageV / speedRadPerS, windingResistanceOhm, frictionTorqueNm);
    }

    /**
     * Winding resistance from an open-circuit and a loaded reading at the same speed: R_a = R_L (E/V_L − 1).
     */
    public static double windingResistanceFromLoadTest(double openCircuitVoltageV, double loadedVoltageV,
            double loadResistanceOhm) {
        if (!(loadedVoltageV > 0) || !(loadedVoltageV < openCircuitVoltageV) || !(loadResistanceOhm > 0)) {
            throw new IllegalArgumentException("load test needs 0 < V_L < E and R_L > 0, found E " + openCircuitVoltageV
                    + " V, V_L " + loadedVoltageV + " V, R_L " + loadResistanceOhm + " ohm");
        }
        return loadResistanceOhm * (openCircuitVoltageV / loadedVoltageV - 1.0);
    }

    /** Current into a resistive load at speed ω: I = k_e ω/(R_a + R_L). */
    public double currentA(double speedRadPerS, double loadResistanceOhm) {
        return keVoltSecondPerRad * speedRadPerS / (windingResistanceOhm + loadResistanceOhm);
    }

    /** Shaft torque the generator demands: k_t I + friction (friction only when turning). */
    public double torqueNm(double speedRadPerS, double loadResistanceOhm) {
        double friction = speedRadPerS > 0 ? frictionTorqueNm : 0.0;
        return keVoltSecondPerRad * currentA(speedRadPerS, loadResistanceOhm) + friction;
    }

    /** Electrical power into the load, I² R_L. */
    public double loadPowerW(double speedRadPerS, double loadResistanceOhm) {
        double i = currentA(speedRadPerS, loadResistanceOhm);
        return i * i * loadResistanceOhm;
    }

    /** At a fixed speed the load power is greatest when R_L = R_a (maximum power transfer): P = E²/(4R_a). */
    public double bestLoadAtFixedSpeedOhm() {
        return windingResistanceOhm;
    }

    /** E²/(4R_a) at a speed. */
    public double maximumPowerAtSpeedW(double speedRadPerS) {
        double e = keVoltSecondPerRad * speedRadPerS;
        return e * e / (4.0 * windingResistanceOhm);
    }
}
