package org.shearstack.rules.sizing;

import org.shearstack.physics.GoldenSection;
import static org.shearstack.rules.SpecKeys.GENERATOR_LOAD;
import static org.shearstack.rules.SpecKeys.GENERATOR_OPEN_CIRCUIT_VOLTAGE;
import static org.shearstack.rules.SpecKeys.GENERATOR_OPEN_CIRCUIT_VOLTAGE_SPEED;
import static org.shearstack.rules.SpecKeys.GENERATOR_WINDING_RESISTANCE;
import static org.shearstack.rules.SpecKeys.TARGETS_OBJECTIVE;
import static org.shearstack.rules.SpecKeys.TARGETS_SPEED;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.shearstack.physics.generator.DcGenerator;
import org.shearstack.physics.generator.GeneratorCoupling;
import org.shearstack.physics.generator.GeneratorPoint;
import org.shearstack.physics.rotor.Calibration;
import org.shearstack.physics.rotor.OperatingPoint;
import org.shearstack.physics.rotor.PerformanceCurve;
import org.shearstack.physics.rotor.TurbineModel;
import org.shearstack.physics.rotor.Validity;
import org.shearstack.rules.InputRejectedException;
import org.shearstack.physics.stress.BurstAssessment;
import org.shearstack.physics.stress.SafetyFactor;
import org.shearstack.rules.Key;
import org.shearstack.rules.ProfileKeys;
import org.shearstack.rules.geometry.GeoKeys;
import org.shearstack.rules.Rule;
import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;
import org.shearstack.rules.SpecKeys;
import org.shearstack.spec.Dimension;
import org.shearstack.spec.QuantityFormat;

/**
 * SIZE-PERFORMANCE: runs the coupled model of the design as built and writes its headline figures: runaway speed
 * (estimate and the band's upper edge, which safety checks use), stall torque, operating point (against the
 * generator when the spec has one, else at the target speed, else at the best speed below the design rim speed),
 * mass flow, plenum pressure, admission fraction, exit-swirl loss and the fraction of the map outside the model's
 * validity range.
 */
final class PerformanceRule implements Rule {

    private static final String SOURCE = "coupled supply–nozzle–disc-pack model (physics.md §1–§3, §12; derived)";
    private static final int CURVE_POINTS = 20;

    @Override
    public String id() {
        return "SIZE-PERFORMANCE";
    }

    @Override
    public List<Key> reads() {
        List<Key> keys = new ArrayList<>(DesignModels.READS);
        keys.addAll(List.of(TARGETS_SPEED, TARGETS_OBJECTIVE, SizingKeys.ROTOR_TIP_SPEED, SizingKeys.ROTOR_TIP_SPEED_LIMIT,
                ProfileKeys.POISSON_RATIO, ProfileKeys.TENSILE_STRENGTH_XY, SpecKeys.TARGETS_SAFETY_FACTOR,
                GeoKeys.PORT_CIRCLE_DIAMETER, GeoKeys.PORT_DIAMETER, GENERATOR_OPEN_CIRCUIT_VOLTAGE,
                GENERATOR_OPEN_CIRCUIT_VOLTAGE_SPEED, GENERATOR_WINDING_RESISTANCE, GENERATOR_LOAD));
        return keys;
    }

    @Override
    public List<Key> writes() {
        return List.of(SizingKeys.RUNAWAY_SPEED, SizingKeys.RUNAWAY_UPPER_BOUND, SizingKeys.STALL_TORQUE,
                SizingKeys.OPERATING_SPEED, SizingKeys.OPERATING_POWER, SizingKeys.OPERATING_EFFICIENCY,
                SizingKeys.PERFORMANCE_MASS_FLOW, SizingKeys.SUPPLY_PLENUM_PRESSURE, SizingKeys.ELECTRICAL_POWER,
                SizingKeys.ADMISSION_FRACTION, SizingKeys.OUT_OF_RANGE_FRACTION, SizingKeys.EXIT_SWIRL_LOSS);
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        Values v = Values.of(in);
        if (!(in.get(SpecKeys.ROTOR_EXHAUST_DIAMETER) < in.get(SpecKeys.ROTOR_DIAMETER))) {
            throw new InputRejectedException(SpecKeys.ROTOR_EXHAUST_DIAMETER, "an exhaust diameter below the disc"
                    + " diameter " + QuantityFormat.format(in.get(SpecKeys.ROTOR_DIAMETER), Dimension.LENGTH),
                    QuantityFormat.format(in.get(SpecKeys.ROTOR_EXHAUST_DIAMETER), Dimension.LENGTH));
        }
        if (in.get(SpecKeys.ROTOR_DISCS) < 2) {
            throw new InputRejectedException(SpecKeys.ROTOR_DISCS, "at least 2 discs",
                    QuantityFormat.format(in.get(SpecKeys.ROTOR_DISCS), Dimension.COUNT));
        }
        TurbineModel model = DesignModels.turbineModel(v, SpecCalibration.calibration(v));
        String calibration = SpecCalibration.words(v);
        PerformanceCurve curve = model.curve(CURVE_POINTS);
        double runaway = curve.runawaySpeedRadPerS();
        double optimistic = model.withCalibration(model.calibration().optimistic()).runawaySpeedRadPerS();
        double pessimistic = model.withCalibration(model.calibration().pessimistic()).runawaySpeedRadPerS();
        double upper = Math.max(runaway, Math.max(optimistic, pessimistic));
        out.put(SizingKeys.RUNAWAY_SPEED, runaway, "speed where the shaft torque of the coupled model falls to zero"
                + " (" + calibration + "; parasitic drag of end faces, rims and bearings included)", source(v));
        out.put(SizingKeys.RUNAWAY_UPPER_BOUND, upper, String.format(Locale.ROOT,
                "highest runaway of the uncertainty band: optimistic %.0f, estimate %.0f, pessimistic %.0f rpm;"
                        + " losses never set to zero (physics.md §12.8); band around the %s", rpm(optimistic),
                rpm(runaway), rpm(pessimistic), calibration), source(v));
        out.put(SizingKeys.STALL_TORQUE, curve.stallTorqueNm(), "shaft torque at zero speed (" + calibration + ")",
                source(v));
        out.put(SizingKeys.ADMISSION_FRACTION, model.geometry().admissionFraction(),
                "φ = N_g b/(N_g b + N_d t): the part of the slot jet that faces gaps", "physics.md §1.5 (derived)");
        out.put(SizingKeys.OUT_OF_RANGE_FRACTION, curve.fractionOutOfRange(), String.format(Locale.ROOT,
                "fraction of %d map points outside the model's range: gap Reynolds number above %.0f (end of the"
                        + " blended laminar–Blasius friction closure), relative Mach number above 1, or a failed gap"
                        + " march; %.0f %% of the points have turbulent gap flow (Reynolds number above %.0f), which"
                        + " the blended closure carries, so they are not counted as outside", CURVE_POINTS,
                Validity.BLENDED_REYNOLDS_LIMIT, 100 * curve.fractionBeyondLaminar(), Validity.LAMINAR_REYNOLDS_LIMIT),
                "physics.md §3.4, §12.5; Blasius 1913 and Churchill & Usagi 1972 (from memory); derived");

        double allowable = allowableSpeedRadPerS(in);
        OperatingPoint p;
        String how;
        double electrical = 0.0;
        String electricalHow = "no generator in the spec";
        if (in.has(GENERATOR_OPEN_CIRCUIT_VOLTAGE) && in.has(GENERATOR_OPEN_CIRCUIT_VOLTAGE_SPEED)
                && in.has(GENERATOR_WINDING_RESISTANCE) && in.has(GENERATOR_LOAD)) {
            DcGenerator gen = DcGenerator.fromOpenCircuit(in.get(GENERATOR_OPEN_CIRCUIT_VOLTAGE),
                    in.get(GENERATOR_OPEN_CIRCUIT_VOLTAGE_SPEED), in.get(GENERATOR_WINDING_RESISTANCE), 0.0);
            double load = in.get(GENERATOR_LOAD);
            GeneratorPoint gp = GeneratorCoupling.run(model, gen, load);
            p = model.at(gp.speedRadPerS());
            electrical = gp.electricalPowerW();
            how = String.format(Locale.ROOT, "where the turbine's torque meets the generator's k_e·I (k_e %.5f V·s/rad"
                    + " from the open-circuit reading, R_a %.2f Ω, load %.1f Ω; generator friction not included)",
                    gen.keVoltSecondPerRad(), gen.windingResistanceOhm(), load);
            electricalHow = String.format(Locale.ROOT, "I²R_L at the coupled speed, I = k_e ω/(R_a + R_L) = %.3f A",
                    gp.currentA());
        } else if (in.has(TARGETS_SPEED)) {
            p = model.at(in.get(TARGETS_SPEED));
            how = "at the target speed";
        } else {
            Objective objective = Objective.parse(in.text(TARGETS_OBJECTIVE));
            double top = Math.min(Math.min(runaway, allowable),
                    in.get(SizingKeys.ROTOR_TIP_SPEED) / model.geometry().outerRadiusM());
            double w = top > 0 ? GoldenSection.maximize(s -> objective.of(model.at(s)), 0, top, 1e-3 * top) : 0.0;
            p = model.at(w);
            how = "at the best " + (objective == Objective.POWER ? "power" : "efficiency")
                    + " with the rim no faster than the design rim speed";
        }
        how += p.speedRadPerS() <= allowable * (1 + 1e-9)
                ? String.format(Locale.ROOT, "; at or below the allowable %.0f rpm of the ported disc (BURST check's"
                        + " computation)", rpm(allowable))
                : String.format(Locale.ROOT, "; ABOVE the allowable %.0f rpm of the ported disc: the design speed must"
                        + " not exceed it (see BURST-RUNAWAY for the remedies)", rpm(allowable));
        how += " (" + calibration + ")";
        String source = source(v);
        out.put(SizingKeys.OPERATING_SPEED, p.speedRadPerS(), "operating speed " + how, source);
        out.put(SizingKeys.OPERATING_POWER, p.shaftPowerW(), "shaft power " + how, source);
        out.put(SizingKeys.OPERATING_EFFICIENCY, p.efficiency(),
                "shaft power / isentropic power of the air from supply pressure to ambient, " + how, source);
        out.put(SizingKeys.PERFORMANCE_MASS_FLOW, p.massFlowKgPerS(), "mass flow " + how, source);
        out.put(SizingKeys.SUPPLY_PLENUM_PRESSURE, p.plenumPressurePa(),
                "plenum pressure where the supply path's ISO 6358 flow equals the nozzle's, " + how, source);
        out.put(SizingKeys.EXIT_SWIRL_LOSS, p.exitSwirlLossW(),
                "kinetic energy of the swirl leaving the gaps, ṁ·½(Ωr₁ + κW₁)², lost without a de-swirler, " + how,
                "physics.md §3.7 and §12.4 (derived)");
        out.put(SizingKeys.ELECTRICAL_POWER, electrical, electricalHow, "physics.md §8.3 (DC machine, derived)");
    }

    /**
     * Allowable speed of the disc as built: ported out to the port ring's outer edge (the kit's port circle plus
     * one port diameter, else the exhaust diameter, as the BURST check reads it), with the burst checks'
     * computation ({@link BurstAssessment#allowableRimSpeedOfPortedDiscMPerS}).
     */
    static double allowableSpeedRadPerS(RuleInputs in) {
        double d = in.get(SpecKeys.ROTOR_DIAMETER);
        double ring = in.has(GeoKeys.PORT_CIRCLE_DIAMETER) && in.has(GeoKeys.PORT_DIAMETER)
                ? in.get(GeoKeys.PORT_CIRCLE_DIAMETER) + in.get(GeoKeys.PORT_DIAMETER)
                : in.get(SpecKeys.ROTOR_EXHAUST_DIAMETER);
        double ratio = Math.min(0.95, ring / d);
        SafetyFactor factor = new SafetyFactor(Math.max(SafetyFactor.MIN, in.get(SpecKeys.TARGETS_SAFETY_FACTOR)));
        return BurstAssessment.allowableRimSpeedOfPortedDiscMPerS(ratio, in.get(ProfileKeys.DENSITY),
                in.get(ProfileKeys.POISSON_RATIO), in.get(ProfileKeys.TENSILE_STRENGTH_XY), factor) / (d / 2000.0);
    }

    private static String source(Values v) {
        return SpecCalibration.calibrated(v) ? SOURCE + "; CALIBRATED: loss coefficients fitted to the user's bench"
                + " runs (spec key calibration)" : SOURCE;
    }

    private static double rpm(double radPerS) {
        return radPerS * 30 / Math.PI;
    }
}
