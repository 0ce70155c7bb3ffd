package org.shearstack.rules.sizing;

import org.shearstack.physics.GoldenSection;
import static org.shearstack.rules.SpecKeys.NOZZLE_COUNT;
import static org.shearstack.rules.SpecKeys.NOZZLE_DISCHARGE_COEFFICIENT;
import static org.shearstack.rules.SpecKeys.NOZZLE_JET_ANGLE;
import static org.shearstack.rules.SpecKeys.NOZZLE_KIND;
import static org.shearstack.rules.SpecKeys.NOZZLE_THROAT_AREA;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.shearstack.physics.gas.Gas;
import org.shearstack.physics.gas.Isentropic;
import org.shearstack.physics.gas.JetState;
import org.shearstack.physics.gas.Nozzle;
import org.shearstack.physics.gas.NozzleKind;
import org.shearstack.physics.supply.SeriesFlow;
import org.shearstack.physics.supply.SeriesSolver;
import org.shearstack.physics.supply.SupplyPath;
import org.shearstack.rules.FunctionRule;
import org.shearstack.rules.Key;
import org.shearstack.rules.Rule;
import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/** SIZE-NOZZLE-*: discharge coefficient, throat, kind, exit area, jet angle, and the jet it makes. */
final class NozzleSizing {

    /** C_d of a printed nozzle with layer roughness (physics.md §1.3: 0.85–0.9, engineering judgment). */
    static final double DEFAULT_DISCHARGE_COEFFICIENT = 0.85;
    /** Jet angle to the tangent: Krishnan et al. (2011) used 15° (physics.md §1.5); 10–20° is common practice. */
    static final double DEFAULT_JET_ANGLE_DEG = 15.0;

    private NozzleSizing() {
    }

    static List<Rule> rules() {
        List<Key> throatReads = new ArrayList<>(FlowParts.SUPPLY_READS);
        throatReads.addAll(List.of(NOZZLE_COUNT, NOZZLE_DISCHARGE_COEFFICIENT));
        List<Key> exitReads = new ArrayList<>(FlowParts.SUPPLY_READS);
        exitReads.addAll(List.of(NOZZLE_KIND, NOZZLE_THROAT_AREA, NOZZLE_COUNT, NOZZLE_DISCHARGE_COEFFICIENT));
        List<Key> jetReads = new ArrayList<>(FlowParts.SUPPLY_READS);
        jetReads.addAll(FlowParts.NOZZLE_READS);
        return List.of(
                FunctionRule.of("SIZE-NOZZLE-CD", List.of(), List.of(NOZZLE_DISCHARGE_COEFFICIENT),
                        (in, out) -> out.put(NOZZLE_DISCHARGE_COEFFICIENT, DEFAULT_DISCHARGE_COEFFICIENT,
                                "0.85 for a short printed nozzle with layer roughness (a blow-down through the nozzle"
                                        + " can measure it)", "physics.md §1.3 (engineering judgment)")),
                FunctionRule.of("SIZE-JET-ANGLE", List.of(), List.of(NOZZLE_JET_ANGLE),
                        (in, out) -> out.put(NOZZLE_JET_ANGLE, DEFAULT_JET_ANGLE_DEG,
                                "15° to the rotor tangent: mostly tangential, enough radial room for the slot",
                                "Krishnan et al. 2011 used 15° (physics.md §1.5); 10–20° common practice")),
                FunctionRule.of("SIZE-NOZZLE-THROAT", throatReads, List.of(NOZZLE_THROAT_AREA), NozzleSizing::throat),
                FunctionRule.of("SIZE-NOZZLE-KIND", List.of(), List.of(NOZZLE_KIND),
                        (in, out) -> out.putText(NOZZLE_KIND, "converging",
                                "converging: a printed rotor's burst-limited rim speed is far below even the sonic"
                                        + " jet, so expanding further in a diverging part only raises the speed ratio"
                                        + " and adds shock losses off design",
                                "physics.md §4.2 and §1.4 (derived); pin converging-diverging to try it")),
                FunctionRule.of("SIZE-NOZZLE-EXIT", exitReads, List.of(SizingKeys.NOZZLE_EXIT_AREA),
                        NozzleSizing::exit),
                FunctionRule.of("SIZE-JET", jetReads,
                        List.of(SizingKeys.NOZZLE_JET_SPEED, SizingKeys.NOZZLE_MASS_FLOW,
                                SizingKeys.NOZZLE_JET_TEMPERATURE), NozzleSizing::jet));
    }

    /**
     * Throat area that makes the most jet power from this supply: a large throat drops the pressure in the hose, a
     * small one wastes the path's capacity. The jet power ṁ·½V² comes from the path and nozzle solved in series.
     */
    private static void throat(RuleInputs in, RuleOutputs out) {
        Values v = Values.of(in);
        SupplyPath supply = FlowParts.supply(v);
        int n = FlowParts.count(v);
        double cd = in.get(NOZZLE_DISCHARGE_COEFFICIENT);
        double pathArea = supply.path().effectiveAreaM2(Gas.AIR);
        double best = Math.exp(GoldenSection.maximize(
                logA -> jetPowerW(supply, Nozzle.converging(Math.exp(logA), Math.min(1, cd),
                        FlowParts.VELOCITY_COEFFICIENT)), Math.log(0.05 * pathArea), Math.log(5 * pathArea), 1e-4));
        double perNozzleMm2 = best / n * 1e6;
        out.put(NOZZLE_THROAT_AREA, perNozzleMm2, String.format(Locale.ROOT,
                "throat area that maximises the jet power ṁ·½V² with the supply path (effective area %.2f mm²) and"
                        + " the nozzle solved in series for the plenum pressure; total %.2f mm² over %d nozzle(s)",
                pathArea * 1e6, best * 1e6, n),
                "ISO 6358 path + isentropic nozzle in series by root finding (physics.md §1.3, §2.1); derived");
    }

    static double jetPowerW(SupplyPath supply, Nozzle nozzle) {
        SeriesFlow f = SeriesSolver.solve(Gas.AIR, supply, nozzle, supply.ambientPressurePa());
        double vj = f.jet().jetVelocityMPerS();
        return f.massFlowKgPerS() * 0.5 * vj * vj;
    }

    private static void exit(RuleInputs in, RuleOutputs out) {
        Values v = Values.of(in);
        int n = FlowParts.count(v);
        double throat = in.get(NOZZLE_THROAT_AREA);
        NozzleKind kind = FlowParts.kind(in.text(NOZZLE_KIND));
        if (kind == NozzleKind.CONVERGING) {
            out.put(SizingKeys.NOZZLE_EXIT_AREA, throat, "converging nozzle: the exit is the throat", "geometry");
            return;
        }
        SupplyPath supply = FlowParts.supply(v);
        Nozzle probe = Nozzle.converging(n * throat * 1e-6, Math.min(1, in.get(NOZZLE_DISCHARGE_COEFFICIENT)), 1.0);
        double plenum = SeriesSolver.chokedPlenumPressurePa(Gas.AIR, supply, probe);
        double ratio = supply.ambientPressurePa() / plenum;
        double mach = Isentropic.machFromPressureRatio(Gas.AIR.gamma(), Math.min(1.0, ratio));
        double areaRatio = mach > 1 ? Isentropic.areaRatio(Gas.AIR.gamma(), mach) : 1.0;
        out.put(SizingKeys.NOZZLE_EXIT_AREA, throat * areaRatio, String.format(Locale.ROOT,
                "throat × A/A* for ideal expansion from the plenum (%.3f bar abs) to ambient: exit Mach %.3f,"
                        + " A/A* %.4f", plenum / 1e5, mach, areaRatio),
                "isentropic area–Mach relation, NACA Report 1135 (physics.md §1.1, §1.4)");
    }

    private static void jet(RuleInputs in, RuleOutputs out) {
        Values v = Values.of(in);
        SupplyPath supply = FlowParts.supply(v);
        SeriesFlow f = SeriesSolver.solve(Gas.AIR, supply, FlowParts.nozzle(v), supply.ambientPressurePa());
        JetState jet = f.jet();
        String state = String.format(Locale.ROOT, "plenum %.3f bar abs, %s, %s", f.plenumPressurePa() / 1e5,
                jet.choked() ? "choked" : "not choked", jet.expansion().name().toLowerCase(Locale.ROOT).replace('_', '-'));
        out.put(SizingKeys.NOZZLE_JET_SPEED, jet.jetVelocityMPerS(),
                "jet speed discharging to ambient (" + state + "), momentum-equivalent past the exit, × velocity"
                        + " coefficient " + FlowParts.VELOCITY_COEFFICIENT,
                "energy equation and thrust-equivalent velocity (physics.md §1.4)");
        out.put(SizingKeys.NOZZLE_MASS_FLOW, f.massFlowKgPerS(), "path and nozzle in series (" + state + ")",
                "ISO 6358 path + isentropic nozzle by root finding (physics.md §2.1)");
        out.put(SizingKeys.NOZZLE_JET_TEMPERATURE, jet.jetStaticTemperatureK(),
                "T₀ − V²/(2c_p): below 0 °C moisture in shop air can condense or freeze in the jet",
                "energy equation (physics.md §1.4)");
    }
}
