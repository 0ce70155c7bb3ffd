package org.shearstack.spec;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.shearstack.spec.Unit.PressureReference;

/**
 * The one table of unit symbols a spec or profile may use, and their factors to the canonical units of
 * {@link Dimension}. Lookups are exact and case-sensitive ("mm", "MPa", "L/min").
 *
 * <p>Conventions: "Hz" and "rev/s" are revolutions per second (2π rad/s); a bare pressure unit is gauge
 * (what a shop gauge reads) except for keys that are absolute by nature; volume flows of air are free-air
 * (ISO 8778 reference atmosphere) volumes when the key says so.
 */
public final class Units {

    private static final double PSI_PA = 6894.757293168361; // 1 lbf/in² (NIST SP 811, exact from lb and in)
    private static final double INCH_MM = 25.4;             // exact by definition (1959)
    private static final double TWO_PI = 2 * Math.PI;

    private static final List<Unit> TABLE = build();

    private Units() {
    }

    private static List<Unit> build() {
        List<Unit> t = new ArrayList<>();
        add(t, Dimension.LENGTH, "mm", 1, "cm", 10, "m", 1000, "in", INCH_MM, "um", 1e-3, "µm", 1e-3);
        add(t, Dimension.AREA, "mm2", 1, "cm2", 100, "m2", 1e6, "in2", INCH_MM * INCH_MM);
        add(t, Dimension.VOLUME, "m3", 1, "L", 1e-3, "l", 1e-3, "dm3", 1e-3, "mL", 1e-6, "cm3", 1e-6, "mm3", 1e-9);
        pressure(t, "Pa", 1);
        pressure(t, "kPa", 1e3);
        pressure(t, "MPa", 1e6);
        pressure(t, "bar", 1e5);
        pressure(t, "psi", PSI_PA);
        t.add(new Unit("psig", Dimension.PRESSURE, PSI_PA, 0, PressureReference.GAUGE));
        t.add(new Unit("psia", Dimension.PRESSURE, PSI_PA, 0, PressureReference.ABSOLUTE));
        add(t, Dimension.STRESS, "Pa", 1, "kPa", 1e3, "MPa", 1e6, "GPa", 1e9, "N/mm2", 1e6, "psi", PSI_PA);
        t.add(new Unit("K", Dimension.TEMPERATURE, 1, 0, PressureReference.NONE));
        t.add(new Unit("degC", Dimension.TEMPERATURE, 1, 273.15, PressureReference.NONE));
        t.add(new Unit("°C", Dimension.TEMPERATURE, 1, 273.15, PressureReference.NONE));
        t.add(new Unit("degF", Dimension.TEMPERATURE, 5.0 / 9.0, 273.15 - 32 * 5.0 / 9.0, PressureReference.NONE));
        add(t, Dimension.TIME, "s", 1, "ms", 1e-3, "min", 60, "h", 3600);
        add(t, Dimension.ANGULAR_SPEED, "rad/s", 1, "rpm", TWO_PI / 60, "krpm", TWO_PI * 1000 / 60,
                "Hz", TWO_PI, "rev/s", TWO_PI);
        add(t, Dimension.ANGLE, "deg", 1, "°", 1, "rad", 180 / Math.PI);
        add(t, Dimension.MASS, "kg", 1, "g", 1e-3, "mg", 1e-6);
        add(t, Dimension.MASS_FLOW, "kg/s", 1, "g/s", 1e-3, "kg/h", 1.0 / 3600, "g/min", 1e-3 / 60);
        add(t, Dimension.VOLUME_FLOW, "m3/s", 1, "L/min", 1e-3 / 60, "l/min", 1e-3 / 60, "L/s", 1e-3,
                "dm3/s", 1e-3, "dm3/min", 1e-3 / 60, "m3/h", 1.0 / 3600, "m3/min", 1.0 / 60,
                "mm3/s", 1e-9, "cfm", 0.028316846592 / 60);
        add(t, Dimension.CONDUCTANCE, "m3/(s*Pa)", 1, "dm3/(s*bar)", 1e-3 / 1e5, "L/(s*bar)", 1e-3 / 1e5);
        add(t, Dimension.DENSITY, "kg/m3", 1, "g/cm3", 1000, "g/mL", 1000);
        add(t, Dimension.FORCE, "N", 1, "kN", 1e3, "mN", 1e-3);
        add(t, Dimension.TORQUE, "N*m", 1, "mN*m", 1e-3, "N*mm", 1e-3, "uN*m", 1e-6);
        add(t, Dimension.POWER, "W", 1, "mW", 1e-3, "kW", 1e3);
        add(t, Dimension.VOLTAGE, "V", 1, "mV", 1e-3);
        add(t, Dimension.CURRENT, "A", 1, "mA", 1e-3);
        add(t, Dimension.RESISTANCE, "ohm", 1, "kohm", 1e3, "mohm", 1e-3, "Ω", 1);
        add(t, Dimension.SPEED, "m/s", 1, "mm/s", 1e-3, "km/h", 1 / 3.6);
        add(t, Dimension.INERTIA, "kg*m2", 1, "kg*mm2", 1e-6, "g*cm2", 1e-7, "g*mm2", 1e-9);
        add(t, Dimension.VISCOSITY, "Pa*s", 1, "mPa*s", 1e-3);
        add(t, Dimension.DIMENSIONLESS, "", 1, "%", 0.01);
        add(t, Dimension.COUNT, "", 1);
        return Collections.unmodifiableList(t);
    }

    private static void add(List<Unit> t, Dimension d, Object... symbolFactorPairs) {
        for (int i = 0; i < symbolFactorPairs.length; i += 2) {
            t.add(new Unit((String) symbolFactorPairs[i], d, ((Number) symbolFactorPairs[i + 1]).doubleValue(), 0,
                    PressureReference.NONE));
        }
    }

    private static void pressure(List<Unit> t, String base, double factor) {
        t.add(new Unit(base, Dimension.PRESSURE, factor, 0, PressureReference.UNSTATED));
        t.add(new Unit(base + "(g)", Dimension.PRESSURE, factor, 0, PressureReference.GAUGE));
        t.add(new Unit(base + "(a)", Dimension.PRESSURE, factor, 0, PressureReference.ABSOLUTE));
    }

    /** The unit with this symbol for this dimension, if the table has it. */
    public static Optional<Unit> find(String symbol, Dimension dimension) {
        for (Unit u : TABLE) {
            if (u.dimension() == dimension && u.symbol().equals(symbol)) {
                return Optional.of(u);
            }
        }
        return Optional.empty();
    }

    /** Every dimension that knows this symbol (to say "that is a length" when a pressure was expected). */
    public static List<Dimension> dimensionsOf(String symbol) {
        List<Dimension> result = new ArrayList<>();
        for (Unit u : TABLE) {
            if (u.symbol().equals(symbol) && !result.contains(u.dimension())) {
                result.add(u.dimension());
            }
        }
        return result;
    }

    /** The symbols accepted for a dimension, in table order, for messages and documentation. */
    public static List<String> symbols(Dimension dimension) {
        List<String> result = new ArrayList<>();
        for (Unit u : TABLE) {
            if (u.dimension() == dimension && !u.symbol().isEmpty()) {
                result.add(u.symbol());
            }
        }
        return result;
    }

    /** The whole table grouped by dimension, for the README and {@code --help}. */
    public static Map<Dimension, List<String>> table() {
        Map<Dimension, List<String>> result = new LinkedHashMap<>();
        for (Dimension d : Dimension.values()) {
            List<String> s = symbols(d);
            if (!s.isEmpty()) {
                result.put(d, s);
            }
        }
        return result;
    }
}
