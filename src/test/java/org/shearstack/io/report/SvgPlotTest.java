package org.shearstack.io.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class SvgPlotTest {

    private static SvgPlot plot(double xMax, double yMax) {
        return SvgPlot.of("t", "speed (rpm)", "power (W)",
                List.of(new SvgPlot.Series("s", "est", new double[] {0, xMax}, new double[] {0, yMax})), List.of(),
                List.of(new SvgPlot.Mark("m", xMax / 2, yMax / 2)));
    }

    @Test
    void axesRoundOutToNiceSteps() {
        SvgPlot p = plot(20521, 5.77);
        assertArrayEquals(new double[] {0, 25000}, p.xRange(), 1e-9); // 20521 / 5 = 4104, step 5000
        assertArrayEquals(new double[] {0, 6}, p.yRange(), 1e-9);     // 5.77 / 5 = 1.154, step 2
    }

    @Test
    void dataMapsLinearlyOntoThePlotArea() {
        SvgPlot p = plot(100, 10);
        assertEquals(SvgPlot.LEFT, p.xPx(p.xRange()[0]), 1e-9);
        assertEquals(SvgPlot.WIDTH - SvgPlot.RIGHT, p.xPx(p.xRange()[1]), 1e-9);
        assertEquals(SvgPlot.HEIGHT - SvgPlot.BOTTOM, p.yPx(p.yRange()[0]), 1e-9);
        assertEquals(SvgPlot.TOP, p.yPx(p.yRange()[1]), 1e-9);
        assertEquals((p.xPx(0) + p.xPx(100)) / 2, p.xPx(50), 1e-9);
    }

    @Test
    void niceStepsAreOneTwoTwoAndAHalfOrFiveTimesAPowerOfTen() {
        assertEquals(1.0, SvgPlot.Axis.nice(0.9), 1e-12);
        assertEquals(2.0, SvgPlot.Axis.nice(1.2), 1e-12);
        assertEquals(2.5, SvgPlot.Axis.nice(2.2), 1e-12);
        assertEquals(5000.0, SvgPlot.Axis.nice(4104), 1e-9);
        assertEquals(0.05, SvgPlot.Axis.nice(0.031), 1e-12);
    }

    @Test
    void tickLabelsShowJustEnoughDecimals() {
        SvgPlot.Axis a = SvgPlot.Axis.of(0, 0.0123);
        assertEquals("0.0025", a.label(0.0025));
        assertEquals("0", a.label(0));
        assertEquals("2000", SvgPlot.Axis.of(0, 9000).label(2000));
        String svg = plot(100, 10).svg();
        assertTrue(svg.contains(">speed (rpm)</text>") && svg.contains(">power (W)</text>"));
    }
}
