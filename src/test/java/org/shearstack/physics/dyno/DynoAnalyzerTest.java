package org.shearstack.physics.dyno;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Recovery of a known torque curve, loss law and inertia from a simulated tachometer log (invented
 * data, {@link SyntheticBenchRun}); the equation of motion is physics.md §8.1.
 */
class DynoAnalyzerTest {
    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.ValueSource(longs = {42, 7, 2024})
    void recoversLossCoefficientsWithinTenPercent(long seed) {
        SyntheticBenchRun run = new SyntheticBenchRun();
        run.seed = seed;
        DynoResult r = DynoAnalyzer.analyze(run.log(), DynoInputs.of(run.inertiaKgM2));
        LossLaw fit = r.loss().orElseThrow().law();
        assertEquals(run.loss.constantNm(), fit.constantNm(), 0.10 * run.loss.constantNm());
        assertEquals(run.loss.viscousNmPerRadPerS(), fit.viscousNmPerRadPerS(), 0.10 * run.loss.viscousNmPerRadPerS());
        assertEquals(run.loss.quadraticNmPerRadPerSSquared(), fit.quadraticNmPerRadPerSSquared(),
                0.10 * run.loss.quadraticNmPerRadPerSSquared());
    }

    /**
     * The torque curve (run-up averaged in speed bins) is within 5 % of the true air torque from 20 % to
     * 80 % of the no-load speed; single samples scatter more (tachometer noise through a derivative).
     */
    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.ValueSource(longs = {42, 7, 2024})
    void recoversRotorTorqueWithinFivePercentOverMiddleOfSpeedRange(long seed) {
        SyntheticBenchRun run = new SyntheticBenchRun();
        run.seed = seed;
        DynoResult r = DynoAnalyzer.analyze(run.log(), DynoInputs.of(run.inertiaKgM2));
        double noLoad = r.summary().noLoadSpeedRadPerS();
        int n = 0;
        double worst = 0;
        for (CurvePoint p : r.curve()) {
            double w = p.speedRadPerS();
            if (w >= 0.2 * noLoad && w <= 0.8 * noLoad) {
                double truth = run.airTorqueNm.applyAsDouble(w);
                worst = Math.max(worst, Math.abs(p.rotorTorqueNm() / truth - 1));
                n++;
            }
        }
        assertTrue(n >= 20, "bins in the middle range: " + n);
        assertTrue(worst < 0.05, "worst relative torque error " + worst);
    }

    /** No-load speed where air torque equals loss torque (solved from the known curves), within 1 %. */
    @Test
    void measuresNoLoadSpeed() {
        SyntheticBenchRun run = new SyntheticBenchRun();
        DynoResult r = DynoAnalyzer.analyze(run.log(), DynoInputs.of(run.inertiaKgM2));
        // 0.05 (1 − ω/4000) = 1.5e-3 + 1.5e-6 ω + 5e-10 ω²  →  ω = 3117.0 rad/s (quadratic formula)
        double truth = (-1.4e-5 + Math.sqrt(1.4e-5 * 1.4e-5 + 4 * 5e-10 * 0.0485)) / (2 * 5e-10);
        assertEquals(truth, r.summary().noLoadSpeedRadPerS(), 0.01 * truth);
        assertEquals(0.05, r.summary().stallRotorTorqueNm(), 0.05 * 0.05);
    }
}
