package org.shearstack.physics.dyno;

import java.util.Arrays;
import java.util.Optional;

/**
 * A tachometer log in SI units: strictly increasing sample times (s), rotor speed (rad/s) and, when
 * logged, generator terminal voltage (V) and current (A). Immutable; arrays are copied in and out.
 */
public final class SpeedLog {
    private final double[] timeS;
    private final double[] speedRadPerS;
    private final double[] voltageV;
    private final double[] currentA;

    private SpeedLog(double[] timeS, double[] speedRadPerS, double[] voltageV, double[] currentA) {
        this.timeS = timeS;
        this.speedRadPerS = speedRadPerS;
        this.voltageV = voltageV;
        this.currentA = currentA;
    }

    /** A log without electrical columns. */
    public static SpeedLog of(double[] timeS, double[] speedRadPerS) {
        return of(timeS, speedRadPerS, null, null);
    }

    /**
     * A log; voltage and current may be null (not logged).
     *
     * @throws IllegalArgumentException when lengths differ, a value is not finite or time does not increase
     */
    public static SpeedLog of(double[] timeS, double[] speedRadPerS, double[] voltageV, double[] currentA) {
        int n = timeS.length;
        check(speedRadPerS, n, "speed");
        if (voltageV != null) {
            check(voltageV, n, "voltage");
        }
        if (currentA != null) {
            check(currentA, n, "current");
        }
        check(timeS, n, "time");
        for (int i = 1; i < n; i++) {
            if (!(timeS[i] > timeS[i - 1])) {
                throw new IllegalArgumentException("time must increase: sample " + i + " has " + timeS[i]
                        + " s after " + timeS[i - 1] + " s");
            }
        }
        return new SpeedLog(timeS.clone(), speedRadPerS.clone(),
                voltageV == null ? null : voltageV.clone(), currentA == null ? null : currentA.clone());
    }

    private static void check(double[] a, int n, String what) {
        if (a.length != n) {
            throw new IllegalArgumentException(what + " has " + a.length + " samples, time has " + n);
        }
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(a[i])) {
                throw new IllegalArgumentException(what + " sample " + i + " is not a finite number");
            }
        }
    }

    public int size() {
        return timeS.length;
    }

    public double timeS(int i) {
        return timeS[i];
    }

    public double speedRadPerS(int i) {
        return speedRadPerS[i];
    }

    public double[] timesS() {
        return timeS.clone();
    }

    public double[] speedsRadPerS() {
        return speedRadPerS.clone();
    }

    public boolean hasElectrical() {
        return voltageV != null && currentA != null;
    }

    public Optional<double[]> voltagesV() {
        return Optional.ofNullable(voltageV).map(double[]::clone);
    }

    public Optional<double[]> currentsA() {
        return Optional.ofNullable(currentA).map(double[]::clone);
    }

    /** Median sample period in seconds. */
    public double medianPeriodS() {
        double[] d = new double[size() - 1];
        for (int i = 1; i < size(); i++) {
            d[i - 1] = timeS[i] - timeS[i - 1];
        }
        Arrays.sort(d);
        return d.length == 0 ? Double.NaN : d[d.length / 2];
    }

    /** The samples from index {@code from} (inclusive) to {@code to} (exclusive). */
    public SpeedLog slice(int from, int to) {
        return new SpeedLog(Arrays.copyOfRange(timeS, from, to), Arrays.copyOfRange(speedRadPerS, from, to),
                voltageV == null ? null : Arrays.copyOfRange(voltageV, from, to),
                currentA == null ? null : Arrays.copyOfRange(currentA, from, to));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SpeedLog s && Arrays.equals(timeS, s.timeS) && Arrays.equals(speedRadPerS, s.speedRadPerS)
                && Arrays.equals(voltageV, s.voltageV) && Arrays.equals(currentA, s.currentA);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(timeS) + Arrays.hashCode(speedRadPerS);
    }

    @Override
    public String toString() {
        return "SpeedLog[" + size() + " samples, " + (size() == 0 ? "" : timeS[0] + ".." + timeS[size() - 1] + " s") + "]";
    }
}
