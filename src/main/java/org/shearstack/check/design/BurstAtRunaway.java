package org.shearstack.check.design;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.check.Check;
import org.shearstack.check.DesignValues;
import org.shearstack.check.Finding;
import org.shearstack.check.safety.BurstCheck;
import org.shearstack.check.safety.BurstInputs;
import org.shearstack.check.safety.RunawayModel;
import org.shearstack.physics.stress.SafetyFactor;

/** BURST-RUNAWAY (and BURST-OPERATING) on a resolved design; also yields the safety summary. */
public final class BurstAtRunaway implements Check {

    private final RunawaySource source;

    public BurstAtRunaway(RunawaySource source) {
        this.source = source;
    }

    @Override
    public String code() {
        return BurstCheck.CODE;
    }

    @Override
    public List<String> codes() {
        return List.of(BurstCheck.CODE, "BURST-OPERATING");
    }

    /** The check's result, or null with the reason in {@code values.missing()} when the design lacks inputs. */
    public BurstCheck.Result evaluate(DesignValues v) {
        RotorReading rotor = RotorReading.read(v);
        double poisson = v.need("filament.poisson-ratio");
        double xy = v.need("filament.tensile-strength-xy");
        double factor = v.optional("targets.safety-factor");
        double supply = v.need("supply.pressure");
        double ambient = v.need("supply.ambient");
        double speed = v.optional("targets.speed");
        RunawayModel model = source.forDesign(v);
        if (!v.complete() || model == null) {
            return null;
        }
        return BurstCheck.run(new BurstInputs(rotor.spinningParts(), rotor.densityKgPerM3(), poisson, xy,
                new SafetyFactor(Double.isNaN(factor) ? SafetyFactor.DEFAULT : factor), supply, ambient, speed, model));
    }

    @Override
    public List<Finding> run(org.shearstack.design.ResolvedDesign design) {
        DesignValues v = new DesignValues(design);
        BurstCheck.Result r = evaluate(v);
        if (r == null) {
            return List.of(v.notChecked(BurstCheck.CODE, "burst at runaway"));
        }
        return new ArrayList<>(r.findings());
    }
}
