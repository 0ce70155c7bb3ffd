package org.shearstack.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.api.Test;

class QuantityParserTest {

    private static final double AMBIENT = 101_325.0; // ISO 2533 standard atmosphere
    private static final double TIGHT = 1e-9;

    private static double parse(String text, Dimension d) {
        QuantityParser.Parsed p = QuantityParser.parse(text, d, AMBIENT, false);
        return p.quantity().orElseThrow(() -> new AssertionError(p.expected() + " / " + p.found())).value();
    }

    @Test
    void lengthsConvertToMillimetres() {
        assertEquals(25.4, parse("1 in", Dimension.LENGTH), TIGHT); // inch = 25.4 mm exactly (1959 international yard)
        assertEquals(12.5, parse("1.25 cm", Dimension.LENGTH), TIGHT);
        assertEquals(0.05, parse("50 um", Dimension.LENGTH), TIGHT);
        assertEquals(-0.1, parse("-0.1 mm", Dimension.LENGTH), TIGHT);
        assertEquals(1500, parse("1.5e3 mm", Dimension.LENGTH), TIGHT);
    }

    @Test
    void gaugePressuresAddAmbientAndBareUnitsAreGauge() {
        // 1 bar = 100 000 Pa by definition (SI Brochure, 9th ed., Table 8)
        assertEquals(600_000 + AMBIENT, parse("6 bar(g)", Dimension.PRESSURE), 1e-6);
        assertEquals(600_000 + AMBIENT, parse("6 bar", Dimension.PRESSURE), 1e-6);
        assertEquals(700_000, parse("7 bar(a)", Dimension.PRESSURE), 1e-6);
        // 1 psi = 6894.757 Pa (NIST SP 811, 2008, Appendix B.8)
        assertEquals(100 * 6894.757 + AMBIENT, parse("100 psig", Dimension.PRESSURE), 0.1);
        assertEquals(14.696 * 6894.757, parse("14.696 psia", Dimension.PRESSURE), 0.1);
        assertEquals(AMBIENT + 350_000, parse("350 kPa(g)", Dimension.PRESSURE), 1e-6);
    }

    @Test
    void absoluteByNatureRefusesGauge() {
        QuantityParser.Parsed p = QuantityParser.parse("1 bar(g)", Dimension.PRESSURE, AMBIENT, true);
        assertFalse(p.ok());
        assertEquals("an absolute pressure, e.g. \"1.013 bar(a)\"", p.expected());
        assertEquals(101_300, QuantityParser.parse("1.013 bar", Dimension.PRESSURE, AMBIENT, true)
                .quantity().orElseThrow().value(), 1e-6);
    }

    @Test
    void temperaturesSpeedsAndFlows() {
        assertEquals(293.15, parse("20 degC", Dimension.TEMPERATURE), TIGHT);
        assertEquals(273.15, parse("32 degF", Dimension.TEMPERATURE), 1e-9); // water freezes at 32 degF = 0 degC
        assertEquals(373.15, parse("212 degF", Dimension.TEMPERATURE), 1e-9); // and boils at 212 degF = 100 degC
        assertEquals(2 * Math.PI * 250, parse("15000 rpm", Dimension.ANGULAR_SPEED), 1e-9);
        assertEquals(2 * Math.PI * 250, parse("15 krpm", Dimension.ANGULAR_SPEED), 1e-9);
        assertEquals(2 * Math.PI * 250, parse("250 Hz", Dimension.ANGULAR_SPEED), 1e-9);
        assertEquals(1.5e-3, parse("90 L/min", Dimension.VOLUME_FLOW), 1e-15);
        assertEquals(6e-9, parse("0.6 dm3/(s*bar)", Dimension.CONDUCTANCE), 1e-20);
        assertEquals(0.024, parse("24 L", Dimension.VOLUME), 1e-15);
        assertEquals(1270, parse("1.27 g/cm3", Dimension.DENSITY), 1e-9);
        assertEquals(2e9, parse("2 GPa", Dimension.STRESS), 1e-3);
        assertEquals(5e-3, parse("5 mN*m", Dimension.TORQUE), 1e-15);
        assertEquals(2e-7, parse("2 g*cm2", Dimension.INERTIA), 1e-20);
        assertEquals(0.9, parse("90 %", Dimension.DIMENSIONLESS), 1e-12);
        assertEquals(0.9, parse("0.9", Dimension.DIMENSIONLESS), 1e-12);
        assertEquals(180, parse("3.141592653589793 rad", Dimension.ANGLE), 1e-9);
    }

    @Test
    void failuresSayWhatWasExpectedAndFound() {
        QuantityParser.Parsed wrong = QuantityParser.parse("6 mm", Dimension.PRESSURE, AMBIENT, false);
        assertEquals("a pressure with a unit, e.g. \"6 bar(g)\"", wrong.expected());
        assertEquals("a length \"6 mm\"", wrong.found());
        QuantityParser.Parsed noUnit = QuantityParser.parse("0.75", Dimension.LENGTH, AMBIENT, false);
        assertEquals("no unit in \"0.75\"", noUnit.found());
        QuantityParser.Parsed unknown = QuantityParser.parse("6 barr", Dimension.PRESSURE, AMBIENT, false);
        assertEquals("unknown unit \"barr\"", unknown.found());
        QuantityParser.Parsed count = QuantityParser.parse("2.5", Dimension.COUNT, AMBIENT, false);
        assertEquals("a whole number, e.g. \"3\"", count.expected());
        QuantityParser.Parsed huge = QuantityParser.parse("1e999 mm", Dimension.LENGTH, AMBIENT, false);
        assertFalse(huge.ok());
    }
}
