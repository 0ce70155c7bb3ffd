package org.shearstack.cli;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import org.shearstack.physics.dyno.Prediction;

/**
 * Finds the inertia and predicted torque for a bench run: from the design (rotor parts' mass properties
 * and the performance map) once those are wired, otherwise from the command-line inertia.
 */
final class DesignLink {
    private DesignLink() {
    }

    /** Inertia, where it came from, and an optional prediction. */
    record Data(double inertiaKgM2, String inertiaSource, Optional<Prediction> prediction) {
    }

    static Data load(Path design, Double inertiaKgM2, double extraKgM2) {
        if (inertiaKgM2 != null) {
            double total = inertiaKgM2 + extraKgM2;
            return new Data(total, String.format(Locale.ROOT, "--inertia %.4g kg*m^2%s", inertiaKgM2,
                    extraKgM2 > 0 ? String.format(Locale.ROOT, " + --extra-inertia %.4g kg*m^2", extraKgM2) : ""),
                    Optional.empty());
        }
        if (design == null) {
            throw new IllegalArgumentException("the rotor inertia is unknown: give --design DIR|SPEC or --inertia"
                    + " (kg*m^2, e.g. 9.7e-5 or '97 kg*mm^2')");
        }
        throw new IllegalArgumentException("--design " + design + ": reading the rotor inertia from a design is not"
                + " available in this build yet; give --inertia (kg*m^2)");
    }
}
