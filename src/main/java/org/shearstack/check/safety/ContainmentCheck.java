package org.shearstack.check.safety;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.physics.containment.BoltedJoint;
import org.shearstack.physics.containment.CircularPlate;
import org.shearstack.physics.containment.ThinCylinder;
import org.shearstack.physics.stress.PrintedStrength;

/**
 * HOUSING-HOOP, COVER-PLATE, COVER-DEFLECTION and BOLT-LOAD at the full supply pressure. The housing ring is
 * printed axis-up: hoop stress lies in the layers, axial stress pulls them apart. Covers are printed flat
 * (bending in plane) and bounded by the clamped and simply supported plate cases.
 */
public final class ContainmentCheck {

    private ContainmentCheck() {
    }

    public static List<Finding> run(ContainmentInputs in) {
        List<Finding> out = new ArrayList<>();
        double p = in.gaugePressurePa();
        double xy = PrintedStrength.inPlanePa(in.tensileXyPa());
        double z = PrintedStrength.acrossLayersPa(in.tensileXyPa(), in.tensileZPa());
        String at = " at " + Findings.bar(p) + " bar(g) (full supply pressure: a blocked exhaust applies it)";

        // Housing ring: Lamé bore stress (exact for thick walls, equals p r/t for thin ones); axial p r/(2t).
        double a = in.chamberDiameterMm() / 2000;
        double b = a + in.housingWallMm() / 1000;
        double hoop = ThinCylinder.lameBoreHoopStressPa(p, a, b);
        double axial = p * a * a / (b * b - a * a);
        double hoopMargin = xy / (hoop * in.factor());
        double axialMargin = z / (axial * in.factor());
        boolean hoopGoverns = hoopMargin <= axialMargin;
        double margin = Math.min(hoopMargin, axialMargin);
        out.add(Findings.of("HOUSING-HOOP", Findings.grade(margin, 1, 1.25),
                "Housing ring" + at + ": hoop stress " + Findings.mpa(hoop) + " MPa against "
                        + Findings.mpa(xy) + " MPa in the layers, axial stress " + Findings.mpa(axial) + " MPa against "
                        + Findings.mpa(z) + " MPa across layers, with factor " + Findings.num(in.factor(), 3)
                        + " on stress (margin = strength/(factor × stress)).",
                hoopGoverns ? mpa(hoop) : mpa(axial), hoopGoverns ? mpa(xy / in.factor()) : mpa(z / in.factor()),
                "MPa", margin, "housing-ring", "chamber wall",
                margin < 1 ? "thicken the housing wall to at least " + Findings.num(wallFor(in, p, xy, z), 3)
                        + " mm or lower the supply pressure" : ""));

        // Covers: simply supported is the upper bound on stress, clamped the lower.
        double r = in.coverSpanDiameterMm() / 2000;
        double t = in.coverThicknessMm() / 1000;
        double ss = CircularPlate.simplySupportedMaxStressPa(p, r, t, in.poisson());
        double cl = CircularPlate.clampedMaxStressPa(p, r, t);
        double ssMargin = xy / (ss * in.factor());
        double clMargin = xy / (cl * in.factor());
        Severity coverSev = clMargin < 1 ? Severity.FAIL : (ssMargin < 1 ? Severity.CAUTION : Severity.OK);
        double tNeeded = in.coverThicknessMm() * Math.sqrt(1 / ssMargin);
        out.add(Findings.of("COVER-PLATE", coverSev,
                "Cover plate" + at + ": bending stress " + Findings.mpa(cl) + " MPa clamped to " + Findings.mpa(ss)
                        + " MPa simply supported (Timoshenko & Woinowsky-Krieger uniform load), allowed "
                        + Findings.mpa(xy / in.factor()) + " MPa.",
                mpa(ss), mpa(xy / in.factor()), "MPa", ssMargin, "cover-free, cover-drive", "cover plate",
                coverSev == Severity.OK ? "" : "make the covers at least " + Findings.num(tNeeded, 3)
                        + " mm thick or add ribs"));

        double wSs = CircularPlate.simplySupportedCentreDeflectionM(p, r, t, in.modulusPa(), in.poisson()) * 1000;
        double wCl = CircularPlate.clampedCentreDeflectionM(p, r, t, in.modulusPa(), in.poisson()) * 1000;
        boolean large = !CircularPlate.smallDeflection(wSs / 1000, t);
        boolean beyondPlay = !Double.isNaN(in.endPlayMinMm()) && wSs > in.endPlayMinMm();
        Severity defSev = large || beyondPlay ? Severity.CAUTION : Severity.OK;
        out.add(Findings.of("COVER-DEFLECTION", defSev,
                "Cover centre deflection" + at + ": " + Findings.num(wCl, 3) + " mm clamped to " + Findings.num(wSs, 3)
                        + " mm simply supported" + (Double.isNaN(in.endPlayMinMm()) ? ""
                                : ", against the pack's smallest end play " + Findings.num(in.endPlayMinMm(), 3) + " mm")
                        + (large ? "; beyond half the thickness, where plate theory stops holding" : "") + ".",
                wSs, Double.isNaN(in.endPlayMinMm()) ? t * 500 : in.endPlayMinMm(), "mm",
                (Double.isNaN(in.endPlayMinMm()) ? t * 500 : in.endPlayMinMm()) / wSs, "cover-free, cover-drive", "cover plate",
                defSev == Severity.OK ? "" : "stiffen the covers (thicker or ribbed) so the bearing seats stay put"));

        // Screws.
        double force = BoltedJoint.separatingForceN(p, in.sealDiameterMm() / 1000);
        double perScrew = BoltedJoint.loadPerScrewN(force, in.screwCount(), in.seatingLoadPerScrewN());
        double screw = BoltedJoint.screwProofLoadN(in.screwDiameterMm(), in.screwPitchMm(),
                BoltedJoint.PROOF_STRESS_CLASS_8_8_PA);
        double boss = BoltedJoint.printedBossPullOutN(in.anchorOuterDiameterMm(), in.anchorLengthMm(), z);
        double capacity = Math.min(screw, boss);
        double boltMargin = capacity / (perScrew * in.factor());
        int screwsNeeded = (int) Math.ceil(force * in.factor() / Math.max(1e-9, capacity - in.seatingLoadPerScrewN()
                * in.factor()));
        out.add(Findings.of("BOLT-LOAD", Findings.grade(boltMargin, 1, 1.25),
                "Each of " + in.screwCount() + " cover screws carries " + Findings.num(perScrew, 3) + " N" + at
                        + " (separating force " + Findings.num(force, 4) + " N on the seal diameter); the screw holds "
                        + Findings.num(screw, 3) + " N (class 8.8 proof load), the printed boss about "
                        + Findings.num(boss, 3) + " N (shear across layers, engineering estimate).",
                perScrew, capacity / in.factor(), "N", boltMargin, "cover-free, cover-drive", "cover screws",
                boltMargin < 1 ? "use at least " + screwsNeeded + " screws, longer inserts, or lower the pressure" : ""));
        return out;
    }

    private static double wallFor(ContainmentInputs in, double p, double xy, double z) {
        double a = in.chamberDiameterMm() / 2;
        double w = in.housingWallMm();
        for (int i = 0; i < 400; i++) {
            double b = a + w;
            double hoop = p * (b * b + a * a) / (b * b - a * a);
            double axial = p * a * a / (b * b - a * a);
            if (hoop * in.factor() <= xy && axial * in.factor() <= z) {
                return w;
            }
            w *= 1.05;
        }
        return Double.POSITIVE_INFINITY;
    }

    private static double mpa(double pa) {
        return pa / 1e6;
    }
}
