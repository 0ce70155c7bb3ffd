package org.shearstack.rules.sizing;

import static org.shearstack.spec.Dimension.ANGULAR_SPEED;
import static org.shearstack.spec.Dimension.CONDUCTANCE;
import static org.shearstack.spec.Dimension.DIMENSIONLESS;
import static org.shearstack.spec.Dimension.MASS_FLOW;
import static org.shearstack.spec.Dimension.POWER;
import static org.shearstack.spec.Dimension.PRESSURE;
import static org.shearstack.spec.Dimension.SPEED;
import static org.shearstack.spec.Dimension.TEMPERATURE;
import static org.shearstack.spec.Dimension.TORQUE;

import org.shearstack.rules.Key;

/**
 * Keys the flow sizing (SIZE-) rules write that are not spec keys. The rotor and nozzle keys they size are the
 * spec's own ({@code rotor.diameter}, {@code rotor.gap}, {@code nozzle.throat-area}, ...) so a value in the spec
 * pins them. Canonical units: pressures Pa absolute, speeds rad/s, lengths mm, areas mm².
 */
public final class SizingKeys {

    /** ISO 6358 sonic conductance of the supply path, from the spec's conductance, free-air flow or blow-down. */
    public static final Key SUPPLY_PATH_CONDUCTANCE = Key.of("supply.path-conductance", CONDUCTANCE);
    /** ISO 6358 critical pressure ratio b of the supply path. */
    public static final Key SUPPLY_CRITICAL_PRESSURE_RATIO = Key.of("supply.critical-pressure-ratio", DIMENSIONLESS);
    /** Plenum pressure at the operating point (path and nozzle in series). */
    public static final Key SUPPLY_PLENUM_PRESSURE = Key.of("supply.plenum-pressure", PRESSURE);
    /** Nozzle exit area (equals the throat for a converging nozzle). */
    public static final Key NOZZLE_EXIT_AREA = Key.of("nozzle.exit-area", org.shearstack.spec.Dimension.AREA);
    /** Jet speed discharging to ambient pressure (momentum-equivalent when under-expanded). */
    public static final Key NOZZLE_JET_SPEED = Key.of("nozzle.jet-speed", SPEED);
    /** Mass flow of supply and nozzle discharging to ambient pressure. */
    public static final Key NOZZLE_MASS_FLOW = Key.of("nozzle.mass-flow", MASS_FLOW);
    /** Jet static temperature (icing caution below 0 °C). */
    public static final Key NOZZLE_JET_TEMPERATURE = Key.of("nozzle.jet-static-temperature", TEMPERATURE);
    /** Burst-limited tip speed of a printed disc at the required safety factor on stress. */
    public static final Key ROTOR_TIP_SPEED_LIMIT = Key.of("rotor.tip-speed-limit", SPEED);
    /** Design rim speed at the operating point. */
    public static final Key ROTOR_TIP_SPEED = Key.of("rotor.tip-speed", SPEED);

    public static final Key RUNAWAY_SPEED = Key.of("performance.runaway-speed", ANGULAR_SPEED);
    /** Upper edge of the uncertainty band of the runaway speed: what safety checks must use. */
    public static final Key RUNAWAY_UPPER_BOUND = Key.of("performance.runaway-speed-upper-bound", ANGULAR_SPEED);
    public static final Key STALL_TORQUE = Key.of("performance.stall-torque", TORQUE);
    public static final Key OPERATING_SPEED = Key.of("performance.operating-speed", ANGULAR_SPEED);
    public static final Key OPERATING_POWER = Key.of("performance.operating-power", POWER);
    public static final Key OPERATING_EFFICIENCY = Key.of("performance.operating-efficiency", DIMENSIONLESS);
    public static final Key PERFORMANCE_MASS_FLOW = Key.of("performance.mass-flow", MASS_FLOW);
    public static final Key ELECTRICAL_POWER = Key.of("performance.electrical-power", POWER);
    public static final Key ADMISSION_FRACTION = Key.of("performance.admission-fraction", DIMENSIONLESS);
    public static final Key OUT_OF_RANGE_FRACTION = Key.of("performance.out-of-range-fraction", DIMENSIONLESS);
    /** 1 when SIZE-GAP's best gap is the upper end of its search range (a CAUTION), else 0. */
    public static final Key GAP_AT_SEARCH_BOUND = Key.of("rotor.gap-at-search-bound", DIMENSIONLESS);
    public static final Key EXIT_SWIRL_LOSS = Key.of("performance.exit-swirl-loss", POWER);

    private SizingKeys() {
    }
}
