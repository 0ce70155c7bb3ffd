package org.shearstack.physics.containment;

/**
 * Loads on the screws holding a pressurised cover, and what a screw and a printed boss can carry.
 */
public final class BoltedJoint {

    /**
     * Proof stress of property class 8.8 screws up to M16: 580 MPa (ISO 898-1, from memory; the table value for
     * d ≤ 16 mm is 580 MPa, 600 MPa above). Socket-head cap screws (ISO 4762) are commonly class 8.8 or 12.9.
     */
    public static final double PROOF_STRESS_CLASS_8_8_PA = 580e6;

    private BoltedJoint() {
    }

    /** Separating force on a cover: p · π G² / 4 with G the effective seal diameter. */
    public static double separatingForceN(double gaugePressurePa, double sealDiameterM) {
        if (!(sealDiameterM > 0)) {
            throw new IllegalArgumentException("seal diameter must be positive, found " + sealDiameterM + " m");
        }
        return gaugePressurePa * Math.PI * sealDiameterM * sealDiameterM / 4;
    }

    /** Load on each of n screws, sharing equally, plus a seating load per screw. */
    public static double loadPerScrewN(double separatingForceN, int screwCount, double seatingLoadPerScrewN) {
        if (screwCount < 1) {
            throw new IllegalArgumentException("screw count must be at least 1, found " + screwCount);
        }
        return separatingForceN / screwCount + seatingLoadPerScrewN;
    }

    /**
     * Tensile stress area of an ISO metric coarse thread: π/4 · (d − 0.9382 P)² (ISO 898-1, from memory; gives
     * 5.03 mm² for M3 × 0.5, the tabulated value).
     */
    public static double tensileStressAreaMm2(double nominalDiameterMm, double pitchMm) {
        double ds = nominalDiameterMm - 0.9382 * pitchMm;
        return Math.PI / 4 * ds * ds;
    }

    /** Proof load of a screw: stress area × proof stress. */
    public static double screwProofLoadN(double nominalDiameterMm, double pitchMm, double proofStressPa) {
        return tensileStressAreaMm2(nominalDiameterMm, pitchMm) * 1e-6 * proofStressPa;
    }

    /**
     * Pull-out capacity of a threaded insert or screw anchored in a printed boss, modelled as shear of a cylinder
     * of the anchor's outer diameter over its engaged length, loaded across the layers:
     * π · d_anchor · L · τ, with τ taken as half the across-layer tensile strength (Tresca, engineering
     * judgement; not a published pull-out value — measured pull-out tests are the better source).
     */
    public static double printedBossPullOutN(double anchorOuterDiameterMm, double engagedLengthMm,
            double acrossLayerStrengthPa) {
        if (!(anchorOuterDiameterMm > 0 && engagedLengthMm > 0 && acrossLayerStrengthPa > 0)) {
            throw new IllegalArgumentException("anchor diameter, length and strength must be positive");
        }
        double shearAreaM2 = Math.PI * anchorOuterDiameterMm * engagedLengthMm * 1e-6;
        return shearAreaM2 * 0.5 * acrossLayerStrengthPa;
    }
}
