package org.shearstack.job;

import java.util.List;
import java.util.Optional;
import org.shearstack.check.safety.BurstCheck;
import org.shearstack.check.safety.BurstInputs;
import org.shearstack.check.safety.LockedFlowBound;
import org.shearstack.check.safety.RunawayModel;
import org.shearstack.check.safety.SpinningPart;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.physics.rotor.TurbineModel;
import org.shearstack.physics.stress.SafetyFactor;
import org.shearstack.physics.stress.SpinningAnnulus;

/**
 * The burst-at-runaway check on the rotor discs: the maximum safe supply pressure and the speeds behind it. The
 * runaway comes from the performance model's band when the design has one, otherwise from the locked-flow bound
 * (an upper bound without losses, so it errs on the safe side).
 */
final class SafetyStage {

    private SafetyStage() {
    }

    /** The check's result, or empty with the missing keys when the design lacks what it needs. */
    static Optional<BurstCheck.Result> run(ResolvedDesign design, Optional<TurbineModel> model,
            double operatingSpeedRadPerS, List<String> missing) {
        Values v = new Values(design);
        double d = v.need("rotor.diameter");
        double p0 = v.need("supply.pressure");
        double pa = v.need("supply.ambient");
        double t0 = v.need("supply.temperature");
        double rho = v.need("filament.density");
        double nu = v.need("filament.poisson-ratio");
        double strength = v.need("filament.tensile-strength-xy");
        double factor = v.need("targets.safety-factor");
        double exhaust = v.optional("rotor.exhaust-diameter");
        double portCircle = v.optional("disc.port-circle-diameter");
        double portDia = v.optional("disc.port-diameter");
        double bore = v.optional("disc.bore-across-flats");
        if (!v.complete()) {
            missing.addAll(v.missing());
            return Optional.empty();
        }
        double r2 = d / 2000;
        SpinningAnnulus disc;
        if (!Double.isNaN(portCircle) && !Double.isNaN(portDia)) {
            disc = SpinningAnnulus.withExhaustPorts(r2, (portCircle + portDia) / 2000);
        } else if (!Double.isNaN(exhaust)) {
            disc = SpinningAnnulus.withExhaustPorts(r2, exhaust / 2000);
        } else {
            disc = SpinningAnnulus.plainBore(r2, Double.isNaN(bore) ? 0 : bore / 2000);
        }
        double r1 = Double.isNaN(exhaust) ? 0 : Math.min(exhaust / 2000, 0.9 * r2);
        BurstInputs in = new BurstInputs(List.of(new SpinningPart("rotor-disc", disc, true)), rho, nu, strength,
                new SafetyFactor(factor), p0, pa, operatingSpeedRadPerS, model.<RunawayModel>map(BandRunaway::new)
                        .orElseGet(() -> new LockedFlowBound(r2, r1, t0, pa)));
        return Optional.of(BurstCheck.run(in));
    }
}
