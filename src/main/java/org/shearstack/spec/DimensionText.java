package org.shearstack.spec;

/** Words for a dimension in messages: a noun phrase and a written example. */
public final class DimensionText {

    private DimensionText() {
    }

    /** "a length", "a pressure", ... */
    public static String noun(Dimension d) {
        return switch (d) {
            case DIMENSIONLESS -> "a plain number";
            case COUNT -> "a whole number";
            case LENGTH -> "a length";
            case AREA -> "an area";
            case VOLUME -> "a volume";
            case PRESSURE -> "a pressure";
            case TEMPERATURE -> "a temperature";
            case TIME -> "a time";
            case ANGULAR_SPEED -> "a rotational speed";
            case ANGLE -> "an angle";
            case MASS -> "a mass";
            case MASS_FLOW -> "a mass flow";
            case VOLUME_FLOW -> "a volume flow";
            case CONDUCTANCE -> "a sonic conductance";
            case DENSITY -> "a density";
            case STRESS -> "a stress or modulus";
            case FORCE -> "a force";
            case TORQUE -> "a torque";
            case POWER -> "a power";
            case VOLTAGE -> "a voltage";
            case CURRENT -> "a current";
            case RESISTANCE -> "a resistance";
            case SPEED -> "a speed";
            case INERTIA -> "a moment of inertia";
            case VISCOSITY -> "a viscosity";
            case TEXT -> "text";
        };
    }

    /** A written example of a value of this dimension, e.g. "6 bar(g)". */
    public static String example(Dimension d) {
        return switch (d) {
            case DIMENSIONLESS -> "0.9";
            case COUNT -> "3";
            case LENGTH -> "0.75 mm";
            case AREA -> "4.9 mm2";
            case VOLUME -> "24 L";
            case PRESSURE -> "6 bar(g)";
            case TEMPERATURE -> "20 degC";
            case TIME -> "11 s";
            case ANGULAR_SPEED -> "15000 rpm";
            case ANGLE -> "10 deg";
            case MASS -> "25 g";
            case MASS_FLOW -> "2 g/s";
            case VOLUME_FLOW -> "90 L/min";
            case CONDUCTANCE -> "0.6 dm3/(s*bar)";
            case DENSITY -> "1.27 g/cm3";
            case STRESS -> "50 MPa";
            case FORCE -> "10 N";
            case TORQUE -> "5 mN*m";
            case POWER -> "2 W";
            case VOLTAGE -> "9 V";
            case CURRENT -> "0.5 A";
            case RESISTANCE -> "20 ohm";
            case SPEED -> "150 m/s";
            case INERTIA -> "20 g*cm2";
            case VISCOSITY -> "18.1e-6 Pa*s";
            case TEXT -> "name";
        };
    }
}
