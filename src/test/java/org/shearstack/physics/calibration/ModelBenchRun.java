package org.shearstack.physics.calibration;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;
import org.shearstack.physics.gas.Gas;
import org.shearstack.physics.rotor.Calibration;
import org.shearstack.physics.rotor.ParasiticLosses;
import org.shearstack.physics.rotor.TurbineModel;

/**
 * Writes the invented bench logs of tests-fixtures/bench/ from the model with known coefficients: the run-up
 * integrates I dω/dt = shaft torque of the coupled model (tabulated, linear between 120 speeds), the coast-down
 * I dω/dt = −(parasitic torque at ambient density); a counting tachometer at about 20 Hz reads whole rpm with
 * 0.2 % seeded noise. Run {@code main} to regenerate (the logs are committed; the back-test reads them).
 */
final class ModelBenchRun {
    private ModelBenchRun() {
    }

    static String csv(String name, TurbineModel model, Calibration truth, double inertia, long seed) {
        TurbineModel m = model.withCalibration(truth);
        double runaway = m.runawaySpeedRadPerS();
        int nTab = 120;
        double top = 1.1 * runaway;
        double[] tab = new double[nTab + 1];
        for (int i = 0; i <= nTab; i++) {
            tab[i] = m.at(top * i / nTab).shaftTorqueNm();
        }
        Gas gas = m.gas();
        double rho = gas.densityKgPerM3(m.supply().ambientPressurePa(), m.supply().supplyTemperatureK());
        double mu = gas.viscosityPaS(m.supply().supplyTemperatureK());
        double airOn = 1.0;
        double airOff = 40.0;
        double end = 62.0;
        Random rnd = new Random(seed);
        StringBuilder s = new StringBuilder();
        s.append("# INVENTED BENCH LOG, not a measurement: generated from the coupled model with known coefficients\n");
        s.append(String.format(Locale.ROOT, "# truth: name=%s inertia-kg-m2=%.6g admission=%s windage-scale=%.6g"
                + " bearing-speed-factor=%.6g seal-torque-per-bearing-nm=%.6g bearing-friction-coefficient=%.6g"
                + " discharge-scale=%.6g no-load-rad-per-s=%.6g%n", name, inertia, BenchCalibrator.label(truth.admission()),
                truth.endFaceScale(), truth.bearingSpeedFactor(), truth.sealTorquePerBearingNm(),
                truth.bearingFrictionCoefficient(), truth.dischargeScale(), runaway));
        s.append("# air on at 1 s, off at 40 s; about 20 Hz counting tachometer, whole rpm, 0.2 % noise (seeded)\n");
        s.append("time [s],speed [rpm]\n");
        double dt = 5e-4;
        double w = 0;
        double t = 0;
        double integral = 0;
        double last = 0;
        double next = 0.05;
        while (t < end) {
            double w0 = w;
            double k1 = rate(t, w, airOn, airOff, tab, top, m, truth, rho, mu, inertia);
            double k2 = rate(t + dt / 2, w + dt / 2 * k1, airOn, airOff, tab, top, m, truth, rho, mu, inertia);
            double k3 = rate(t + dt / 2, w + dt / 2 * k2, airOn, airOff, tab, top, m, truth, rho, mu, inertia);
            double k4 = rate(t + dt, w + dt * k3, airOn, airOff, tab, top, m, truth, rho, mu, inertia);
            w = Math.max(0, w + dt / 6 * (k1 + 2 * k2 + 2 * k3 + k4));
            integral += 0.5 * (w0 + w) * dt;
            t += dt;
            if (t >= next - 1e-12) {
                double rpm = integral / (t - last) * 30 / Math.PI * (1 + 0.002 * rnd.nextGaussian());
                s.append(String.format(Locale.ROOT, "%.3f,%d%n", t, Math.max(0, Math.round(rpm))));
                integral = 0;
                last = t;
                next = t + 0.05 * (1 + 0.02 * (2 * rnd.nextDouble() - 1));
            }
        }
        return s.toString();
    }

    private static double rate(double t, double w, double on, double off, double[] tab, double top, TurbineModel m,
            Calibration truth, double rho, double mu, double inertia) {
        double torque;
        if (t >= on && t < off) {
            double x = Math.min(w / top * (tab.length - 1), tab.length - 1.000001);
            int i = (int) x;
            torque = tab[i] + (x - i) * (tab[i + 1] - tab[i]);
        } else {
            torque = w > 0 ? -ParasiticLosses.at(w, m.geometry(), m.losses(), truth, rho, mu).totalNm() : 0;
        }
        return w <= 0 && torque < 0 ? 0 : torque / inertia;
    }

    /** Regenerates the fixtures into the given folder (default tests-fixtures/bench). */
    public static void main(String[] args) throws IOException {
        Path dir = Path.of(args.length > 0 ? args[0] : "tests-fixtures/bench");
        Files.createDirectories(dir);
        Files.writeString(dir.resolve("sealed-run.csv"), csv("sealed-run", FixtureModels.model(true),
                FixtureModels.sealedTruth(), FixtureModels.INERTIA_KG_M2, 101), StandardCharsets.UTF_8);
        Files.writeString(dir.resolve("shielded-run.csv"), csv("shielded-run", FixtureModels.model(false),
                FixtureModels.shieldedTruth(), FixtureModels.INERTIA_KG_M2, 202), StandardCharsets.UTF_8);
        // the example design as resolved today (its sized model and the kit's rotating inertia)
        var spec = org.shearstack.spec.SpecReader.read(Path.of("examples", "classroom-demo.yaml")).orThrow();
        var design = org.shearstack.rules.DesignResolver.resolve(spec,
                org.shearstack.profile.Profiles.load(java.util.Optional.empty()));
        TurbineModel model = org.shearstack.rules.sizing.DesignModels.turbineModel(design);
        double inertia = org.shearstack.assembly.RotatingInertia.of(org.shearstack.part.Dims.of(
                org.shearstack.part.DesignValues.of(design::get, design::text, design::has)),
                org.shearstack.geom.GeometryContext.withChordTolerance(0.02),
                design.get(org.shearstack.rules.ProfileKeys.DENSITY)).totalKgM2();
        Files.writeString(dir.resolve("classroom-run.csv"), csv("classroom-run", model, FixtureModels.classroomTruth(),
                inertia, 303), StandardCharsets.UTF_8);
    }
}
