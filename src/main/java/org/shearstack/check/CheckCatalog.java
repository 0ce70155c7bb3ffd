package org.shearstack.check;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.shearstack.check.design.BurstAtRunaway;
import org.shearstack.check.design.Bearings;
import org.shearstack.check.design.Containment;
import org.shearstack.check.design.Dynamics;
import org.shearstack.check.design.Fits;
import org.shearstack.check.design.RunawaySource;
import org.shearstack.check.design.StackUps;
import org.shearstack.check.safety.BurstCheck;
import org.shearstack.check.safety.RunawayModel;
import org.shearstack.check.safety.SafetySummary;
import org.shearstack.design.ResolvedDesign;

/**
 * Every design check, in report order (safety first). {@link #all()} uses the locked-flow runaway bound;
 * {@link #all(RunawaySource)} takes another runaway model (the performance model's band). Printability checks
 * run on parts, not on the design: see {@code org.shearstack.check.print.Printability}.
 */
public final class CheckCatalog {

    private CheckCatalog() {
    }

    public static List<Check> all() {
        return all(RunawaySource.lockedFlowBound());
    }

    public static List<Check> all(RunawaySource source) {
        RunawaySource cached = cached(source);
        return List.of(new BurstAtRunaway(cached), new Containment(), new Dynamics(cached), new Bearings(cached),
                new Fits(), new StackUps(), new org.shearstack.check.flow.GapSearchBound());
    }

    /** Runs every check and returns the findings, worst first within the catalogue order. */
    public static List<Finding> run(ResolvedDesign design, RunawaySource source) {
        List<Finding> out = new ArrayList<>();
        for (Check c : all(source)) {
            out.addAll(c.run(design));
        }
        out.sort(Comparator.comparing(Finding::severity).reversed());
        return out;
    }

    /** True when no finding FAILs (the command line's exit 0; otherwise 3). */
    public static boolean passes(List<Finding> findings) {
        return findings.stream().noneMatch(f -> f.severity() == Severity.FAIL);
    }

    /**
     * The safety summary for report.json (safety.maxSafeSupplyPressureBarG, safety.runawaySpeedRpm,
     * safety.allowableSpeedRpm); empty when the design lacks what the burst check needs.
     */
    public static Optional<SafetySummary> safetySummary(ResolvedDesign design, RunawaySource source) {
        BurstCheck.Result r = new BurstAtRunaway(source).evaluate(new DesignValues(design));
        return r == null ? Optional.empty() : Optional.of(r.summary());
    }

    /** One cached model per design object, so slow models are asked each question once per run. */
    private static RunawaySource cached(RunawaySource source) {
        Map<ResolvedDesign, RunawayModel> models = new IdentityHashMap<>();
        return v -> models.computeIfAbsent(v.design(), d -> {
            RunawayModel m = source.forDesign(v);
            return m == null ? null : org.shearstack.check.design.Caching.wrap(m);
        });
    }
}
