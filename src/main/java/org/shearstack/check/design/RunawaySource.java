package org.shearstack.check.design;

import org.shearstack.check.DesignValues;
import org.shearstack.check.safety.LockedFlowBound;
import org.shearstack.check.safety.RunawayModel;

/**
 * Where the burst check gets its runaway model for a design. The default is the locked-flow bound without
 * losses (an upper bound, physics.md §12.8); the command line can pass one built on the performance model
 * ({@link TurbineRunaway}) once the design carries the flow inputs.
 */
@FunctionalInterface
public interface RunawaySource {

    /** The model for the design; reads through {@code values} so missing keys are reported. */
    RunawayModel forDesign(DesignValues values);

    /**
     * The performance model's band ({@link TurbineRunaway} over the design's turbine model) when the design
     * carries the flow inputs; otherwise the locked-flow bound.
     */
    static RunawaySource performanceModelOrBound() {
        RunawaySource bound = lockedFlowBound();
        return v -> {
            try {
                return new TurbineRunaway(org.shearstack.rules.sizing.DesignModels.turbineModel(v.design()));
            } catch (java.util.NoSuchElementException | IllegalArgumentException | IllegalStateException e) {
                return bound.forDesign(v);
            }
        };
    }

    /** The locked-flow bound from the disc and exhaust diameters, supply temperature and ambient pressure. */
    static RunawaySource lockedFlowBound() {
        return v -> {
            double outer = v.need("rotor.diameter") / 2000;
            double exhaust = v.optional("rotor.exhaust-diameter");
            if (Double.isNaN(exhaust)) {
                exhaust = v.optional("disc.port-circle-diameter");
            }
            double r1 = Double.isNaN(exhaust) ? 0 : exhaust / 2000;
            double t = v.optional("supply.temperature");
            double pa = v.need("supply.ambient");
            if (Double.isNaN(outer) || Double.isNaN(pa)) {
                return null;
            }
            return new LockedFlowBound(outer, Math.min(r1, 0.9 * outer), Double.isNaN(t) ? 293.15 : t, pa);
        };
    }
}
