package org.shearstack.rules.sizing;

import org.shearstack.physics.GoldenSection;
import static org.shearstack.rules.SpecKeys.NOZZLE_JET_ANGLE;
import static org.shearstack.rules.SpecKeys.ROTOR_DIAMETER;
import static org.shearstack.rules.SpecKeys.ROTOR_DISCS;
import static org.shearstack.rules.SpecKeys.ROTOR_DISC_THICKNESS;
import static org.shearstack.rules.SpecKeys.ROTOR_EXHAUST_DIAMETER;
import static org.shearstack.rules.SpecKeys.ROTOR_GAP;
import static org.shearstack.rules.SpecKeys.TARGETS_OBJECTIVE;
import static org.shearstack.rules.SpecKeys.TARGETS_SAFETY_FACTOR;
import static org.shearstack.rules.SpecKeys.TARGETS_SPEED;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.TreeSet;
import org.shearstack.rules.FunctionRule;
import org.shearstack.rules.InputRejectedException;
import org.shearstack.rules.Key;
import org.shearstack.rules.ProfileKeys;
import org.shearstack.rules.Rule;
import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;
import org.shearstack.physics.stress.BurstAssessment;
import org.shearstack.physics.stress.PrintedStrength;
import org.shearstack.physics.stress.SafetyFactor;
import org.shearstack.physics.stress.SpinningAnnulus;
import org.shearstack.rules.geometry.GeoKeys;

/**
 * SIZE- rules for the disc pack, in the order a designer would fix them: rim speed, disc thickness, diameter,
 * gap, disc count, exhaust. Each reads the ones before it, so a value pinned in the spec is what the later
 * rules optimise around. The model-based ones score candidates with {@link SizingModel}.
 */
final class RotorSizing {

    /** Exhaust radius ratio used before the exhaust is sized (Krishnan et al. 2011: r₁/r₂ ≈ 0.47–0.51). */
    static final double FIRST_EXHAUST_RATIO = 0.45;
    /** Highest exhaust-port Mach number accepted (physics.md §3.7: below 0.3). */
    static final double MAX_PORT_MACH = 0.3;
    /** Smallest and largest exhaust radius ratio r₁/r₂ SIZE-EXHAUST tries (Krishnan et al. 2011 used 0.47–0.51). */
    static final double MIN_EXHAUST_RATIO = 0.30;
    static final double MAX_EXHAUST_RATIO = 0.60;
    /** Largest gap the optimiser tries, in Ekman thicknesses √(ν/Ω) (physics.md §3.8b: b/δ_E ≈ 2–4, from memory). */
    static final double MAX_GAP_EKMAN_RATIO = 4.0;

    private RotorSizing() {
    }

    private static List<Key> modelReads(Key... more) {
        List<Key> keys = new ArrayList<>(FlowParts.SUPPLY_READS);
        keys.addAll(FlowParts.NOZZLE_READS);
        keys.addAll(List.of(NOZZLE_JET_ANGLE, ProfileKeys.NOZZLE_DIAMETER, ProfileKeys.LINE_WIDTH, TARGETS_OBJECTIVE,
                TARGETS_SPEED, SizingKeys.ROTOR_TIP_SPEED, SizingKeys.NOZZLE_MASS_FLOW));
        keys.addAll(List.of(more));
        keys.addAll(SpecCalibration.KEYS);
        return keys;
    }

    static List<Rule> rules() {
        return List.of(
                FunctionRule.of("SIZE-TIP-SPEED-LIMIT", List.of(ProfileKeys.DENSITY, ProfileKeys.POISSON_RATIO,
                        ProfileKeys.TENSILE_STRENGTH_XY, TARGETS_SAFETY_FACTOR),
                        List.of(SizingKeys.ROTOR_TIP_SPEED_LIMIT), RotorSizing::tipLimit),
                FunctionRule.of("SIZE-TIP-SPEED", List.of(SizingKeys.NOZZLE_JET_SPEED, NOZZLE_JET_ANGLE,
                        SizingKeys.ROTOR_TIP_SPEED_LIMIT), List.of(SizingKeys.ROTOR_TIP_SPEED), RotorSizing::tip),
                FunctionRule.of("SIZE-DISC-THICKNESS", List.of(GeoKeys.DISC_THICKNESS_PREFERRED,
                        GeoKeys.DISC_THICKNESS_MIN, ProfileKeys.LAYER_HEIGHT, ProfileKeys.NOZZLE_DIAMETER),
                        List.of(ROTOR_DISC_THICKNESS),
                        (in, out) -> out.put(ROTOR_DISC_THICKNESS,
                                printerLimit(in, GeoKeys.DISC_THICKNESS_PREFERRED, 1.875, 1),
                                "the printer's preferred disc thickness: thinner discs admit more of the jet into the"
                                        + " gaps (φ = N_g b/(N_g b + N_d t)) but printed discs much below it are"
                                        + " flimsy (minimum " + String.format(Locale.ROOT, "%.2f mm",
                                        printerLimit(in, GeoKeys.DISC_THICKNESS_MIN, 1.5, 3)) + ")",
                                "physics.md §1.5 (derived); common practice: 0.75 mm discs on a 0.4 mm nozzle")),
                FunctionRule.of("SIZE-DIAMETER", modelReads(ROTOR_DISC_THICKNESS, GeoKeys.GAP_PREFERRED,
                        ProfileKeys.BED_X, ProfileKeys.BED_Y, ProfileKeys.LAYER_HEIGHT), List.of(ROTOR_DIAMETER), RotorSizing::diameter),
                FunctionRule.of("SIZE-GAP", modelReads(ROTOR_DIAMETER, ROTOR_DISC_THICKNESS, GeoKeys.GAP_MIN,
                        GeoKeys.GAP_PREFERRED, ProfileKeys.LAYER_HEIGHT),
                        List.of(ROTOR_GAP, SizingKeys.GAP_AT_SEARCH_BOUND), RotorSizing::gap),
                FunctionRule.of("SIZE-DISCS", modelReads(ROTOR_DIAMETER, ROTOR_DISC_THICKNESS, ROTOR_GAP),
                        List.of(ROTOR_DISCS), RotorSizing::discs),
                FunctionRule.of("SIZE-EXHAUST", modelReads(ROTOR_DIAMETER, ROTOR_DISC_THICKNESS, ROTOR_GAP,
                        ROTOR_DISCS), List.of(ROTOR_EXHAUST_DIAMETER), RotorSizing::exhaust));
    }

    private static void tipLimit(RuleInputs in, RuleOutputs out) {
        double f = in.get(TARGETS_SAFETY_FACTOR);
        SafetyFactor factor;
        try {
            factor = new SafetyFactor(f);
        } catch (IllegalArgumentException e) {
            throw new InputRejectedException(TARGETS_SAFETY_FACTOR, "a safety factor on stress between "
                    + SafetyFactor.MIN + " and " + SafetyFactor.MAX, String.format(Locale.ROOT, "%.3g", f));
        }
        double xy = in.get(ProfileKeys.TENSILE_STRENGTH_XY);
        double v = BurstAssessment.allowableRimSpeedOfPortedDiscMPerS(MAX_EXHAUST_RATIO, in.get(ProfileKeys.DENSITY),
                in.get(ProfileKeys.POISSON_RATIO), xy, factor);
        out.put(SizingKeys.ROTOR_TIP_SPEED_LIMIT, v, String.format(Locale.ROOT,
                "allowable rim speed of a disc ported out to r₁/r₂ = %.2f (the largest exhaust SIZE-EXHAUST may"
                        + " choose, so the sized disc is allowed at least this): peak-stress burst speed of a holed"
                        + " disc × port allowance %.1f at the design strength %.1f MPa (%.1f × printed-flat strength),"
                        + " divided by √%.2g (factor on stress); the same computation as the BURST-RUNAWAY check. The"
                        + " design and operating speeds are kept at or below it.",
                MAX_EXHAUST_RATIO, SpinningAnnulus.EXHAUST_PORT_ALLOWANCE, PrintedStrength.inPlanePa(xy) / 1e6,
                PrintedStrength.IN_PLANE_PRINT_FACTOR, factor.onStress()),
                "Timoshenko & Goodier §32 holed rotating disc; physics.md §4.2–§4.3, §12.7 (BurstAssessment,"
                        + " SpinningAnnulus, PrintedStrength, SafetyFactor)");
    }

    private static void tip(RuleInputs in, RuleOutputs out) {
        double vTheta = in.get(SizingKeys.NOZZLE_JET_SPEED) * Math.cos(Math.toRadians(in.get(NOZZLE_JET_ANGLE)));
        double limit = in.get(SizingKeys.ROTOR_TIP_SPEED_LIMIT);
        double v = Math.min(0.5 * vTheta, 0.5 * limit);
        out.put(SizingKeys.ROTOR_TIP_SPEED, v, String.format(Locale.ROOT,
                "min(½ × tangential jet speed %.0f m/s, ½ × burst-limited tip speed %.0f m/s): best power comes near"
                        + " a tangential speed ratio of 2, and the runaway speed is roughly twice the best-power speed",
                vTheta, limit), "physics.md §3.5 table and §12.3 (derived)");
    }

    private static SizingModel model(RuleInputs in) {
        Values v = Values.of(in);
        OptionalDouble target = in.has(TARGETS_SPEED) ? OptionalDouble.of(in.get(TARGETS_SPEED))
                : OptionalDouble.empty();
        return new SizingModel(FlowParts.supply(v), FlowParts.nozzle(v), in.get(NOZZLE_JET_ANGLE),
                in.get(ProfileKeys.NOZZLE_DIAMETER), in.get(ProfileKeys.LINE_WIDTH),
                Objective.parse(in.text(TARGETS_OBJECTIVE)), target, in.get(SizingKeys.ROTOR_TIP_SPEED),
                SpecCalibration.calibration(v));
    }

    private static String objectiveWords(SizingModel m) {
        String what = (m.objective() == Objective.POWER ? "shaft power" : "efficiency")
                + (m.calibration().name().equals("calibrated") ? " (model with the CALIBRATED coefficients of the"
                        + " spec's calibration file)" : "");
        return m.targetSpeed().isPresent()
                ? what + String.format(Locale.ROOT, " at the target speed %.0f rpm", m.targetSpeed().getAsDouble() * 30
                / Math.PI)
                : what + String.format(Locale.ROOT, " at the best speed with the rim below %.0f m/s",
                m.tipSpeedCapMPerS());
    }

    private static void diameter(RuleInputs in, RuleOutputs out) {
        SizingModel m = model(in);
        double tip = in.get(SizingKeys.ROTOR_TIP_SPEED);
        if (m.targetSpeed().isPresent()) {
            double d = round(2000.0 * tip / m.targetSpeed().getAsDouble(), 0.5);
            out.put(ROTOR_DIAMETER, d, String.format(Locale.ROOT,
                    "2 × design rim speed %.0f m/s / target speed, rounded to 0.5 mm", tip), "kinematics (v = Ω r)");
            return;
        }
        double flow = in.get(SizingKeys.NOZZLE_MASS_FLOW);
        double gap = printerLimit(in, GeoKeys.GAP_PREFERRED, 1.875, 1);
        double t = in.get(ROTOR_DISC_THICKNESS);
        double dMax = Math.min(150.0, 0.6 * Math.min(in.get(ProfileKeys.BED_X), in.get(ProfileKeys.BED_Y)));
        double dMin = 30.0;
        java.util.function.DoubleUnaryOperator score = d -> {
            Trial trial = new Trial(d, FIRST_EXHAUST_RATIO * d, gap, t, 2);
            trial = trial.withDiscs(SizingModel.discsForFlow(flow, trial, maxDiscs(d, gap, t)));
            return m.score(trial).value();
        };
        double d = round(GoldenSection.maximize(score, dMin, dMax, 1.0), 0.5);
        out.put(ROTOR_DIAMETER, d, String.format(Locale.ROOT,
                "bounded optimiser (golden section, %.0f–%.0f mm) on %s; trial packs: gap %.2f mm, r₁/r₂ %.2f,"
                        + " discs from the flow per gap", dMin, dMax, objectiveWords(m), gap, FIRST_EXHAUST_RATIO),
                "coupled flow model (physics.md §3, derived); bed limit 60 % of the smaller bed side");
    }

    static int maxDiscs(double diameterMm, double gapMm, double thicknessMm) {
        // keep the pack no taller than half its diameter (printing and stiffness, common practice), at most 60 discs
        return (int) Math.max(3, Math.min(60, Math.floor((0.5 * diameterMm + gapMm) / (gapMm + thicknessMm))));
    }

    private static void gap(RuleInputs in, RuleOutputs out) {
        SizingModel m = model(in);
        double d = in.get(ROTOR_DIAMETER);
        double t = in.get(ROTOR_DISC_THICKNESS);
        double layer = in.get(ProfileKeys.LAYER_HEIGHT);
        double gMin = printerLimit(in, GeoKeys.GAP_MIN, 1.0, 2);
        double speed = m.targetSpeed().orElse(in.get(SizingKeys.ROTOR_TIP_SPEED) * 2000.0 / d);
        double ekman = SizingModel.ekmanMm(speed);
        double flow = in.get(SizingKeys.NOZZLE_MASS_FLOW);
        double preferred = printerLimit(in, GeoKeys.GAP_PREFERRED, 1.875, 1);
        // Upper bound: the larger of the printer's preferred gap (common practice: ~0.75 mm gaps on a 0.4 mm
        // nozzle) and b/δ_E = 4 (physics.md §3.8b, from memory), raised to whole layers. Beyond it the model's
        // score keeps rising only through the admission fraction φ = N_g b/(N_g b + N_d t), while the gap flow no
        // longer couples to the discs (b ≫ δ_E) and runs far outside the laminar range.
        double hi = Math.max(gMin, Math.ceil(Math.max(preferred, MAX_GAP_EKMAN_RATIO * ekman) / layer - 1e-9) * layer);
        TreeSet<Double> candidates = new TreeSet<>();
        int steps = 8;
        for (int i = 0; i <= steps; i++) {
            candidates.add(Math.min(hi, Math.max(gMin, Math.round((gMin + (hi - gMin) * i / steps) / layer) * layer)));
        }
        candidates.add(Math.min(hi, Math.max(gMin, Math.round(2.0 * ekman / layer) * layer)));
        double best = gMin;
        double bestValue = Double.NEGATIVE_INFINITY;
        for (double g : candidates) {
            Trial trial = new Trial(d, FIRST_EXHAUST_RATIO * d, g, t, 2);
            trial = trial.withDiscs(SizingModel.discsForFlow(flow, trial, maxDiscs(d, g, t)));
            double value = m.score(trial).value();
            if (value > bestValue) {
                bestValue = value;
                best = g;
            }
        }
        boolean atBound = best >= hi - 1e-9 && hi > gMin;
        out.put(SizingKeys.GAP_AT_SEARCH_BOUND, atBound ? 1.0 : 0.0, atBound
                ? "1: the model's best gap is the upper end of the search range (see rotor.gap)"
                : "0: the model's best gap lies inside the search range", "SIZE-GAP");
        out.put(ROTOR_GAP, best, String.format(Locale.ROOT,
                "start from the boundary-layer scale 2√(ν/Ω) = %.3f mm at %.0f rpm; model evaluated at %d gaps from the"
                        + " printer's minimum %.2f mm to %.2f mm in whole layers (the larger of the printer's preferred"
                        + " gap %.2f mm and 4 Ekman thicknesses %.3f mm; disc count from the flow per gap); best %s%s",
                2 * ekman, speed * 30 / Math.PI, candidates.size(), gMin, hi, preferred, MAX_GAP_EKMAN_RATIO * ekman,
                objectiveWords(m), atBound ? "; AT THE SEARCH BOUND: the model's score still rises with the gap"
                        + " because the admission fraction φ = N_g b/(N_g b + N_d t) grows, so the bound, not the"
                        + " model, sets this gap" : ""),
                "Ekman thickness (physics.md §3.4, §3.8b b/δ_E ≈ 2–4 from memory) and the coupled flow model"
                        + " (derived); printer minimum and preferred gap from GEO-DISC-LIMITS (common practice)");
    }

    private static void discs(RuleInputs in, RuleOutputs out) {
        SizingModel m = model(in);
        double d = in.get(ROTOR_DIAMETER);
        double g = in.get(ROTOR_GAP);
        double t = in.get(ROTOR_DISC_THICKNESS);
        int max = maxDiscs(d, g, t);
        Trial base = new Trial(d, FIRST_EXHAUST_RATIO * d, g, t, 2);
        int first = SizingModel.discsForFlow(in.get(SizingKeys.NOZZLE_MASS_FLOW), base, max);
        TreeSet<Integer> tried = new TreeSet<>();
        int best = first;
        double bestValue = Double.NEGATIVE_INFINITY;
        int[] coarse = {3, 4, 6, 8, 11, 15, 20, 27, 36, 48, 60, first};
        for (int n : coarse) {
            if (n <= max && tried.add(n)) {
                double value = m.score(base.withDiscs(n)).value();
                if (value > bestValue) {
                    bestValue = value;
                    best = n;
                }
            }
        }
        int centre = best;
        for (int n = Math.max(3, centre - 3); n <= Math.min(max, centre + 3); n++) {
            if (tried.add(n)) {
                double value = m.score(base.withDiscs(n)).value();
                if (value > bestValue) {
                    bestValue = value;
                    best = n;
                }
            }
        }
        out.put(ROTOR_DISCS, best, String.format(Locale.ROOT,
                "first guess %d from the flow per gap (slip-decay number Λ = 4), then the model over %d counts from 3"
                        + " to %d (pack no taller than half its diameter); best %s", first, tried.size(), max,
                objectiveWords(m)),
                "physics.md §3.3 and §3.8b (Λ ≥ 3, derived); coupled flow model");
    }

    private static void exhaust(RuleInputs in, RuleOutputs out) {
        if (in.get(ROTOR_DISCS) < 2) {
            throw new InputRejectedException(ROTOR_DISCS, "at least 2 discs",
                    String.format(Locale.ROOT, "%.0f", in.get(ROTOR_DISCS)));
        }
        SizingModel m = model(in);
        double d = in.get(ROTOR_DIAMETER);
        Trial base = new Trial(d, FIRST_EXHAUST_RATIO * d, in.get(ROTOR_GAP), in.get(ROTOR_DISC_THICKNESS),
                (int) Math.round(in.get(ROTOR_DISCS)));
        double best = FIRST_EXHAUST_RATIO;
        double bestValue = Double.NEGATIVE_INFINITY;
        for (double ratio = MIN_EXHAUST_RATIO; ratio <= MAX_EXHAUST_RATIO + 1e-4; ratio += 0.05) {
            SizingModel.Score s = m.score(base.withExhaustDiameter(ratio * d));
            if (s.point().exhaustMach() <= MAX_PORT_MACH && s.value() > bestValue) {
                bestValue = s.value();
                best = ratio;
            }
        }
        out.put(ROTOR_EXHAUST_DIAMETER, round(best * d, 0.5), String.format(Locale.ROOT,
                "r₁/r₂ = %.2f: the model over r₁/r₂ 0.30–0.60 with the port Mach number at most %.1f (ports %.0f %% of"
                        + " the disc area inside r₁); best %s", best, MAX_PORT_MACH,
                100 * SizingModel.PORT_AREA_FRACTION, objectiveWords(m)),
                "physics.md §3.7 (exhaust Mach < 0.3) and Krishnan et al. 2011 (r₁/r₂ ≈ 0.5); coupled flow model");
    }

    /**
     * A printer limit from GEO-DISC-LIMITS, or, when the geometry rules are not in the rule set, the same
     * formula: factor × printer nozzle diameter raised to whole layers (common practice, see GEO-DISC-LIMITS).
     */
    static double printerLimit(RuleInputs in, Key key, double nozzleFactor, int minLayers) {
        if (in.has(key)) {
            return in.get(key);
        }
        double layer = in.get(ProfileKeys.LAYER_HEIGHT);
        double v = Math.max(nozzleFactor * in.get(ProfileKeys.NOZZLE_DIAMETER), minLayers * layer);
        return Math.ceil(v / layer - 1e-9) * layer;
    }

    static double round(double value, double step) {
        return Math.round(value / step) * step;
    }
}
