package org.shearstack.physics.dyno;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.function.DoubleUnaryOperator;

/**
 * Test helper: a bench run simulated from a known rotor torque curve, loss law and inertia
 * (I dω/dt = T_air(ω)·[air on] − T_loss(ω), RK4 at 0.5 ms), read by a tachometer that averages speed over
 * its own update period (a counting tachometer), rounds to whole rpm and adds seeded Gaussian noise; the
 * logger's time stamps jitter by a seeded amount. Invented data for tests only.
 */
final class SyntheticBenchRun {
    double inertiaKgM2 = 1e-4;
    DoubleUnaryOperator airTorqueNm = w -> 0.05 * (1 - w / 4000.0);
    LossLaw loss = new LossLaw(1.5e-3, 1.5e-6, 5e-10);
    double airOnS = 2;
    double airOffS = 40;
    double endS = 100;
    double sampleHz = 20;
    double noiseShare = 0.002;
    double rpmStep = 1;
    double jitterShare = 0.02;
    long seed = 42;
    /** Generator k_e (V·s/rad); 0 = no generator columns. Load connected only while the air is on. */
    double keVsPerRad = 0;
    double armatureOhm = 2;
    double loadOhm = 10;

    /** The simulated log. */
    SpeedLog log() {
        Random rnd = new Random(seed);
        double dt = 5e-4;
        double period = 1 / sampleHz;
        List<double[]> rows = new ArrayList<>();
        double w = 0;
        double t = 0;
        double integral = 0; // ∫ω dt since the last sample
        double lastSample = 0;
        double nextSample = period;
        while (t < endS) {
            double w0 = w;
            w = step(t, w, dt);
            integral += 0.5 * (w0 + w) * dt;
            t += dt;
            if (t >= nextSample - 1e-12) {
                double mean = integral / (t - lastSample);
                double rpm = mean * 30 / Math.PI;
                rpm *= 1 + noiseShare * rnd.nextGaussian();
                rpm = Math.max(0, Math.round(rpm / rpmStep) * rpmStep);
                boolean loaded = t >= airOnS && t < airOffS;
                double emf = keVsPerRad * mean;
                double amps = loaded ? emf / (armatureOhm + loadOhm) : 0;
                double volts = loaded ? amps * loadOhm : emf;
                rows.add(new double[] {t, rpm * Math.PI / 30, volts * (1 + 0.002 * rnd.nextGaussian()),
                    amps * (1 + 0.002 * rnd.nextGaussian())});
                integral = 0;
                lastSample = t;
                nextSample = t + period * (1 + jitterShare * (2 * rnd.nextDouble() - 1));
            }
        }
        double[] ts = new double[rows.size()];
        double[] ws = new double[rows.size()];
        double[] vs = new double[rows.size()];
        double[] is = new double[rows.size()];
        for (int i = 0; i < ts.length; i++) {
            ts[i] = rows.get(i)[0];
            ws[i] = rows.get(i)[1];
            vs[i] = rows.get(i)[2];
            is[i] = rows.get(i)[3];
        }
        return keVsPerRad > 0 ? SpeedLog.of(ts, ws, vs, is) : SpeedLog.of(ts, ws);
    }

    private double step(double t, double w, double dt) {
        double k1 = rate(t, w);
        double k2 = rate(t + dt / 2, w + dt / 2 * k1);
        double k3 = rate(t + dt / 2, w + dt / 2 * k2);
        double k4 = rate(t + dt, w + dt * k3);
        return Math.max(0, w + dt / 6 * (k1 + 2 * k2 + 2 * k3 + k4));
    }

    private double rate(double t, double w) {
        boolean on = t >= airOnS && t < airOffS;
        double drive = on ? airTorqueNm.applyAsDouble(w) : 0;
        if (on && keVsPerRad > 0) {
            drive -= keVsPerRad * keVsPerRad * w / (armatureOhm + loadOhm); // k_t I with k_t = k_e (physics.md §8.3)
        }
        double lossT = w > 0 ? loss.torqueNm(w) : 0;
        double net = drive - lossT;
        return w <= 0 && net < 0 ? 0 : net / inertiaKgM2;
    }
}
