package org.shearstack.spec;

/**
 * The physical dimension of a quantity and the canonical unit every value of that dimension is stored in
 * once parsed. Geometry is in millimetres (areas mm²); everything else is SI. Pressures are stored
 * absolute; the parser converts gauge values with the spec's ambient pressure.
 */
public enum Dimension {
    DIMENSIONLESS("1"),
    COUNT("1"),
    LENGTH("mm"),
    AREA("mm2"),
    VOLUME("m3"),
    PRESSURE("Pa"),
    TEMPERATURE("K"),
    TIME("s"),
    ANGULAR_SPEED("rad/s"),
    ANGLE("deg"),
    MASS("kg"),
    MASS_FLOW("kg/s"),
    VOLUME_FLOW("m3/s"),
    CONDUCTANCE("m3/(s*Pa)"),
    DENSITY("kg/m3"),
    STRESS("Pa"),
    FORCE("N"),
    TORQUE("N*m"),
    POWER("W"),
    VOLTAGE("V"),
    CURRENT("A"),
    RESISTANCE("ohm"),
    SPEED("m/s"),
    INERTIA("kg*m2"),
    VISCOSITY("Pa*s"),
    TEXT("");

    private final String canonicalUnit;

    Dimension(String canonicalUnit) {
        this.canonicalUnit = canonicalUnit;
    }

    /** The unit symbol values of this dimension are stored in. */
    public String canonicalUnit() {
        return canonicalUnit;
    }
}
