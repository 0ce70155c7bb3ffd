package org.shearstack.physics.generator;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.shearstack.physics.rotor.TurbineModel;

class DcGeneratorTest {

    private static final double RPM = Math.PI / 30.0;

    @Test
    void ms04BackEmfConstantAndMaximumPower() {
        // derived (physics.md §8.3, MS-04): E 12 V at 6000 rpm -> k_e 0.0190986 V s/rad; R_a 2 ohm -> P_max 18 W,
        // I 3 A, torque k_t I 0.05730 N m (k_e = k_t in SI: motioncontroltips FAQ)
        DcGenerator g = DcGenerator.fromOpenCircuit(12.0, 6000 * RPM, 2.0, 0.0);
        assertEquals(0.0190986, g.keVoltSecondPerRad(), 0.0190986 * 1e-6);
        assertEquals(18.0, g.maximumPowerAtSpeedW(6000 * RPM), 18.0 * 1e-6);
        assertEquals(18.0, g.loadPowerW(6000 * RPM, g.bestLoadAtFixedSpeedOhm()), 1e-9);
        assertEquals(3.0, g.currentA(6000 * RPM, 2.0), 1e-12);
        assertEquals(0.05730, g.torqueNm(6000 * RPM, 2.0), 1e-5);
        // any other load gives less at that speed
        assertTrue(g.loadPowerW(6000 * RPM, 1.5) < 18.0 && g.loadPowerW(6000 * RPM, 2.5) < 18.0);
    }

    @Test
    void ms05WindingResistanceFromLoadedTest() {
        // derived (physics.md §8.3, MS-05): E 12 V, V_L 9 V across 5 ohm -> R_a = 1.6667 ohm
        assertEquals(1.6667, DcGenerator.windingResistanceFromLoadTest(12.0, 9.0, 5.0), 1e-4);
    }

    @Test
    void coupledSpeedBalancesTurbineAndGeneratorTorque() {
        TurbineModel turbine = org.shearstack.physics.rotor.DemoAccess.demo();
        DcGenerator g = DcGenerator.fromOpenCircuit(9.0, 6000 * RPM, 3.1, 0.002);
        GeneratorPoint p = GeneratorCoupling.run(turbine, g, 20.0);
        assertEquals(g.torqueNm(p.speedRadPerS(), 20.0), turbine.at(p.speedRadPerS()).shaftTorqueNm(), 1e-6);
        assertEquals(p.currentA() * 20.0, p.terminalVoltageV(), 1e-12);
        assertTrue(p.electricalPowerW() < p.shaftPowerW());
        GeneratorPoint best = GeneratorCoupling.bestLoad(turbine, g, 0.5, 500.0, 1e-3);
        for (double r : new double[] {1.0, 3.1, 10.0, 20.0, 100.0}) {
            assertTrue(best.electricalPowerW() >= GeneratorCoupling.run(turbine, g, r).electricalPowerW() - 1e-9);
        }
    }
}
