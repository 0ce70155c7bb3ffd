package org.shearstack.check.safety;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.physics.dynamics.Balance;
import org.shearstack.physics.dynamics.CriticalSpeed;

/**
 * CRITICAL-SPEED and UNBALANCE. The first critical speed comes from Dunkerley's combination of the shaft alone
 * (uniform shaft between simple supports) and the disc pack alone (a mass on a massless shaft, stiffness from
 * the beam tables); Dunkerley is a lower bound, so the check errs on the safe side. A rigid rotor should run
 * below about 70–80 % of its first critical (common practice); here a margin ω_c/ω below 1/0.8 = 1.25 is
 * a CAUTION at runaway and a FAIL at the operating speed.
 */
public final class RotorDynamicsCheck {

    /** ω_critical/ω below which the speed is too close to the critical (common practice: run below 80 %). */
    public static final double CRITICAL_MARGIN = 1.25;

    private RotorDynamicsCheck() {
    }

    /**
     * @param shaftDiameterMm      shaft diameter between the bearings
     * @param shaftModulusPa       shaft elastic modulus
     * @param shaftDensityKgPerM3  shaft density
     * @param bearingSpanMm        distance between the bearing centres
     * @param packOffsetMm         distance of the pack's centre of mass from the nearer bearing (span/2 when centred;
     *                             a negative value means overhung that far outside the bearings)
     * @param packMassKg           mass of the disc pack with hub and spacers
     * @param operatingSpeedRadPerS design operating speed (NaN when unknown)
     * @param runawaySpeedRadPerS  runaway speed
     * @param balanceGrade         ISO 21940-11 grade, e.g. "G6.3"
     * @param positionalToleranceMm printer positional tolerance (mass-centre offset of one printed part)
     * @param boreClearanceMm      largest clearance of the disc bores on the hub (diameter)
     * @param partCount            number of separately printed spinning parts
     */
    public record Inputs(double shaftDiameterMm, double shaftModulusPa, double shaftDensityKgPerM3,
            double bearingSpanMm, double packOffsetMm, double packMassKg, double operatingSpeedRadPerS,
            double runawaySpeedRadPerS, String balanceGrade, double positionalToleranceMm, double boreClearanceMm,
            int partCount) {
    }

    /** The first critical speed by Dunkerley (shaft alone + pack alone), rad/s. */
    public static double firstCriticalRadPerS(Inputs in) {
        double d = in.shaftDiameterMm() / 1000;
        double span = in.bearingSpanMm() / 1000;
        double i = CriticalSpeed.roundShaftSecondMomentM4(d);
        double k = in.packOffsetMm() < 0
                ? CriticalSpeed.overhungStiffnessNPerM(in.shaftModulusPa(), i, -in.packOffsetMm() / 1000)
                : CriticalSpeed.simplySupportedStiffnessNPerM(in.shaftModulusPa(), i, span, in.packOffsetMm() / 1000);
        double pack = CriticalSpeed.singleMassRadPerS(k, in.packMassKg());
        double shaft = CriticalSpeed.uniformShaftSimplySupportedRadPerS(in.shaftModulusPa(), d, span,
                in.shaftDensityKgPerM3());
        return CriticalSpeed.dunkerleyRadPerS(shaft, pack);
    }

    public static List<Finding> run(Inputs in) {
        List<Finding> out = new ArrayList<>();
        double wc = firstCriticalRadPerS(in);
        double run = in.runawaySpeedRadPerS();
        double op = in.operatingSpeedRadPerS();
        double mRun = wc / run;
        double mOp = Double.isNaN(op) ? Double.POSITIVE_INFINITY : wc / op;
        Severity sev = mOp < CRITICAL_MARGIN ? Severity.FAIL : (mRun < CRITICAL_MARGIN ? Severity.CAUTION : Severity.OK);
        out.add(Findings.of("CRITICAL-SPEED", sev,
                "First critical speed about " + Findings.rpm(wc) + " rpm (Dunkerley lower bound: shaft "
                        + Findings.num(in.shaftDiameterMm(), 3) + " mm over " + Findings.num(in.bearingSpanMm(), 3)
                        + " mm with a " + Findings.num(in.packMassKg() * 1000, 3) + " g pack); operating "
                        + (Double.isNaN(op) ? "unknown" : Findings.rpm(op) + " rpm") + ", runaway " + Findings.rpm(run)
                        + " rpm; keep speeds below " + Findings.num(100 / CRITICAL_MARGIN, 2)
                        + " % of the critical (common practice).",
                rpm(Double.isNaN(op) ? run : Math.max(op, run)), rpm(wc / CRITICAL_MARGIN), "rpm",
                Math.min(mOp, mRun) / CRITICAL_MARGIN, "", "shaft between bearings",
                sev == Severity.OK ? "" : "a thicker or metal shaft, a shorter bearing span, or a lighter pack"));

        double grade = Balance.parseGradeMmPerS(in.balanceGrade());
        double speed = Double.isNaN(op) ? run : op;
        double ePer = Balance.permissibleEccentricityMicrometres(grade, speed);
        double ePrinted = Balance.printedEccentricityMicrometres(in.positionalToleranceMm(), in.boreClearanceMm(),
                in.partCount(), false);
        double gPrinted = Balance.equivalentGradeMmPerS(ePrinted, speed);
        double uPer = Balance.permissibleUnbalanceGramMm(grade, speed, in.packMassKg());
        Severity bSev = ePrinted > ePer ? Severity.CAUTION : Severity.OK;
        out.add(Findings.of("UNBALANCE", bSev,
                "ISO 21940-11 " + in.balanceGrade() + " at " + Findings.rpm(speed) + " rpm allows e_per "
                        + Findings.num(ePer, 3) + " µm (U_per " + Findings.num(uPer, 3) + " g mm for "
                        + Findings.num(in.packMassKg() * 1000, 3) + " g); the printer's positional tolerance and the bore"
                        + " clearance imply about " + Findings.num(ePrinted, 3) + " µm (RSS over " + in.partCount()
                        + " parts), i.e. grade G" + Findings.num(gPrinted, 3) + ".",
                ePrinted, ePer, "µm", ePer / ePrinted, "rotor-disc, spacer, hub-sleeve", "mass-centre offset",
                bSev == Severity.OK ? "" : "balance the assembled rotor in place (static balancing on knife edges at"
                        + " least), run slower, or ream the disc bores to a tight fit on the hub"));
        return out;
    }

    private static double rpm(double radPerS) {
        return radPerS * 60 / (2 * Math.PI);
    }
}
