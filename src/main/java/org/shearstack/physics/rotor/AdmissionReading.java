package org.shearstack.physics.rotor;

/**
 * How the part of the jet that strikes disc rims rather than gaps (1 − φ) is treated (physics.md §12.2).
 * Neither reading ever lets rim-struck flow enter at the rim speed when the jet is slower than the rim:
 * that would create angular momentum from nothing.
 */
public enum AdmissionReading {
    /** Only φ·ṁ enters the gaps with the jet's swirl; the rest finds its way to the exhaust without doing work. */
    JET_FRACTION_ONLY,
    /** All flow enters the gaps; the rim-struck part keeps at most min(V_θ,jet, Ω r₂) of swirl. */
    RIM_STRUCK_CAPPED
}
