package org.shearstack.physics.stress;

/**
 * A safety factor on stress: strength divided by the working stress at the highest speed the air can reach.
 * Because disc stress grows with ω², the same margin expressed on speed is √factor (physics.md §12.7).
 *
 * @param onStress the factor on stress, within [{@link #MIN}, {@link #MAX}]
 */
public record SafetyFactor(double onStress) {

    /** Default 3 on stress (≈ 1.73 on speed): the value in the spec sketch; engineering judgement. */
    public static final double DEFAULT = 3.0;
    /**
     * Lowest factor a user may set: 2 on stress. physics.md §4.3 suggests ≥ 2 on burst speed (4 on stress)
     * plus a containment housing; below 2 on stress the scatter of printed strength alone can eat the margin
     * (engineering judgement).
     */
    public static final double MIN = 2.0;
    /** Highest factor accepted (a guard against unit mistakes such as 300 for 3). */
    public static final double MAX = 20.0;

    public SafetyFactor {
        if (!(onStress >= MIN && onStress <= MAX)) {
            throw new IllegalArgumentException("safety factor on stress must be between " + MIN + " and " + MAX
                    + ", found " + onStress);
        }
    }

    public static SafetyFactor standard() {
        return new SafetyFactor(DEFAULT);
    }

    /** The same margin on speed: √(factor on stress). */
    public double onSpeed() {
        return Math.sqrt(onStress);
    }

    /** Allowable stress for a strength. */
    public double allowableStressPa(double strengthPa) {
        return strengthPa / onStress;
    }

    /** Allowable speed for a burst speed. */
    public double allowableSpeedRadPerS(double burstSpeedRadPerS) {
        return burstSpeedRadPerS / onSpeed();
    }
}
