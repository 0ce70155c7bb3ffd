package org.shearstack.check.safety;

/**
 * The highest speed the air can drive the rotor to (no useful load), as the performance model predicts it at
 * the upper edge of its uncertainty band. The burst check asks it about variants of the design to compute
 * remedies; a model that cannot vary something returns the unchanged speed for it.
 */
@FunctionalInterface
public interface RunawayModel {

    /**
     * A design variant.
     *
     * @param supplyPressurePa  supply pressure, absolute
     * @param throatScale       nozzle throat area relative to the design (1 = as designed)
     * @param diameterScale     disc diameters (outer and exhaust) relative to the design
     * @param extraLoadTorqueNm a permanent load torque added to the model's parasitic losses
     */
    record Variant(double supplyPressurePa, double throatScale, double diameterScale, double extraLoadTorqueNm) {

        public static Variant atPressure(double supplyPressurePa) {
            return new Variant(supplyPressurePa, 1, 1, 0);
        }

        public Variant withPressure(double pa) {
            return new Variant(pa, throatScale, diameterScale, extraLoadTorqueNm);
        }

        public Variant withThroatScale(double s) {
            return new Variant(supplyPressurePa, s, diameterScale, extraLoadTorqueNm);
        }

        public Variant withDiameterScale(double s) {
            return new Variant(supplyPressurePa, throatScale, s, extraLoadTorqueNm);
        }

        public Variant withLoadTorque(double nm) {
            return new Variant(supplyPressurePa, throatScale, diameterScale, nm);
        }
    }

    /** Runaway speed of the variant, rad/s. */
    double runawayRadPerS(Variant variant);

    /** A short statement of what the model includes, for the finding's message ("locked-flow bound, no losses"). */
    default String description() {
        return "performance model, upper band";
    }
}
