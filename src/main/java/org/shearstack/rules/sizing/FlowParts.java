package org.shearstack.rules.sizing;

import static org.shearstack.rules.SpecKeys.NOZZLE_COUNT;
import static org.shearstack.rules.SpecKeys.NOZZLE_DISCHARGE_COEFFICIENT;
import static org.shearstack.rules.SpecKeys.NOZZLE_KIND;
import static org.shearstack.rules.SpecKeys.NOZZLE_THROAT_AREA;
import static org.shearstack.rules.SpecKeys.SUPPLY_AMBIENT;
import static org.shearstack.rules.SpecKeys.SUPPLY_PRESSURE;
import static org.shearstack.rules.SpecKeys.SUPPLY_TEMPERATURE;

import java.util.List;
import java.util.Locale;
import org.shearstack.physics.gas.Nozzle;
import org.shearstack.physics.gas.NozzleKind;
import org.shearstack.physics.supply.FlowCharacteristic;
import org.shearstack.physics.supply.SupplyPath;
import org.shearstack.rules.Key;

/** Builds the physics values (supply path, nozzle) from design values. */
final class FlowParts {

    /** Nozzle velocity coefficient of a short printed nozzle (engineering judgment, from memory). */
    static final double VELOCITY_COEFFICIENT = 0.95;

    /** Keys {@link #supply} reads. */
    static final List<Key> SUPPLY_READS = List.of(SUPPLY_PRESSURE, SUPPLY_TEMPERATURE, SUPPLY_AMBIENT,
            SizingKeys.SUPPLY_PATH_CONDUCTANCE, SizingKeys.SUPPLY_CRITICAL_PRESSURE_RATIO);

    /** Keys {@link #nozzle} reads (besides the exit area, optional). */
    static final List<Key> NOZZLE_READS = List.of(NOZZLE_KIND, NOZZLE_THROAT_AREA, SizingKeys.NOZZLE_EXIT_AREA,
            NOZZLE_COUNT, NOZZLE_DISCHARGE_COEFFICIENT);

    private FlowParts() {
    }

    static SupplyPath supply(Values v) {
        return new SupplyPath(v.get(SUPPLY_PRESSURE), v.get(SUPPLY_TEMPERATURE), v.get(SUPPLY_AMBIENT),
                new FlowCharacteristic(v.get(SizingKeys.SUPPLY_PATH_CONDUCTANCE),
                        v.get(SizingKeys.SUPPLY_CRITICAL_PRESSURE_RATIO), 0.5));
    }

    static int count(Values v) {
        return v.has(NOZZLE_COUNT) ? (int) Math.max(1, Math.round(v.get(NOZZLE_COUNT))) : 1;
    }

    static NozzleKind kind(String text) {
        return text.trim().toLowerCase(Locale.ROOT).startsWith("converging-diverging")
                ? NozzleKind.CONVERGING_DIVERGING : NozzleKind.CONVERGING;
    }

    /** Nozzle(s) with total areas: count × the per-nozzle throat and exit areas. */
    static Nozzle nozzle(Values v) {
        int n = count(v);
        double throat = n * v.get(NOZZLE_THROAT_AREA) * 1e-6;
        double cd = Math.min(1.0, v.get(NOZZLE_DISCHARGE_COEFFICIENT));
        NozzleKind kind = kind(v.text(NOZZLE_KIND));
        if (kind == NozzleKind.CONVERGING) {
            return Nozzle.converging(throat, cd, VELOCITY_COEFFICIENT);
        }
        double exit = Math.max(throat, n * v.get(SizingKeys.NOZZLE_EXIT_AREA) * 1e-6);
        return new Nozzle(kind, throat, exit, cd, VELOCITY_COEFFICIENT);
    }
}
