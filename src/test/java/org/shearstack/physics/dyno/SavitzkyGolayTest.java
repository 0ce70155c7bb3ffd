package org.shearstack.physics.dyno;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class SavitzkyGolayTest {
    private static final double EXACT = 1e-14;

    /** MS-03: Savitzky & Golay 1964, Anal. Chem. 36(8):1627, tables of convolution integers (quadratic, 5 points). */
    @Test
    void fivePointQuadraticCoefficientsMatchPublishedTable() {
        assertArrayEquals(new double[] {-3 / 35.0, 12 / 35.0, 17 / 35.0, 12 / 35.0, -3 / 35.0},
                SavitzkyGolay.coefficients(5, 2, 0), EXACT);
        assertArrayEquals(new double[] {-2 / 10.0, -1 / 10.0, 0, 1 / 10.0, 2 / 10.0},
                SavitzkyGolay.coefficients(5, 2, 1), EXACT);
    }

    /** Savitzky & Golay 1964 (same tables): 7-point first derivative (−3..3)/28; physics.md §8.2. */
    @Test
    void sevenPointDerivativeCoefficients() {
        assertArrayEquals(new double[] {-3 / 28.0, -2 / 28.0, -1 / 28.0, 0, 1 / 28.0, 2 / 28.0, 3 / 28.0},
                SavitzkyGolay.coefficients(7, 2, 1), EXACT);
    }

    /** MS-02: ω = 100 + 20 t − 3 t², h = 0.1 s, dω/dt at t = 1 s is 14 (derived, physics.md §8.2). */
    @Test
    void derivativeIsExactOnAQuadratic() {
        double h = 0.1;
        double[] c = SavitzkyGolay.coefficients(5, 2, 1);
        double d = 0;
        for (int j = 0; j < 5; j++) {
            double t = 1 + (j - 2) * h;
            d += c[j] * (100 + 20 * t - 3 * t * t);
        }
        assertEquals(14.000, d / h, 1e-12);
    }

    /** Quadratic data are reproduced exactly everywhere, also at the ends and on uneven time stamps. */
    @Test
    void movingFitReproducesAQuadraticOnUnevenTimes() {
        int n = 40;
        double[] t = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = 0.1 * i + 0.03 * Math.sin(7.0 * i);
            y[i] = 100 + 20 * t[i] - 3 * t[i] * t[i];
        }
        SavitzkyGolay.Smoothed s = SavitzkyGolay.apply(t, y, 9, 2);
        for (int i = 0; i < n; i++) {
            assertEquals(y[i], s.value()[i], 1e-9, "value at " + i);
            assertEquals(20 - 6 * t[i], s.perSecond()[i], 1e-9, "slope at " + i);
        }
    }

    /** Per-sample windows (5 to 15 points) still reproduce a quadratic exactly. */
    @Test
    void perSampleWindowsAreExactOnAQuadratic() {
        int n = 40;
        double[] t = new double[n];
        double[] y = new double[n];
        int[] w = new int[n];
        for (int i = 0; i < n; i++) {
            t[i] = 0.05 * i;
            y[i] = 100 + 20 * t[i] - 3 * t[i] * t[i];
            w[i] = 5 + 2 * (i % 6);
        }
        SavitzkyGolay.Smoothed s = SavitzkyGolay.apply(t, y, w, 2);
        for (int i = 0; i < n; i++) {
            assertEquals(20 - 6 * t[i], s.perSecond()[i], 1e-9, "slope at " + i);
        }
    }

    @Test
    void rejectsEvenWindowWithMessage() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SavitzkyGolay.coefficients(4, 2, 1));
        assertEquals("window must be a positive odd number of points, found 4", e.getMessage());
    }
}
