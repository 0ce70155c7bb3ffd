package org.shearstack.rules.sizing;

import java.util.Locale;

/** What the sizing optimiser maximises (spec key targets.objective). */
public enum Objective {
    /** Shaft power at the target speed, or the best power below the tip-speed cap when no speed is given. */
    POWER,
    /** Efficiency on the isentropic power of the air, at the target speed or the best one below the cap. */
    EFFICIENCY;

    public static Objective parse(String text) {
        return valueOf(text.trim().toUpperCase(Locale.ROOT));
    }

    /** The value of this objective at one map point. */
    public double of(org.shearstack.physics.rotor.OperatingPoint p) {
        return this == POWER ? p.shaftPowerW() : p.efficiency();
    }
}
