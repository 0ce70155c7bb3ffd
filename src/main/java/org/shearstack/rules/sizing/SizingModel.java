package org.shearstack.rules.sizing;

import org.shearstack.physics.GoldenSection;
import java.util.OptionalDouble;
import org.shearstack.physics.gas.Gas;
import org.shearstack.physics.gas.Nozzle;
import org.shearstack.physics.rotor.Calibration;
import org.shearstack.physics.rotor.FrictionClosure;
import org.shearstack.physics.rotor.GapFlowClosedForm;
import org.shearstack.physics.rotor.GapMarch;
import org.shearstack.physics.rotor.LossModel;
import org.shearstack.physics.rotor.OperatingPoint;
import org.shearstack.physics.rotor.TurbineGeometry;
import org.shearstack.physics.rotor.TurbineModel;
import org.shearstack.physics.supply.SupplyPath;

/**
 * The performance model as the sizing rules use it: candidate packs in mm are turned into a {@link TurbineModel}
 * with the housing clearances the geometry rules will give them (same formulas as GEO-AXIAL-STACK and
 * GEO-HOUSING-CHAMBER) and a nominal loss model, and scored by the objective.
 *
 * @param supply           supply path
 * @param nozzle           sized nozzle
 * @param jetAngleDeg      jet angle to the tangent
 * @param printerNozzleMm  printer nozzle diameter (end clearance)
 * @param lineWidthMm      printer line width (radial clearance)
 * @param objective        what to maximise
 * @param targetSpeed      the target speed, rad/s, when the spec gives one
 * @param tipSpeedCapMPerS highest rim speed the optimiser may use when no target speed is given
 * @param calibration      loss coefficients (nominal, or fitted from the spec's calibration file)
 */
record SizingModel(SupplyPath supply, Nozzle nozzle, double jetAngleDeg, double printerNozzleMm, double lineWidthMm,
        Objective objective, OptionalDouble targetSpeed, double tipSpeedCapMPerS, Calibration calibration) {

    /** Target slip-decay number for the first guess of the disc count (physics.md §3.8b (i): Λ ≥ 3). */
    static final double TARGET_SLIP_DECAY = 4.0;
    /** Exhaust port area as a fraction of the disc area inside r₁ (spokes and hub take the rest). */
    static final double PORT_AREA_FRACTION = 0.45;
    /** Gap-march steps while ranking candidates (the final performance uses the full default). */
    static final int SIZING_STEPS = 16;
    /** Relative tolerance on the speed of the best objective while ranking candidates. */
    static final double SPEED_TOLERANCE = 0.02;

    /** A scored candidate: objective value and the speed where it was found. */
    record Score(double value, double speedRadPerS, OperatingPoint point) {
    }

    static double endClearanceMm(double gapMm, double printerNozzleMm) {
        return Math.max(Math.max(gapMm, 2 * printerNozzleMm), 0.5);
    }

    static double radialClearanceMm(double diameterMm, double lineWidthMm) {
        return Math.max(Math.max(0.5, 0.01 * diameterMm), 2 * lineWidthMm);
    }

    static double portAreaMm2(double exhaustDiameterMm) {
        return PORT_AREA_FRACTION * Math.PI * exhaustDiameterMm * exhaustDiameterMm / 4.0;
    }

    TurbineModel model(Trial t) {
        TurbineGeometry g = new TurbineGeometry(t.diameterMm() / 2000.0, t.exhaustDiameterMm() / 2000.0,
                t.gapMm() / 1000.0, t.thicknessMm() / 1000.0, t.discs(),
                endClearanceMm(t.gapMm(), printerNozzleMm) / 1000.0,
                radialClearanceMm(t.diameterMm(), lineWidthMm) / 1000.0, portAreaMm2(t.exhaustDiameterMm()) * 1e-6,
                jetAngleDeg);
        return new TurbineModel(Gas.AIR, supply, nozzle, g, LossModel.twoShielded608(), calibration,
                FrictionClosure.BLENDED, GapMarch.Integration.EXPONENTIAL, SIZING_STEPS);
    }

    /** Objective at the target speed, or its best over [0, min(runaway, cap/r₂)]. */
    Score score(Trial t) {
        TurbineModel m = model(t);
        if (targetSpeed.isPresent()) {
            OperatingPoint p = m.at(targetSpeed.getAsDouble());
            return new Score(objective.of(p), p.speedRadPerS(), p);
        }
        double top = tipSpeedCapMPerS / m.geometry().outerRadiusM();
        if (m.at(top).shaftTorqueNm() <= 0.0) {
            // the rotor runs away below the cap: search up to the runaway speed instead
            top = m.runawaySpeedRadPerS();
        }
        if (!(top > 0)) {
            OperatingPoint p = m.at(0.0);
            return new Score(0.0, 0.0, p);
        }
        double w = GoldenSection.maximize(s -> objective.of(m.at(s)), 0.0, top, SPEED_TOLERANCE * top);
        OperatingPoint p = m.at(w);
        return new Score(objective.of(p), w, p);
    }

    /**
     * First guess of the disc count from the flow per gap: gaps enough that each carries
     * ṁ_g = 10πμ(r₂² − r₁²)/(Λ b) with Λ = 4, i.e. the inlet slip decays to about 2 % (physics.md §3.3, §3.8b).
     */
    static int discsForFlow(double massFlowKgPerS, Trial t, double maxDiscs) {
        double mu = Gas.AIR.viscosityPaS(293.15);
        double r2 = t.diameterMm() / 2000.0;
        double r1 = t.exhaustDiameterMm() / 2000.0;
        double b = t.gapMm() / 1000.0;
        double perGap = 10.0 * Math.PI * mu * (r2 * r2 - r1 * r1) / (TARGET_SLIP_DECAY * b);
        int gaps = (int) Math.ceil(massFlowKgPerS / perGap);
        return (int) Math.max(3, Math.min(maxDiscs, gaps + 1));
    }

    /** Ekman thickness √(ν/Ω) at a speed, mm (ν of air at 20 °C and the density at 1 atm). */
    static double ekmanMm(double speedRadPerS) {
        double nu = Gas.AIR.viscosityPaS(293.15) / Gas.AIR.densityKgPerM3(101_325, 293.15);
        return 1000.0 * GapFlowClosedForm.ekmanThicknessM(nu, speedRadPerS);
    }
}
