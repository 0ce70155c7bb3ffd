package org.shearstack.rules.sizing;

import static org.shearstack.rules.SpecKeys.SUPPLY_AMBIENT;
import static org.shearstack.rules.SpecKeys.SUPPLY_BLOWDOWN_FROM;
import static org.shearstack.rules.SpecKeys.SUPPLY_BLOWDOWN_TANK;
import static org.shearstack.rules.SpecKeys.SUPPLY_BLOWDOWN_TIME;
import static org.shearstack.rules.SpecKeys.SUPPLY_BLOWDOWN_TO;
import static org.shearstack.rules.SpecKeys.SUPPLY_CONDUCTANCE;
import static org.shearstack.rules.SpecKeys.SUPPLY_CRITICAL_RATIO;
import static org.shearstack.rules.SpecKeys.SUPPLY_FREE_AIR_FLOW;
import static org.shearstack.rules.SpecKeys.SUPPLY_FREE_AIR_FLOW_PRESSURE;
import static org.shearstack.rules.SpecKeys.SUPPLY_PRESSURE;
import static org.shearstack.rules.SpecKeys.SUPPLY_TEMPERATURE;

import java.util.List;
import java.util.Locale;
import org.shearstack.physics.gas.Gas;
import org.shearstack.physics.supply.Blowdown;
import org.shearstack.physics.supply.BlowdownEstimate;
import org.shearstack.physics.supply.FlowCharacteristic;
import org.shearstack.physics.supply.ReferenceAtmosphere;
import org.shearstack.rules.FunctionRule;
import org.shearstack.rules.InputRejectedException;
import org.shearstack.rules.Rule;
import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;
import org.shearstack.spec.QuantityFormat;

/** SIZE-SUPPLY-PATH and SIZE-SUPPLY-CRITICAL-RATIO: the ISO 6358 characteristic of the supply path. */
final class SupplySizing {

    /** b assumed when the spec gives none: real components have b ≈ 0.2–0.5 (physics.md §2.1, range from memory). */
    static final double DEFAULT_CRITICAL_RATIO = 0.3;

    private SupplySizing() {
    }

    static List<Rule> rules() {
        return List.of(
                FunctionRule.of("SIZE-SUPPLY-PATH",
                        List.of(SUPPLY_PRESSURE, SUPPLY_CONDUCTANCE, SUPPLY_FREE_AIR_FLOW, SUPPLY_FREE_AIR_FLOW_PRESSURE,
                                SUPPLY_BLOWDOWN_TANK, SUPPLY_BLOWDOWN_FROM, SUPPLY_BLOWDOWN_TO, SUPPLY_BLOWDOWN_TIME,
                                SUPPLY_TEMPERATURE, SUPPLY_AMBIENT, SizingKeys.SUPPLY_CRITICAL_PRESSURE_RATIO),
                        List.of(SizingKeys.SUPPLY_PATH_CONDUCTANCE), SupplySizing::conductance),
                FunctionRule.of("SIZE-SUPPLY-CRITICAL-RATIO", List.of(SUPPLY_CRITICAL_RATIO),
                        List.of(SizingKeys.SUPPLY_CRITICAL_PRESSURE_RATIO), (in, out) -> {
                            if (in.has(SUPPLY_CRITICAL_RATIO)) {
                                out.put(SizingKeys.SUPPLY_CRITICAL_PRESSURE_RATIO, in.get(SUPPLY_CRITICAL_RATIO),
                                        "b as given in the spec", "ISO 6358 (spec supply.critical-ratio)");
                            } else {
                                out.put(SizingKeys.SUPPLY_CRITICAL_PRESSURE_RATIO, DEFAULT_CRITICAL_RATIO,
                                        "b = 0.3 assumed: a choked blow-down cannot measure b, and hoses, couplings and"
                                                + " regulators lie between 0.2 and 0.5",
                                        "physics.md §2.1 (range from memory); give supply.critical-ratio to replace it");
                            }
                        }));
    }

    private static void conductance(RuleInputs in, RuleOutputs out) {
        Gas air = Gas.AIR;
        double b = in.get(SizingKeys.SUPPLY_CRITICAL_PRESSURE_RATIO);
        double ambient = in.get(SUPPLY_AMBIENT);
        if (!(in.get(SUPPLY_PRESSURE) > ambient)) {
            throw new InputRejectedException(SUPPLY_PRESSURE, "a supply pressure above the ambient pressure",
                    QuantityFormat.format(in.get(SUPPLY_PRESSURE), SUPPLY_PRESSURE.dimension()));
        }
        if (in.has(SUPPLY_CONDUCTANCE)) {
            out.put(SizingKeys.SUPPLY_PATH_CONDUCTANCE, in.get(SUPPLY_CONDUCTANCE), "C as given in the spec",
                    "ISO 6358 (spec supply.conductance)");
        } else if (in.has(SUPPLY_FREE_AIR_FLOW)) {
            double p1 = in.get(SUPPLY_FREE_AIR_FLOW_PRESSURE);
            if (!(p1 > ambient)) {
                throw new InputRejectedException(SUPPLY_FREE_AIR_FLOW, "a free-air flow measured at a pressure above"
                        + " ambient", QuantityFormat.format(p1, SUPPLY_FREE_AIR_FLOW_PRESSURE.dimension()));
            }
            FlowCharacteristic c = FlowCharacteristic.fromFreeAirFlow(in.get(SUPPLY_FREE_AIR_FLOW), p1,
                    in.get(SUPPLY_AMBIENT), b, 0.5);
            out.put(SizingKeys.SUPPLY_PATH_CONDUCTANCE, c.conductanceM3PerSPa(),
                    "C = free-air flow / (p₁ · subsonic factor of ISO 6358 at p_ambient/p₁ with b)",
                    "ISO 6358 flow equation with the ISO 8778 reference atmosphere (physics.md §2.1)");
        } else if (in.has(SUPPLY_BLOWDOWN_TANK)) {
            if (!(in.get(SUPPLY_BLOWDOWN_FROM) > in.get(SUPPLY_BLOWDOWN_TO))
                    || !(in.get(SUPPLY_BLOWDOWN_TO) > 0)) {
                throw new InputRejectedException(SUPPLY_BLOWDOWN_TO, "an end pressure below the start pressure "
                        + QuantityFormat.format(in.get(SUPPLY_BLOWDOWN_FROM), SUPPLY_BLOWDOWN_FROM.dimension()),
                        QuantityFormat.format(in.get(SUPPLY_BLOWDOWN_TO), SUPPLY_BLOWDOWN_TO.dimension()));
            }
            Blowdown test = new Blowdown(in.get(SUPPLY_BLOWDOWN_TANK), in.get(SUPPLY_BLOWDOWN_FROM),
                    in.get(SUPPLY_BLOWDOWN_TO), in.get(SUPPLY_BLOWDOWN_TIME), in.get(SUPPLY_TEMPERATURE));
            BlowdownEstimate e = test.estimate(air);
            String spread = String.format(Locale.ROOT,
                    "middle reading (polytropic n = 1.2) of the blow-down: isothermal %.3f, adiabatic %.3f, chosen"
                            + " %.3f dm³/(s·bar), spread ±%.0f %%%s",
                    e.isothermalM3PerSPa() / ReferenceAtmosphere.DM3_PER_S_BAR,
                    e.adiabaticM3PerSPa() / ReferenceAtmosphere.DM3_PER_S_BAR,
                    e.middleM3PerSPa() / ReferenceAtmosphere.DM3_PER_S_BAR, 100 * e.spreadFraction(),
                    test.staysChoked(in.get(SUPPLY_AMBIENT), b) ? ""
                            : "; the path unchoked before the end of the test, so C is underestimated");
            out.put(SizingKeys.SUPPLY_PATH_CONDUCTANCE, e.middleM3PerSPa(), spread,
                    "tank discharge, isothermal and isentropic closed forms (Bar-Meir, Fundamentals of Compressible"
                            + " Fluid Mechanics ch. 11; physics.md §2.3)");
        } else {
            throw new InputRejectedException(SUPPLY_CONDUCTANCE,
                    "one of supply.conductance, supply.free-air-flow or supply.blowdown", "none of them");
        }
    }
}
