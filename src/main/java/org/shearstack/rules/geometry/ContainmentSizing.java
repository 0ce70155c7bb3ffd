package org.shearstack.rules.geometry;

import java.util.List;
import org.shearstack.physics.containment.BoltedJoint;
import org.shearstack.physics.containment.CircularPlate;
import org.shearstack.physics.stress.PrintedStrength;
import org.shearstack.profile.Fastener;
import org.shearstack.rules.Key;
import org.shearstack.rules.ProfileKeys;
import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.SpecKeys;

/**
 * Sizes the pressure-holding features so the containment checks (COVER-PLATE, COVER-DEFLECTION, BOLT-LOAD) pass
 * by construction at the full supply pressure (a blocked exhaust applies it, physics.md §5). The formulas are the
 * ones the checks use ({@link CircularPlate}, {@link BoltedJoint}, {@link PrintedStrength}), inverted here through
 * their scaling (plate stress ∝ 1/t², deflection ∝ 1/t³; load per screw ∝ 1/n), not written again. Same
 * conventions as the checks: the cover spans the bolt circle, the seal acts at the groove's outer edge, the
 * screws share the separating force equally, and the stated safety factor applies to stress and load.
 */
final class ContainmentSizing {

    /** The keys the sizing reads besides the geometry: pressure, filament and safety factor. */
    static final List<Key> LOAD_KEYS = List.of(SpecKeys.SUPPLY_PRESSURE, SpecKeys.SUPPLY_AMBIENT,
            SpecKeys.TARGETS_SAFETY_FACTOR, ProfileKeys.TENSILE_STRENGTH_XY, ProfileKeys.TENSILE_STRENGTH_Z,
            ProfileKeys.ELASTIC_MODULUS, ProfileKeys.POISSON_RATIO);

    static final String PLATE_SOURCE = "Timoshenko & Woinowsky-Krieger, Theory of Plates and Shells §15–16; Roark,"
            + " flat circular plates under uniform load (physics.md §5); printed strength physics.md §4.3";
    static final String BOLT_SOURCE = "physics.md §5 (lid separating force p·πG²/4, ASME VIII Div. 1 App. 2 form);"
            + " ISO 898-1 class 8.8 proof stress (from memory); printed boss pull-out: engineering estimate";

    /** Used when the spec has no safety factor: the spec's own default (SpecSchema, targets.safety-factor). */
    static final double DEFAULT_SAFETY_FACTOR = 3;
    private static final double STANDARD_ATMOSPHERE_PA = 101_325;

    private ContainmentSizing() {
    }

    /** Gauge supply pressure, Pa; 0 when the spec has none. */
    static double gaugePa(RuleInputs in) {
        if (!in.has(SpecKeys.SUPPLY_PRESSURE)) {
            return 0;
        }
        double ambient = in.has(SpecKeys.SUPPLY_AMBIENT) ? in.get(SpecKeys.SUPPLY_AMBIENT) : STANDARD_ATMOSPHERE_PA;
        return Math.max(0, in.get(SpecKeys.SUPPLY_PRESSURE) - ambient);
    }

    static double factor(RuleInputs in) {
        return in.has(SpecKeys.TARGETS_SAFETY_FACTOR) ? in.get(SpecKeys.TARGETS_SAFETY_FACTOR) : DEFAULT_SAFETY_FACTOR;
    }

    /** True when the pressure and the filament are known, so the sizing applies. */
    static boolean applies(RuleInputs in) {
        return gaugePa(in) > 0 && in.has(ProfileKeys.TENSILE_STRENGTH_XY) && in.has(ProfileKeys.POISSON_RATIO)
                && in.has(ProfileKeys.ELASTIC_MODULUS);
    }

    /**
     * The cover thickness (mm, not yet in whole layers) at which a plate spanning {@code spanDiameterMm} under
     * the full supply pressure keeps, simply supported (the upper bound on stress): bending stress × factor within
     * the in-plane printed strength; centre deflection within {@code endPlayMm} (NaN: not bounded) and within half
     * the thickness (the small-deflection limit).
     */
    static double coverThicknessMm(RuleInputs in, double spanDiameterMm, double endPlayMm) {
        double q = gaugePa(in);
        double a = spanDiameterMm / 2000;
        double nu = in.get(ProfileKeys.POISSON_RATIO);
        double e = in.get(ProfileKeys.ELASTIC_MODULUS);
        double allowed = PrintedStrength.inPlanePa(in.get(ProfileKeys.TENSILE_STRENGTH_XY)) / factor(in);
        // at t = 1 m; stress scales as 1/t², deflection as 1/t³
        double stress1 = CircularPlate.simplySupportedMaxStressPa(q, a, 1.0, nu);
        double deflection1 = CircularPlate.simplySupportedCentreDeflectionM(q, a, 1.0, e, nu);
        double tStress = Math.sqrt(stress1 / allowed);
        double tSmall = Math.pow(2 * deflection1, 0.25);
        double tPlay = endPlayMm > 0 ? Math.cbrt(deflection1 / (endPlayMm / 1000)) : 0;
        return 1000 * Math.max(tStress, Math.max(tSmall, tPlay));
    }

    /**
     * What one screw may carry (N) after the safety factor: the lesser of the screw's proof load and the printed
     * boss's pull-out over the anchor depth (the screw alone when the anchor has no depth of its own).
     */
    static double allowablePerScrewN(RuleInputs in, Fastener f, double anchorHoleMm, double anchorDepthMm) {
        double screw = BoltedJoint.screwProofLoadN(f.nominalMm(), f.pitchMm(), BoltedJoint.PROOF_STRESS_CLASS_8_8_PA);
        double capacity = screw;
        if (anchorDepthMm > 0) {
            double z = PrintedStrength.acrossLayersPa(in.get(ProfileKeys.TENSILE_STRENGTH_XY),
                    in.has(ProfileKeys.TENSILE_STRENGTH_Z) ? in.get(ProfileKeys.TENSILE_STRENGTH_Z) : Double.NaN);
            capacity = Math.min(screw, BoltedJoint.printedBossPullOutN(anchorHoleMm, anchorDepthMm, z));
        }
        return capacity / factor(in);
    }

    /** Screws needed so each carries at most {@code allowablePerScrewN} of the separating force on the seal. */
    static int screwsForLoad(RuleInputs in, double sealDiameterMm, double allowablePerScrewN) {
        double force = BoltedJoint.separatingForceN(gaugePa(in), sealDiameterMm / 1000);
        int n = 1;
        while (BoltedJoint.loadPerScrewN(force, n, 0) > allowablePerScrewN && n < 1000) {
            n++;
        }
        return n;
    }

    /** Separating force (N) on the seal at full supply pressure, for the derivation text. */
    static double separatingForceN(RuleInputs in, double sealDiameterMm) {
        return BoltedJoint.separatingForceN(gaugePa(in), sealDiameterMm / 1000);
    }
}
