package org.shearstack.physics.bearing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** BR-01/02 of physics.md §10 and the ring tolerances of standards.md §1.3 (B8). */
class BearingTest {

    @Test
    void speedFactor_BR01() {
        // BR-01: 608 (8 × 22 mm, ISO 15 sizes per standards.md B1) at 30 000 rpm → n·d_m 450 000, dn 240 000
        assertEquals(450_000, BearingSpeed.ndm(30_000, 8, 22), 0);
        assertEquals(240_000, BearingSpeed.dn(30_000, 8), 0);
    }

    @Test
    void limitsForA608() {
        // common practice (PTI glossary; FK bearing units): n·d_m 400 000 → 26 667 rpm; sealed dn 150 000 → 18 750 rpm
        assertEquals(400_000.0 / 15, BearingSpeed.limitRpm(8, 22, BearingSpeed.Closure.SHIELDED), 1e-9);
        assertEquals(18_750, BearingSpeed.limitRpm(8, 22, BearingSpeed.Closure.CONTACT_SEALED), 1e-9);
        assertEquals(10_000, BearingSpeed.generalGreaseRpm(8, 22), 1e-9);
    }

    @Test
    void frictionTorque_BR02() {
        // BR-02: μ 0.0015 (Koyo table 4-1; RoyMech), P 10 N, d 8 mm → 0.0600 N mm (derived)
        assertEquals(0.0600, BearingFriction.torqueNmm(BearingFriction.DEEP_GROOVE_MU, 10, 8), 1e-9);
    }

    @Test
    void ringTolerances_B8() {
        // standards.md B8: d = 20 class 0 → 0/−10 µm (NTN handbook table 5.1)
        assertEquals(-10, RingTolerance.boreLowerDeviationMicrometres(20));
        assertEquals(-8, RingTolerance.boreLowerDeviationMicrometres(8));
        // SKF table 8: D over 18 up to 30 → 0/−9; over 30 up to 50 → −11
        assertEquals(-9, RingTolerance.outsideLowerDeviationMicrometres(22));
        assertEquals(-11, RingTolerance.outsideLowerDeviationMicrometres(47));
        assertThrows(IllegalArgumentException.class, () -> RingTolerance.boreLowerDeviationMicrometres(100));
    }
}
