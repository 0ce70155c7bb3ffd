package org.shearstack.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class InertiaConverterTest {
    /** Unit definitions: 1 kg·mm² = 1e-6 kg·m², 1 g·cm² = 1e-7 kg·m², 1 g·mm² = 1e-9 kg·m² (SI prefixes). */
    @Test
    void convertsCommonCadUnits() {
        assertEquals(1.2e-4, InertiaConverter.parseKgM2("1.2e-4"), 1e-18);
        assertEquals(1.2e-4, InertiaConverter.parseKgM2("120 kg*mm^2"), 1e-18);
        assertEquals(2.5e-6, InertiaConverter.parseKgM2("25 g*cm^2"), 1e-18);
        assertEquals(2.5e-6, InertiaConverter.parseKgM2("2500 g·mm²"), 1e-18);
        assertEquals(3e-5, InertiaConverter.parseKgM2("3e-5 kg*m2"), 1e-18);
    }
}
