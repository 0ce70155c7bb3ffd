package org.shearstack.check.safety;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.physics.stress.BurstAssessment;
import org.shearstack.physics.stress.PrintedStrength;
import org.shearstack.physics.stress.SpinningAnnulus;

/**
 * BURST-RUNAWAY: can the air drive the rotor past the allowable speed of its weakest spinning part? Strength is
 * the filament's printed-flat strength derated for printing ({@link PrintedStrength#inPlanePa}); the allowable
 * speed carries the safety factor on stress. A FAIL comes with computed remedies: the maximum safe supply
 * pressure, and where the runaway model responds, a smaller throat, smaller discs, a permanent load; always the
 * strength a filament would need.
 */
public final class BurstCheck {

    public static final String CODE = "BURST-RUNAWAY";
    /** Ceiling of the pressure search: 16 bar above ambient, the spec's largest supply pressure. */
    public static final double PRESSURE_CEILING_GAUGE_PA = 16e5;
    /** Runaway within this fraction of the allowable speed is a CAUTION (engineering judgement). */
    public static final double CAUTION_FRACTION = 0.9;

    private BurstCheck() {
    }

    /** The outcome: the summary for the report and the findings. */
    public record Result(SafetySummary summary, List<Finding> findings) {
        public Result {
            findings = List.copyOf(findings);
        }
    }

    public static Result run(BurstInputs in) {
        double strength = PrintedStrength.inPlanePa(in.tensileXyPa());
        RunawayModel.Variant design = RunawayModel.Variant.atPressure(in.supplyPressurePa());
        double runaway = in.runaway().runawayRadPerS(design);

        List<Finding> findings = new ArrayList<>();
        BurstAssessment worst = null;
        String worstName = "";
        for (SpinningPart p : in.parts()) {
            BurstAssessment a = BurstAssessment.of(p.shape(), in.densityKgPerM3(), in.poisson(), strength, in.factor(),
                    runaway);
            if (worst == null || a.allowableSpeedRadPerS() < worst.allowableSpeedRadPerS()) {
                worst = a;
                worstName = p.name();
            }
        }
        double allowable = worst.allowableSpeedRadPerS();
        double ambient = in.ambientPressurePa();
        double ceiling = ambient + PRESSURE_CEILING_GAUGE_PA;
        boolean ceilingReached = in.runaway().runawayRadPerS(design.withPressure(ceiling)) <= allowable;
        double maxSafe = ceilingReached ? ceiling
                : Roots.bisect(p -> in.runaway().runawayRadPerS(design.withPressure(p)) - allowable, ambient, ceiling,
                        50);
        SafetySummary summary = new SafetySummary(maxSafe, ambient, runaway, allowable, worstName, ceilingReached);

        for (SpinningPart p : in.parts()) {
            BurstAssessment a = BurstAssessment.of(p.shape(), in.densityKgPerM3(), in.poisson(), strength, in.factor(),
                    runaway);
            boolean governing = p.name().equals(worstName);
            findings.add(finding(in, p, a, governing ? remedies(in, strength, worst, summary) : ""));
        }
        if (!Double.isNaN(in.operatingSpeedRadPerS()) && in.operatingSpeedRadPerS() > allowable) {
            findings.add(Findings.of("BURST-OPERATING", Severity.FAIL,
                    "The design speed " + Findings.rpm(in.operatingSpeedRadPerS()) + " rpm is above the allowable "
                            + Findings.rpm(allowable) + " rpm of the " + worstName + " even under load.",
                    rpm(in.operatingSpeedRadPerS()), rpm(allowable), "rpm", allowable / in.operatingSpeedRadPerS(),
                    worstName, "operating speed", "lower the design speed or use smaller discs"));
        }
        return new Result(summary, findings);
    }

    private static Finding finding(BurstInputs in, SpinningPart p, BurstAssessment a, String remedy) {
        double margin = a.allowableSpeedRadPerS() / a.reachableSpeedRadPerS();
        Severity sev = a.withinAllowable()
                ? (a.reachableSpeedRadPerS() > CAUTION_FRACTION * a.allowableSpeedRadPerS() ? Severity.CAUTION
                        : Severity.OK)
                : Severity.FAIL;
        String what = a.beyondBurst() ? " This is beyond the estimated burst speed itself." : "";
        String msg = "Runaway at " + Findings.bar(in.supplyPressurePa() - in.ambientPressurePa()) + " bar(g) reaches "
                + Findings.rpm(a.reachableSpeedRadPerS()) + " rpm (" + in.runaway().description() + "); the " + p.name()
                + " bursts near " + Findings.rpm(a.burstSpeedRadPerS()) + " rpm and is allowed "
                + Findings.rpm(a.allowableSpeedRadPerS()) + " rpm (factor " + Findings.num(in.factor().onStress(), 3)
                + " on stress, " + Findings.num(in.factor().onSpeed(), 3) + " on speed; design strength "
                + Findings.mpa(a.strengthPa()) + " MPa in plane). Achieved: " + Findings.num(a.stressFactor(), 3)
                + " on stress, burst/runaway speed ratio " + Findings.num(a.burstSpeedRatio(), 3) + "." + what;
        return Findings.of(CODE, sev, msg, rpm(a.reachableSpeedRadPerS()), rpm(a.allowableSpeedRadPerS()), "rpm", margin,
                p.name(), feature(p.shape()), remedy);
    }

    private static String feature(SpinningAnnulus s) {
        return s.concentration() > 1 ? "exhaust-port ring (stress allowance " + Findings.num(s.concentration(), 2) + ")"
                : (s.innerRadiusM() > 0 ? "bore" : "centre");
    }

    private static String remedies(BurstInputs in, double strength, BurstAssessment worst, SafetySummary s) {
        if (worst.withinAllowable()) {
            return "";
        }
        List<String> r = new ArrayList<>();
        double ambient = in.ambientPressurePa();
        r.add("limit the supply to " + Findings.bar(s.maxSafeSupplyPressurePa() - ambient)
                + " bar(g) with a regulator you cannot bypass");
        RunawayModel m = in.runaway();
        RunawayModel.Variant design = RunawayModel.Variant.atPressure(in.supplyPressurePa());
        double allowable = s.allowableSpeedRadPerS();
        // smaller throat
        double atSmall = m.runawayRadPerS(design.withThroatScale(0.05));
        if (atSmall == s.runawaySpeedRadPerS()) {
            r.add("a smaller throat: the runaway model used does not respond to throat area");
        } else if (atSmall > allowable) {
            r.add("a smaller throat alone cannot bring the runaway below the allowable speed");
        } else {
            double scale = Roots.bisect(t -> m.runawayRadPerS(design.withThroatScale(t)) - allowable, 0.05, 1, 1e-4);
            r.add("a throat area of at most " + Findings.num(scale * 100, 3) + " % of the present one");
        }
        // smaller discs
        double lo = 0.3;
        double hLo = m.runawayRadPerS(design.withDiameterScale(lo)) - allowableAt(in, strength, lo);
        if (hLo > 0) {
            r.add("smaller discs alone do not help here: runaway and allowable speed both follow the tip speed");
        } else {
            double scale = Roots.bisect(d -> m.runawayRadPerS(design.withDiameterScale(d)) - allowableAt(in, strength, d),
                    lo, 1, 1e-4);
            r.add("discs of at most " + Findings.num(scale * 100, 3) + " % of the present diameter");
        }
        // permanent load
        double t = 1e-4;
        double base = s.runawaySpeedRadPerS();
        while (t <= 10 && m.runawayRadPerS(design.withLoadTorque(t)) > allowable) {
            t *= 2;
        }
        if (m.runawayRadPerS(design.withLoadTorque(10)) == base) {
            r.add("a permanent load: the runaway model used does not respond to load torque");
        } else if (t > 10) {
            r.add("a permanent load would need more than 10 N m");
        } else {
            double need = Roots.bisect(q -> m.runawayRadPerS(design.withLoadTorque(q)) - allowable, t / 2, t, 1e-6);
            r.add("a permanent load of at least " + Findings.num(need * 1000, 3) + " mN m that cannot be disconnected");
        }
        // stronger filament
        double ratio = worst.reachableSpeedRadPerS() / worst.allowableSpeedRadPerS();
        double neededXy = in.tensileXyPa() * ratio * ratio;
        r.add("a filament of at least " + Findings.mpa(neededXy) + " MPa printed-flat strength (now "
                + Findings.mpa(in.tensileXyPa()) + " MPa)");
        r.add("always run the rotor inside a containment housing");
        return String.join("; ", r);
    }

    private static double allowableAt(BurstInputs in, double strength, double diameterScale) {
        double min = Double.POSITIVE_INFINITY;
        for (SpinningPart p : in.parts()) {
            double burst = p.shapeAt(diameterScale).burstSpeedRadPerS(strength, in.densityKgPerM3(), in.poisson());
            min = Math.min(min, in.factor().allowableSpeedRadPerS(burst));
        }
        return min;
    }

    private static double rpm(double radPerS) {
        return radPerS * 60 / (2 * Math.PI);
    }
}
