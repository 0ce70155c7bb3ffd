package org.shearstack.check.flow;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.physics.rotor.OperatingPoint;
import org.shearstack.physics.rotor.PerformanceMap;
import org.shearstack.physics.rotor.TurbineModel;
import org.shearstack.physics.rotor.Validity;
import org.shearstack.physics.supply.ReferenceAtmosphere;

/**
 * Findings about the flow model's answers (codes FLOW-...): points outside the gap-averaged model's validity
 * range, transonic gap entry, exhaust port Mach, icing of the jet, a pack that wastes most of the jet on disc
 * rims, a supply the compressor cannot sustain, and the runaway band safety uses.
 */
public final class FlowChecks {

    /** Admission fraction below which most of a slot jet strikes disc rims (physics.md §1.5, derived). */
    static final double LOW_ADMISSION = 0.3;
    /** Exhaust port Mach number above which port losses and back pressure grow (physics.md §3.7). */
    static final double PORT_MACH_LIMIT = 0.3;
    private static final String PACK = "disc pack";

    private FlowChecks() {
    }

    /**
     * @param model                       the design's model
     * @param map                         its map with the band
     * @param compressorDeliveryM3PerS    the compressor's free-air delivery when the spec gives one
     */
    public static List<Finding> check(TurbineModel model, PerformanceMap map, OptionalDouble compressorDeliveryM3PerS) {
        List<Finding> out = new ArrayList<>();
        List<OperatingPoint> pts = map.points();
        double maxRe = 0;
        double maxMach = 0;
        double maxPortMach = 0;
        double minJetT = Double.POSITIVE_INFINITY;
        int turbulent = 0;
        int choked = 0;
        for (OperatingPoint p : pts) {
            Validity v = p.validity();
            maxRe = Math.max(maxRe, Math.max(v.gapReynolds(), v.throughFlowReynolds()));
            maxMach = Math.max(maxMach, v.relativeMach());
            maxPortMach = Math.max(maxPortMach, p.exhaustMach());
            if (p.flowing()) {
                minJetT = Math.min(minJetT, p.jetStaticTemperatureK());
            }
            turbulent += v.laminar() ? 0 : 1;
            choked += v.marchCompleted() ? 0 : 1;
        }
        double fraction = pts.isEmpty() ? 0 : (double) turbulent / pts.size();
        out.add(Findings.of("FLOW-GAP-REYNOLDS", turbulent == 0 ? Severity.OK : Severity.CAUTION,
                turbulent == 0 ? "The gap flow stays laminar over the whole map."
                        : String.format(Locale.ROOT, "%.0f %% of the map has gap Reynolds numbers above %.0f (up to %s):"
                                + " the laminar gap model does not hold there and a blended turbulent friction law"
                                + " carries those points, so treat them with more doubt.", 100 * fraction,
                                Validity.LAMINAR_REYNOLDS_LIMIT, Findings.num(maxRe, 3)),
                maxRe, Validity.LAMINAR_REYNOLDS_LIMIT, "", Validity.LAMINAR_REYNOLDS_LIMIT / Math.max(maxRe, 1e-9),
                "", PACK, turbulent == 0 ? "" : "narrower gaps or less flow per gap (more discs) lower it"));
        out.add(Findings.of("FLOW-RELATIVE-MACH", maxMach < Validity.RELATIVE_MACH_LIMIT ? Severity.OK
                : Severity.CAUTION, String.format(Locale.ROOT, "Largest relative Mach number in the gaps %s%s.",
                Findings.num(maxMach, 3), maxMach < Validity.RELATIVE_MACH_LIMIT ? ""
                        : ": the jet enters the gaps transonic, where the one-dimensional gap model is rough"),
                maxMach, Validity.RELATIVE_MACH_LIMIT, "", Validity.RELATIVE_MACH_LIMIT / Math.max(maxMach, 1e-9), "",
                PACK, maxMach < Validity.RELATIVE_MACH_LIMIT ? "" : "a lower supply pressure or a faster rim"));
        if (choked > 0) {
            out.add(Findings.of("FLOW-GAP-CHOKED", Severity.CAUTION, choked + " map points could not pass their flow"
                    + " through the gaps (the gap march choked); their torque is set to the drag alone.", choked, 0,
                    "points", Double.NaN, "", PACK, "wider gaps, more discs or a larger exhaust radius"));
        }
        out.add(Findings.of("FLOW-EXHAUST-MACH", maxPortMach <= PORT_MACH_LIMIT ? Severity.OK : Severity.CAUTION,
                String.format(Locale.ROOT, "Exhaust ports run at Mach %s at most.", Findings.num(maxPortMach, 2)),
                maxPortMach, PORT_MACH_LIMIT, "", PORT_MACH_LIMIT / Math.max(maxPortMach, 1e-9), "", "exhaust ports",
                maxPortMach <= PORT_MACH_LIMIT ? "" : "more or larger exhaust ports"));
        if (minJetT < 273.15) {
            out.add(Findings.of("FLOW-JET-ICING", Severity.CAUTION, String.format(Locale.ROOT,
                    "The jet's static temperature falls to %.0f °C: moisture in shop air can condense or freeze in the"
                            + " nozzle and on the discs.", minJetT - 273.15), minJetT - 273.15, 0, "degC", Double.NaN,
                    "", "nozzle", "dry the air (refrigerant dryer or a water trap) and watch for ice"));
        }
        double phi = model.geometry().admissionFraction();
        out.add(Findings.of("FLOW-ADMISSION", phi >= LOW_ADMISSION ? Severity.OK : Severity.CAUTION,
                String.format(Locale.ROOT, "%.0f %% of the slot jet faces gaps; the rest strikes disc rims and does"
                        + " little work.", 100 * phi), phi, LOW_ADMISSION, "", phi / LOW_ADMISSION, "", "nozzle",
                phi >= LOW_ADMISSION ? "" : "thinner discs or wider gaps raise the fraction"));
        if (map.stallTorqueNm() <= 0) {
            out.add(Findings.of("FLOW-NO-START", Severity.FAIL, "The predicted stall torque is not positive: the"
                    + " rotor would not start against its own drag.", map.stallTorqueNm(), 0, "N*m", Double.NaN, "",
                    PACK, "a higher supply pressure, a larger throat or fewer sealed bearings"));
        }
        out.add(Findings.of("FLOW-RUNAWAY-BAND", Severity.OK, String.format(Locale.ROOT,
                "Runaway speed estimate %s rpm, band %s–%s rpm (pessimistic to optimistic readings); safety checks use"
                        + " the upper edge.", Findings.rpm(map.runawaySpeedRadPerS()),
                Findings.rpm(map.pessimistic().runawaySpeedRadPerS()), Findings.rpm(map.runawayUpperBoundRadPerS())),
                map.runawayUpperBoundRadPerS() * 30 / Math.PI, Double.NaN, "rpm", Double.NaN, "", PACK, ""));
        if (compressorDeliveryM3PerS.isPresent()) {
            double need = map.estimate().peakPower().massFlowKgPerS();
            double have = ReferenceAtmosphere.massFlowKgPerS(compressorDeliveryM3PerS.getAsDouble());
            out.add(Findings.of("FLOW-COMPRESSOR", need <= have ? Severity.OK : Severity.CAUTION,
                    String.format(Locale.ROOT, "At best power the turbine uses %.0f L/min of free air; the compressor"
                            + " delivers %.0f L/min%s.", ReferenceAtmosphere.freeAirFlowM3PerS(need) * 60_000,
                            compressorDeliveryM3PerS.getAsDouble() * 60_000,
                            need <= have ? "" : ", so the turbine runs down the tank and then slows"),
                    need, have, "kg/s", have / need, "", "supply",
                    need <= have ? "" : "a smaller throat, or accept runs limited by the tank"));
        }
        return List.copyOf(out);
    }
}
