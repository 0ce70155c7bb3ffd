package org.shearstack.physics.dyno;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class CoastDownTest {
    /**
     * MS-01: J = 0.0222 kg·m², k_v = 0.003262 N·m·s, T_f = 0.1 N·m (parameters from the IST e-lee
     * DC-motor identification page, physics.md §8.1 [C]), ω₀ = 157.08 rad/s → t_s = 12.333 s (derived,
     * physics.md §8.1, tolerance 1e-4 relative).
     */
    @Test
    void stopTimeMatchesReferenceSheet() {
        double ts = CoastDown.stopTimeS(0.0222, 0.003262, 0.1, 157.08);
        assertEquals(12.333, ts, 12.333 * 1e-4);
    }

    /** The quadrature of the general law agrees with the closed form when c2 = 0 (self-consistency). */
    @Test
    void quadratureAgreesWithClosedForm() {
        LossLaw law = new LossLaw(0.1, 0.003262, 0);
        double ts = CoastDown.timeBetweenS(0.0222, law, 157.08, 0, 2000);
        assertEquals(CoastDown.stopTimeS(0.0222, 0.003262, 0.1, 157.08), ts, 1e-9);
        assertEquals(0, CoastDown.speedAtRadPerS(0.0222, 0.003262, 0.1, 157.08, ts), 1e-9);
    }

    /** A simulated coast-down reaches standstill at the MS-01 stop time (within one 1 ms sample). */
    @Test
    void simulatedCoastDownStopsAtReferenceTime() {
        SyntheticBenchRun run = new SyntheticBenchRun();
        run.inertiaKgM2 = 0.0222;
        run.loss = new LossLaw(0.1, 0.003262, 0);
        double w = 157.08;
        double t = 0;
        double dt = 1e-4;
        while (w > 0) {
            double a = -run.loss.torqueNm(w) / run.inertiaKgM2;
            w += a * dt;
            t += dt;
        }
        assertEquals(12.333, t, 2e-3);
    }
}
