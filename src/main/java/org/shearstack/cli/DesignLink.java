package org.shearstack.cli;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import org.shearstack.physics.dyno.Prediction;
import org.shearstack.physics.rotor.TurbineModel;

/**
 * What the bench commands need from a design: the inertia of the rotating parts and the performance model.
 * The lookup from a design folder or spec is a {@link Source}; commands take the inertia from
 * {@code --inertia} when given.
 */
final class DesignLink {
    private DesignLink() {
    }

    /**
     * A design as the bench commands see it.
     *
     * @param name              design name for messages
     * @param rotorInertiaKgM2  inertia of the rotating parts the design generates (NaN when unknown)
     * @param inertiaSource     how it was obtained
     * @param model             the performance model, when the design has one
     */
    record Design(String name, double rotorInertiaKgM2, String inertiaSource, Optional<TurbineModel> model) {
    }

    /** Looks a design up. */
    interface Source {
        Design load(Path design);
    }

    /** Inertia, where it came from, an optional prediction and the model. */
    record Data(double inertiaKgM2, String inertiaSource, Optional<Prediction> prediction,
            Optional<TurbineModel> model) {
    }

    static Data load(Source source, Path design, Double inertiaKgM2, double extraKgM2) {
        Optional<Design> d = design == null ? Optional.empty() : Optional.of(source.load(design));
        Optional<TurbineModel> model = d.flatMap(Design::model);
        Optional<Prediction> prediction = model.map(m -> new Prediction(tabulated(m), Prediction.Basis.SHAFT,
                "performance model of " + d.get().name()));
        String extra = extraKgM2 > 0 ? String.format(Locale.ROOT, " + --extra-inertia %.4g kg*m^2", extraKgM2) : "";
        if (inertiaKgM2 != null) {
            return new Data(inertiaKgM2 + extraKgM2, String.format(Locale.ROOT, "--inertia %.4g kg*m^2%s",
                    inertiaKgM2, extra), prediction, model);
        }
        if (d.isEmpty()) {
            throw new IllegalArgumentException("the rotor inertia is unknown: give --design DIR|SPEC or --inertia"
                    + " (kg*m^2, e.g. 9.7e-5 or '97 kg*mm^2')");
        }
        if (!(d.get().rotorInertiaKgM2() > 0)) {
            throw new IllegalArgumentException("--design " + design + ": " + d.get().inertiaSource()
                    + "; give --inertia (kg*m^2)");
        }
        return new Data(d.get().rotorInertiaKgM2() + extraKgM2, d.get().inertiaSource() + extra, prediction, model);
    }

    /**
     * The model's shaft torque on 81 speeds from 0 to twice its runaway speed, linear in between (the coupled
     * solve costs about a millisecond; a run-up has hundreds of samples).
     */
    static java.util.function.DoubleUnaryOperator tabulated(TurbineModel m) {
        double top = 2 * Math.max(m.runawaySpeedRadPerS(), 1.0);
        int n = 80;
        double[] t = new double[n + 1];
        for (int i = 0; i <= n; i++) {
            t[i] = m.at(top * i / n).shaftTorqueNm();
        }
        return w -> {
            double x = Math.max(0, Math.min(n, w / top * n));
            int i = Math.min(n - 1, (int) x);
            return t[i] + (x - i) * (t[i + 1] - t[i]);
        };
    }
}
