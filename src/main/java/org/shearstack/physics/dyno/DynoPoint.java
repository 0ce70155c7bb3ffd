package org.shearstack.physics.dyno;

/**
 * One run-up sample after smoothing. NaN where a quantity is unknown (no coast-down, no electrical
 * columns, no prediction).
 *
 * @param timeS                 sample time
 * @param speedRadPerS          smoothed speed
 * @param accelerationRadPerS2  smoothed dω/dt
 * @param lossTorqueNm          fitted coast-down loss at this speed (0 when there is no coast-down)
 * @param generatorTorqueNm     k_e·I taken by a loaded generator (0 without current)
 * @param shaftTorqueNm         torque a load can take: I·α + generator torque
 * @param rotorTorqueNm         torque of the air on the rotor: shaft torque + loss torque
 * @param shaftPowerW           shaft torque × speed
 * @param rotorPowerW           rotor torque × speed
 * @param electricalPowerW      V·I at the generator terminals
 * @param generatorEfficiency   V·I over the converted power k_e·ω·I (= V/E)
 * @param predictedTorqueNm     predicted torque at this speed
 */
public record DynoPoint(double timeS, double speedRadPerS, double accelerationRadPerS2, double lossTorqueNm,
        double generatorTorqueNm, double shaftTorqueNm, double rotorTorqueNm, double shaftPowerW, double rotorPowerW,
        double electricalPowerW, double generatorEfficiency, double predictedTorqueNm) {
}
