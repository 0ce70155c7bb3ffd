package org.shearstack.check.design;

import java.util.List;
import org.shearstack.check.Check;
import org.shearstack.check.DesignValues;
import org.shearstack.check.Finding;
import org.shearstack.check.safety.RotorDynamicsCheck;
import org.shearstack.check.safety.RunawayModel;
import org.shearstack.design.ResolvedDesign;

/**
 * CRITICAL-SPEED and UNBALANCE on a resolved design. A metal shaft is steel (E 200 GPa, 7850 kg/m³, handbook
 * values); a printed one takes the filament's modulus and density. The bearings sit in the covers, so the span
 * is the chamber depth plus one cover thickness (bearing centres mid-cover, an approximation), with the pack
 * centred. The printer's scatter stands for its positional tolerance, twice it for the bore clearance.
 */
public final class Dynamics implements Check {

    private final RunawaySource source;

    public Dynamics(RunawaySource source) {
        this.source = source;
    }

    @Override
    public String code() {
        return "CRITICAL-SPEED";
    }

    @Override
    public List<String> codes() {
        return List.of("CRITICAL-SPEED", "UNBALANCE");
    }

    @Override
    public List<Finding> run(ResolvedDesign design) {
        DesignValues v = new DesignValues(design);
        RotorReading rotor = RotorReading.read(v);
        boolean metal = v.text("rotor.shaft").equals("metal");
        double shaft = metal ? v.need("rotor.shaft.diameter") : v.need("shaft.journal-diameter");
        double e = metal ? 200e9 : v.need("filament.elastic-modulus");
        double rho = metal ? 7850 : rotor.densityKgPerM3();
        double span = v.need("housing.chamber-depth") + v.need("cover.thickness");
        double scatter = v.need("printer.compensation-scatter");
        double supply = v.need("supply.pressure");
        String grade = v.text("rotor.balance-grade");
        RunawayModel model = source.forDesign(v);
        double mass = rotor.packMassKg();
        if (!v.complete() || model == null || Double.isNaN(mass)) {
            return List.of(v.notChecked(code(), "rotor dynamics"));
        }
        double runaway = model.runawayRadPerS(RunawayModel.Variant.atPressure(supply));
        return RotorDynamicsCheck.run(new RotorDynamicsCheck.Inputs(shaft, e, rho, span, span / 2, mass,
                v.optional("targets.speed"), runaway, grade.isEmpty() ? "G6.3" : grade, scatter, 2 * scatter,
                2 * rotor.discs() - 1));
    }
}
