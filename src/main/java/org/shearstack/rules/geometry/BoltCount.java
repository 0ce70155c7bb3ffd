package org.shearstack.rules.geometry;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.shearstack.profile.Fastener;
import org.shearstack.rules.Key;
import org.shearstack.rules.RuleInputs;

/**
 * The cover screws of GEO-HOUSING-LAYOUT: how many, and on what circle. The count is the larger of the pitch rule
 * (bolt circle circumference / (10 × screw diameter); from memory: flange bolts within about 10 diameters) and the
 * load rule (the separating force at the full supply pressure over the per-screw allowable load,
 * {@link ContainmentSizing}), at least four, even. The circle grows when that many bosses do not fit side by
 * side on it (chord between screws at least one boss diameter).
 *
 * @param count         screws per cover
 * @param radiusMm      bolt circle radius
 * @param pitchCount    what the pitch rule alone asks
 * @param loadCount     what the load rule alone asks (0 when it does not apply: no pressure or filament known)
 * @param forceN        separating force on the seal (NaN when the load rule does not apply)
 * @param allowableN    per-screw allowable load after the safety factor (NaN when the load rule does not apply)
 * @param grown         true when the circle was enlarged to fit the bosses
 */
record BoltCount(int count, double radiusMm, int pitchCount, int loadCount, double forceN, double allowableN,
        boolean grown) {

    static List<Key> withLoadKeys(List<Key> reads) {
        List<Key> r = new ArrayList<>(reads);
        r.add(GeoKeys.BOLT_ANCHOR_DEPTH);
        r.addAll(ContainmentSizing.LOAD_KEYS);
        return r;
    }

    /**
     * @param minRadiusMm       the smallest bolt circle the layout allows
     * @param bossRadiusMm      the boss around each screw
     * @param sealDiameterMm    where the pressure acts (an O-ring groove's outer edge), or NaN: up to the bolt circle
     * @param maxPitchDiameters largest pitch in screw diameters
     */
    static BoltCount of(RuleInputs in, Fastener f, double minRadiusMm, double bossRadiusMm, double sealDiameterMm,
            double maxPitchDiameters) {
        boolean load = ContainmentSizing.applies(in);
        double allowable = load ? ContainmentSizing.allowablePerScrewN(in, f, in.get(GeoKeys.BOLT_ANCHOR_HOLE),
                in.get(GeoKeys.BOLT_ANCHOR_DEPTH)) : Double.NaN;
        double rb = minRadiusMm;
        for (int pass = 0; pass < 20; pass++) {
            int pitch = (int) Math.ceil(2 * Math.PI * rb / (maxPitchDiameters * f.nominalMm()));
            double seal = Double.isNaN(sealDiameterMm) ? 2 * rb : sealDiameterMm;
            int byLoad = load ? ContainmentSizing.screwsForLoad(in, seal, allowable) : 0;
            int n = Math.max(4, Math.max(pitch, byLoad));
            n += n % 2;
            double fit = Quanta.upToMultiple(bossRadiusMm / Math.sin(Math.PI / n), 0.1);
            if (fit <= rb + Quanta.SNAP_TOLERANCE_MM) {
                return new BoltCount(n, rb, pitch, byLoad, load ? ContainmentSizing.separatingForceN(in, seal)
                        : Double.NaN, allowable, rb > minRadiusMm);
            }
            rb = fit;
        }
        throw new IllegalStateException("bolt circle did not settle from " + minRadiusMm + " mm");
    }

    String circleFormula() {
        return "2 × (seal outer edge + wall + largest hole or nut radius), up to 0.2 mm"
                + (grown ? "; enlarged so " + count + " bosses fit: radius ≥ boss radius / sin(180°/n)" : "");
    }

    String countFormula() {
        String pitch = "bolt circle circumference / (10 × screw diameter) = " + pitchCount;
        if (loadCount == 0) {
            return pitch + ", at least 4, even";
        }
        return String.format(Locale.ROOT, "max(%s, separating force p·πG²/4 = %.0f N at the full supply pressure /"
                + " per-screw allowable min(class 8.8 proof load, printed boss pull-out) / safety factor = %.0f N"
                + " → %d), at least 4, even", pitch, forceN, allowableN, loadCount);
    }

    String countSource() {
        return "from memory: flange bolt pitch within about 10 bolt diameters"
                + (loadCount == 0 ? "" : "; " + ContainmentSizing.BOLT_SOURCE);
    }
}
