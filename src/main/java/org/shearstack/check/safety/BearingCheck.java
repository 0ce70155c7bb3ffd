package org.shearstack.check.safety;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.physics.bearing.BearingSpeed;

/**
 * BEARING-DN: speed factor against common-practice grease limits (physics.md §7) at the operating and runaway
 * speeds. SEAT-TEMP: a caution when fast-running bearings sit in a filament that softens near bearing
 * temperatures (grease-lubricated bearings running near their speed limit commonly reach 50–70 °C, from memory).
 */
public final class BearingCheck {

    /** Bearing outer-ring temperature assumed near the grease speed limit, °C (from memory, judgement). */
    public static final double WARM_BEARING_C = 60;

    private BearingCheck() {
    }

    /**
     * @param designation           bearing name ("608")
     * @param boreMm                bore d
     * @param outsideDiameterMm     outside diameter D
     * @param closure               open, shielded or contact-sealed
     * @param operatingSpeedRadPerS operating speed (NaN when unknown)
     * @param runawaySpeedRadPerS   runaway speed
     * @param glassTransitionC      the filament's glass transition (or heat deflection) temperature, °C
     */
    public record Inputs(String designation, double boreMm, double outsideDiameterMm, BearingSpeed.Closure closure,
            double operatingSpeedRadPerS, double runawaySpeedRadPerS, double glassTransitionC) {
    }

    public static List<Finding> run(Inputs in) {
        List<Finding> out = new ArrayList<>();
        double limit = BearingSpeed.limitRpm(in.boreMm(), in.outsideDiameterMm(), in.closure());
        double general = BearingSpeed.generalGreaseRpm(in.boreMm(), in.outsideDiameterMm());
        double run = rpm(in.runawaySpeedRadPerS());
        double op = Double.isNaN(in.operatingSpeedRadPerS()) ? Double.NaN : rpm(in.operatingSpeedRadPerS());
        Severity sev = !Double.isNaN(op) && op > limit ? Severity.FAIL
                : (run > limit || (!Double.isNaN(op) && op > general) ? Severity.CAUTION : Severity.OK);
        double worst = Double.isNaN(op) ? run : Math.max(op, run);
        out.add(Findings.of("BEARING-DN", sev,
                in.designation() + " (" + Findings.num(in.boreMm(), 3) + " × " + Findings.num(in.outsideDiameterMm(), 3)
                        + " mm, " + in.closure().name().toLowerCase(java.util.Locale.ROOT).replace('_', '-')
                        + "): n·dm " + Findings.num(BearingSpeed.ndm(run, in.boreMm(), in.outsideDiameterMm()), 3)
                        + " at runaway" + (Double.isNaN(op) ? "" : ", "
                                + Findings.num(BearingSpeed.ndm(op, in.boreMm(), in.outsideDiameterMm()), 3)
                                + " at the operating speed")
                        + "; common-practice limit " + Findings.num(limit, 3) + " rpm for this bearing (n·dm 400 000"
                        + (in.closure() == BearingSpeed.Closure.CONTACT_SEALED ? ", contact seals dn 150 000" : "")
                        + "), ordinary grease to " + Findings.num(general, 3) + " rpm. Check the maker's limiting speed.",
                worst, limit, "rpm", limit / worst, "bearing-" + in.designation(), in.designation(),
                sev == Severity.OK ? "" : (in.closure() == BearingSpeed.Closure.CONTACT_SEALED
                        ? "use shielded (ZZ) bearings, high-speed grease, or limit the speed"
                        : "use high-speed grease or a smaller bearing, or limit the speed")));
        boolean warm = (!Double.isNaN(op) ? op : run) > general;
        Severity tSev = warm && in.glassTransitionC() < WARM_BEARING_C + 20 ? Severity.CAUTION : Severity.OK;
        out.add(Findings.of("SEAT-TEMP", tSev,
                "Printed bearing seats soften near the filament's glass transition (" + Findings.num(in.glassTransitionC(), 3)
                        + " °C); " + (warm ? "the bearings run above ordinary grease speeds and may reach about "
                                + Findings.num(WARM_BEARING_C, 2) + " °C (from memory)"
                                : "the bearings run within ordinary grease speeds") + ".",
                warm ? WARM_BEARING_C : Double.NaN, in.glassTransitionC(), "degC", Double.NaN, "cover-free, cover-drive",
                "bearing seats", tSev == Severity.OK ? "" : "print the seats in PETG, ASA or ABS, or use a metal"
                        + " bearing holder; run short tests and feel the housing"));
        return out;
    }

    private static double rpm(double radPerS) {
        return radPerS * 60 / (2 * Math.PI);
    }
}
