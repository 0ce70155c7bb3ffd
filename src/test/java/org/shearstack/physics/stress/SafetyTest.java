package org.shearstack.physics.stress;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Safety factor on stress, its speed equivalent (physics.md §12.7), strength derating and the port allowance. */
class SafetyTest {

    @Test
    void factorOnStressIsSquareOfFactorOnSpeed() {
        // physics.md §12.7: stress ∝ ω², so a factor 9 on stress is a factor 3 on speed
        assertEquals(3.0, new SafetyFactor(9).onSpeed(), 1e-12);
        assertEquals(Math.sqrt(3), SafetyFactor.standard().onSpeed(), 1e-12);
    }

    @Test
    void factorOutsideLimitsIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> new SafetyFactor(1.2));
        assertThrows(IllegalArgumentException.class, () -> new SafetyFactor(300));
    }

    @Test
    void allowableSpeedMeetsFactorOnStress() {
        // At the allowable speed the stress factor equals the required factor, whatever the geometry.
        SpinningAnnulus disc = SpinningAnnulus.withExhaustPorts(0.05, 0.015);
        SafetyFactor sf = new SafetyFactor(3);
        BurstAssessment probe = BurstAssessment.of(disc, 1240, 0.36, 35e6, sf, 1000);
        BurstAssessment atAllow = BurstAssessment.of(disc, 1240, 0.36, 35e6, sf, probe.allowableSpeedRadPerS());
        assertEquals(3.0, atAllow.stressFactor(), 1e-9);
        assertEquals(Math.sqrt(3), atAllow.burstSpeedRatio(), 1e-9);
        assertTrue(atAllow.withinAllowable());
        BurstAssessment beyond = BurstAssessment.of(disc, 1240, 0.36, 35e6, sf, probe.burstSpeedRadPerS() * 1.01);
        assertFalse(beyond.withinAllowable());
        assertTrue(beyond.beyondBurst());
    }

    @Test
    void portAllowanceLowersBurstSpeedBySquareRoot() {
        SpinningAnnulus plain = SpinningAnnulus.plainBore(0.05, 0.015);
        SpinningAnnulus ported = SpinningAnnulus.withExhaustPorts(0.05, 0.015);
        double ratio = plain.burstSpeedRadPerS(40e6, 1240, 0.36) / ported.burstSpeedRadPerS(40e6, 1240, 0.36);
        assertEquals(Math.sqrt(SpinningAnnulus.EXHAUST_PORT_ALLOWANCE), ratio, 1e-12);
    }

    @Test
    void printedStrengthDerating() {
        // physics.md §4.3 suggestion (engineering judgement, from memory): lower XY bound × 0.7 for discs;
        // the Z strength across layers. PLA XY lower bound 50 MPa (additive.tools, C1) → 35 MPa.
        assertEquals(35e6, PrintedStrength.inPlanePa(50e6), 1e-6);
        assertEquals(22.8e6, PrintedStrength.acrossLayersPa(50e6, 22.8e6), 1e-6); // C3 interface test 22.8 MPa
        assertEquals(25e6, PrintedStrength.acrossLayersPa(50e6, Double.NaN), 1e-6);
    }
}
