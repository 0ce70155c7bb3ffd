package org.shearstack.io.dyno;

import java.util.Objects;
import org.shearstack.physics.dyno.DynoResult;

/**
 * What the dyno writers render: the analysis and where its inputs came from.
 *
 * @param result        the analysis
 * @param logSource     the log file as named by the user
 * @param logColumns    which columns and units the reader used
 * @param inertiaSource how the inertia was obtained ("design demo.yaml: rotor parts 9.72e-5 + option 2e-6")
 */
public record DynoReport(DynoResult result, String logSource, String logColumns, String inertiaSource) {
    public DynoReport {
        Objects.requireNonNull(result, "result");
        logSource = logSource == null ? "" : logSource;
        logColumns = logColumns == null ? "" : logColumns;
        inertiaSource = inertiaSource == null ? "" : inertiaSource;
    }

    static final double RPM_PER_RAD_S = 30 / Math.PI;
}
