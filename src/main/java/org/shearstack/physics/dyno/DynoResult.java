package org.shearstack.physics.dyno;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.shearstack.check.Finding;

/**
 * Everything one bench-run analysis found.
 *
 * @param inertiaKgM2 inertia used
 * @param log         the analysed log
 * @param segments    run-up, steady and coast-down stretches
 * @param windows     Savitzky–Golay window per analysed segment
 * @param loss        fitted coast-down loss law, empty without a coast-down
 * @param runUp       run-up samples with torques and powers
 * @param curve       the run-up averaged in speed bins (the torque and power curves)
 * @param coastDown   coast-down samples with measured and fitted loss torque
 * @param summary     headline numbers
 * @param comparison  measured vs predicted, empty without a prediction
 * @param findings    what the user should know (missing segments, fit quality, cautions)
 */
public record DynoResult(double inertiaKgM2, SpeedLog log, Segments segments, Map<Segment.Kind, WindowChoice> windows,
        Optional<LossFit.Result> loss, List<DynoPoint> runUp, List<CurvePoint> curve, List<CoastPoint> coastDown, DynoSummary summary,
        Optional<Comparison> comparison, List<Finding> findings) {
    public DynoResult {
        windows = Map.copyOf(windows);
        runUp = List.copyOf(runUp);
        curve = List.copyOf(curve);
        coastDown = List.copyOf(coastDown);
        findings = List.copyOf(findings);
    }
}
