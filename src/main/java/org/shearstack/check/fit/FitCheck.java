package org.shearstack.check.fit;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.physics.bearing.RingTolerance;
import org.shearstack.physics.fit.Fasteners;
import org.shearstack.physics.fit.Fit;
import org.shearstack.physics.fit.Iso286;
import org.shearstack.physics.fit.PrintProcess;
import org.shearstack.physics.fit.PrintedSeat;
import org.shearstack.physics.fit.SizeRange;
import org.shearstack.physics.fit.ToleranceZone;

/**
 * FIT-* checks: bearing seats and journals (ISO 286 class as the intent on metal, a printed interference allowance
 * on printed seats, normal-class ring tolerances), screw clearance holes (ISO 273), insert pilots, nut pockets
 * and disc bores on the hub. Printed sizes come from the printer's compensation and scatter.
 */
public final class FitCheck {

    /** Printed press fits beyond this interference (diameter) risk cracking the seat: 0.15 mm (judgement). */
    public static final double MAX_PRINTED_INTERFERENCE_MM = 0.15;
    /** Printed seats looser than this let the ring creep: 0.05 mm clearance (judgement). */
    public static final double MAX_SEAT_CLEARANCE_MM = 0.05;
    /** Disc bores looser than this on the hub spoil the balance: 0.3 mm (judgement). */
    public static final double MAX_DISC_BORE_CLEARANCE_MM = 0.3;

    private FitCheck() {
    }

    /**
     * @param bearing            bearing designation
     * @param boreMm             bearing bore
     * @param outsideDiameterMm  bearing outside diameter
     * @param housingClass       ISO 286 intent for a metal housing, e.g. "H7" or "J7"
     * @param seatInterferenceMm intended mean interference of the printed seat (negative for clearance)
     * @param metalShaftClass    ISO 286 class of a metal shaft ("k5", "js5"), or null for a printed journal
     * @param journalInterferenceMm intended mean interference of a printed journal
     * @param process            the printer's compensation and scatter
     * @param screw              screw size ("M3")
     * @param anchor             "heat-set", "nut" or "tapped"
     * @param hubDiameterMm      hub (disc seat) diameter, NaN when discs are integral
     * @param discBoreClearanceMm intended disc-bore clearance on the hub (diameter)
     */
    public record Inputs(String bearing, double boreMm, double outsideDiameterMm, String housingClass,
            double seatInterferenceMm, String metalShaftClass, double journalInterferenceMm, PrintProcess process,
            String screw, String anchor, double hubDiameterMm, double discBoreClearanceMm) {
    }

    public static List<Finding> run(Inputs in) {
        List<Finding> out = new ArrayList<>();
        ToleranceZone od = RingTolerance.outsideZone(in.outsideDiameterMm());
        ToleranceZone bore = RingTolerance.boreZone(in.boreMm());
        PrintProcess pp = in.process();

        Fit metalHousing = Fit.between(Iso286.zone(in.outsideDiameterMm(), in.housingClass()), od);
        PrintedSeat seat = PrintedSeat.hole(od, in.seatInterferenceMm(), pp);
        out.add(seatFinding("FIT-BEARING-SEAT", in.bearing() + " outer ring in the printed housing seat", "cover-free, cover-drive",
                seat, "a metal housing at " + Findings.num(in.outsideDiameterMm(), 4) + " " + in.housingClass()
                        + " would give " + range(metalHousing)));

        if (in.metalShaftClass() != null) {
            ToleranceZone shaft = Iso286.zone(in.boreMm(), in.metalShaftClass());
            Fit f = Fit.between(bore, shaft);
            out.add(Findings.of("FIT-BEARING-JOURNAL", Severity.OK,
                    in.bearing() + " bore on a metal shaft " + Findings.num(in.boreMm(), 4) + " " + in.metalShaftClass()
                            + " (" + shaft.toString() + "): " + range(f) + ", " + kind(f) + " (ISO 286 and normal-class"
                            + " ring tolerances).",
                    -f.minClearanceMm(), Double.NaN, "mm", Double.NaN, "bearing-" + in.bearing(), "bearing journal", ""));
        } else {
            PrintedSeat journal = PrintedSeat.shaft(bore, in.journalInterferenceMm(), pp);
            out.add(seatFinding("FIT-BEARING-JOURNAL", in.bearing() + " bore on the printed journal", "hub", journal,
                    "printed journals are weak; a metal shaft is better"));
        }

        // Screw clearance hole, ISO 273 medium.
        double nominal = Double.parseDouble(in.screw().substring(1));
        double hole = Fasteners.clearanceHoleMm(in.screw(), Fasteners.Series.MEDIUM);
        double holeCad = pp.cadHoleMm(hole);
        SizeRange holePrinted = pp.printedHole(holeCad);
        Severity hSev = holePrinted.minMm() < nominal ? Severity.FAIL
                : (holePrinted.minMm() < Fasteners.clearanceHoleMm(in.screw(), Fasteners.Series.FINE) ? Severity.CAUTION
                        : Severity.OK);
        out.add(Findings.of("FIT-SCREW-HOLE", hSev,
                in.screw() + " clearance hole: ISO 273 medium " + Findings.num(hole, 3) + " mm, modelled "
                        + Findings.num(holeCad, 4) + " mm, prints " + range(holePrinted) + ".",
                holePrinted.minMm(), nominal, "mm", holePrinted.minMm() / nominal, "", "screw clearance holes",
                hSev == Severity.OK ? "" : "measure the printer's hole compensation and set printer-adjust"));

        switch (in.anchor()) {
            case "heat-set" -> {
                double pilot = Fasteners.insertPilotMm(in.screw());
                double cad = pp.cadHoleMm(pilot);
                SizeRange printed = pp.printedHole(cad);
                out.add(Findings.of("FIT-INSERT-PILOT", Severity.OK,
                        in.screw() + " heat-set insert pilot " + Findings.num(pilot, 3) + " mm (vendor charts, common"
                                + " practice): modelled " + Findings.num(cad, 4) + " mm, prints " + range(printed) + ".",
                        printed.meanMm(), pilot, "mm", Double.NaN, "", "insert pilots", ""));
            }
            case "nut" -> {
                double s = Fasteners.nutAcrossFlatsMaxMm(in.screw());
                double cad = Fasteners.nutPocketAcrossFlatsCadMm(in.screw(), 0.1, pp);
                SizeRange printed = pp.printedHole(cad);
                Severity nSev = printed.minMm() < s ? Severity.CAUTION : Severity.OK;
                out.add(Findings.of("FIT-NUT-POCKET", nSev,
                        in.screw() + " nut pocket: ISO 4032 s max " + Findings.num(s, 3) + " mm, modelled "
                                + Findings.num(cad, 4) + " mm across flats, prints " + range(printed) + ".",
                        printed.minMm(), s, "mm", printed.minMm() / s, "", "nut pockets",
                        nSev == Severity.OK ? "" : "the largest nuts may need pressing in; widen the pocket"));
            }
            default -> {
            }
        }

        if (!Double.isNaN(in.hubDiameterMm())) {
            double hubCad = pp.cadOuterMm(in.hubDiameterMm());
            double boreCad = pp.cadHoleMm(in.hubDiameterMm() + in.discBoreClearanceMm());
            Fit f = Fit.between(pp.printedHole(boreCad), pp.printedOuter(hubCad));
            Severity dSev = f.minClearanceMm() < -0.05 ? Severity.CAUTION
                    : (f.maxClearanceMm() > MAX_DISC_BORE_CLEARANCE_MM ? Severity.CAUTION : Severity.OK);
            out.add(Findings.of("FIT-DISC-BORE", dSev,
                    "Disc bores on the printed hub (" + Findings.num(in.hubDiameterMm(), 4) + " mm): " + range(f) + ".",
                    f.maxClearanceMm(), MAX_DISC_BORE_CLEARANCE_MM, "mm", MAX_DISC_BORE_CLEARANCE_MM / f.maxClearanceMm(),
                    "rotor-disc", "disc bore on hub", dSev == Severity.OK ? ""
                            : "calibrate hole and outer compensation, or ream the bores to size"));
        }
        return out;
    }

    private static Finding seatFinding(String code, String what, String part, PrintedSeat s, String note) {
        Fit f = s.fit();
        boolean tooTight = f.maxInterferenceMm() > MAX_PRINTED_INTERFERENCE_MM;
        boolean tooLoose = f.maxClearanceMm() > MAX_SEAT_CLEARANCE_MM;
        Severity sev = tooTight || tooLoose ? Severity.CAUTION : Severity.OK;
        String remedy = tooTight && tooLoose
                ? "the printer's scatter exceeds what a printed seat can take: calibrate, print a test ring, or ream"
                : tooTight ? "press carefully or warm the housing; ream if it will not go"
                        : tooLoose ? "secure the ring with a retaining compound" : "";
        return Findings.of(code, sev,
                what + ": model " + Findings.num(s.cadMm(), 5) + " mm; prints " + range(s.printed()) + " against "
                        + range(s.mating()) + " → " + range(f) + " (" + note + ").",
                f.maxInterferenceMm(), MAX_PRINTED_INTERFERENCE_MM, "mm",
                f.maxInterferenceMm() == 0 ? Double.NaN : MAX_PRINTED_INTERFERENCE_MM / f.maxInterferenceMm(), part,
                what, remedy);
    }

    static String range(SizeRange r) {
        return Findings.num(r.minMm(), 5) + "…" + Findings.num(r.maxMm(), 5) + " mm";
    }

    static String range(Fit f) {
        return "clearance " + String.format(java.util.Locale.ROOT, "%+.3f…%+.3f mm", f.minClearanceMm(),
                f.maxClearanceMm()) + " (negative = interference)";
    }

    private static String kind(Fit f) {
        return f.kind().name().toLowerCase(java.util.Locale.ROOT) + " fit";
    }
}
