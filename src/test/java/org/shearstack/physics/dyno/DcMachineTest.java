package org.shearstack.physics.dyno;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class DcMachineTest {
    /** MS-04: E = 12 V at 6000 rpm → k_e = 0.0190986 V·s/rad; R_a = 2 Ω → P_max = 18.0 W (derived, physics.md §8.3). */
    @Test
    void backEmfConstantAndMaximumPower() {
        double ke = DcMachine.backEmfConstantVsPerRad(12, 6000 * Math.PI / 30);
        assertEquals(0.0190986, ke, 0.0190986 * 1e-6);
        assertEquals(18.0, DcMachine.maxLoadPowerW(12, 2), 18.0 * 1e-6);
        // at R_L = R_a the current is E/(2 R_a) = 3 A and the torque k_t I = 0.05730 N·m (physics.md §8.3)
        assertEquals(0.05730, DcMachine.torqueNm(ke, 3.0), 1e-5);
    }

    /** MS-05: E = 12 V, V_L = 9 V across R_L = 5 Ω → R_a = 1.6667 Ω (derived, physics.md §8.3). */
    @Test
    void armatureResistanceFromLoadedTest() {
        assertEquals(1.6667, DcMachine.armatureResistanceOhm(12, 9, 5), 1.6667 * 1e-4);
    }
}
