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

    @Test
    void logWithoutCoastDownGivesAFindingAndShaftTorqueOnly() {
        SyntheticBenchRun run = new SyntheticBenchRun();
        run.endS = run.airOffS;
        DynoResult r = DynoAnalyzer.analyze(run.log(), DynoInputs.of(run.inertiaKgM2));
        assertTrue(r.loss().isEmpty());
        assertTrue(r.findings().stream().anyMatch(f -> f.code().equals("DYNO-NO-COASTDOWN")));
        DynoPoint p = r.runUp().get(r.runUp().size() / 2);
        assertEquals(p.shaftTorqueNm(), p.rotorTorqueNm(), 0);
    }

    @Test
    void flatLogIsRefusedWithAClearMessage() {
        double[] t = new double[50];
        double[] w = new double[50];
        for (int i = 0; i < 50; i++) {
            t[i] = 0.1 * i;
            w[i] = 1000 + (i % 2);
        }
        IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> DynoAnalyzer.analyze(SpeedLog.of(t, w), DynoInputs.of(1e-4)));
        assertEquals("no run-up and no coast-down found: the speed never rises or falls by 30 % of its top value;"
                + " give them with --run-up/--coast-down START:END (seconds)", e.getMessage());
    }

    @Test
    void comparesWithAPrediction() {
        SyntheticBenchRun run = new SyntheticBenchRun();
        Prediction exact = new Prediction(run.airTorqueNm, Prediction.Basis.ROTOR, "the simulation's own curve");
        Prediction high = new Prediction(w -> 1.25 * run.airTorqueNm.applyAsDouble(w), Prediction.Basis.ROTOR, "25 % high");
        DynoResult a = DynoAnalyzer.analyze(run.log(), DynoInputs.of(run.inertiaKgM2).withPrediction(exact));
        DynoResult b = DynoAnalyzer.analyze(run.log(), DynoInputs.of(run.inertiaKgM2).withPrediction(high));
        assertEquals(1.0, a.comparison().orElseThrow().meanRatio(), 0.02);
        assertEquals(0.8, b.comparison().orElseThrow().meanRatio(), 0.02);
    }

    /**
     * A generator loaded while the air is on (k_e = 0.0191 V·s/rad, R_a = 2 Ω, R_L = 10 Ω; physics.md §8.3):
     * k_e comes from the open-circuit coast-down, the rotor torque still matches the air torque, and the generator
     * efficiency V/E equals R_L/(R_a + R_L) = 0.8333 (voltage divider, V = E − I·R_a).
     */
    @Test
    void loadedGeneratorRun() {
        SyntheticBenchRun run = new SyntheticBenchRun();
        run.keVsPerRad = 0.0191;
        DynoResult r = DynoAnalyzer.analyze(run.log(), DynoInputs.of(run.inertiaKgM2));
        assertEquals(0.0191, r.summary().backEmfConstantVsPerRad(), 0.01 * 0.0191);
        double noLoad = r.summary().noLoadSpeedRadPerS();
        for (CurvePoint p : r.curve()) {
            double w = p.speedRadPerS();
            if (w >= 0.2 * noLoad && w <= 0.8 * noLoad) {
                double truth = run.airTorqueNm.applyAsDouble(w);
                assertEquals(truth, p.rotorTorqueNm(), 0.05 * truth, "rotor torque at " + w);
            }
        }
        DynoPoint mid = r.runUp().get(r.runUp().size() / 2);
        assertEquals(10.0 / 12.0, mid.generatorEfficiency(), 0.02);
        assertEquals(mid.electricalPowerW(), mid.generatorEfficiency() * mid.generatorTorqueNm() * mid.speedRadPerS(),
                0.01 * mid.electricalPowerW());
    }

    /** Missed or doubled tachometer pulses (half and twice the speed) are left out and reported. */
    @Test
    void spikesAreLeftOutAndReported() {
        SyntheticBenchRun run = new SyntheticBenchRun();
        SpeedLog clean = run.log();
        double[] t = clean.timesS();
        double[] w = clean.speedsRadPerS();
        int[] at = {300, 301, 900, 1500};
        for (int i : at) {
            w[i] *= i % 2 == 0 ? 0.5 : 2.0;
        }
        DynoResult r = DynoAnalyzer.analyze(SpeedLog.of(t, w), DynoInputs.of(run.inertiaKgM2));
        assertEquals(clean.size() - 4, r.log().size());
        assertTrue(r.findings().stream().anyMatch(f -> f.code().equals("DYNO-SPIKES")
                && f.message().startsWith("Left out 4 single-sample speed spike(s)")), r.findings().toString());
        LossLaw fit = r.loss().orElseThrow().law();
        assertEquals(run.loss.viscousNmPerRadPerS(), fit.viscousNmPerRadPerS(), 0.10 * run.loss.viscousNmPerRadPerS());
    }

    /** A clean simulated log has no spikes (the detector does not eat the run-up's steep start). */
    @Test
    void cleanLogHasNoSpikes() {
        SyntheticBenchRun run = new SyntheticBenchRun();
        boolean[] f = Outliers.find(run.log().speedsRadPerS());
        for (boolean b : f) {
            assertTrue(!b);
        }
    }
}
