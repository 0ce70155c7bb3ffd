package org.shearstack.assembly;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.shearstack.geom.GeometryContext;
import org.shearstack.part.Dims;
import org.shearstack.rules.geometry.TestDesigns;

class RotatingInertiaTest {
    private static final double PLA_KG_PER_M3 = 1240; // physics.md §4.3 (PLA density used for ST-01)

    /**
     * The discs dominate; one disc's inertia lies below the full annulus (π/2) ρ t (r_o⁴ − r_i⁴) with r_i the
     * hub bore half-width (exhaust ports and bore flats only remove material) and above the annulus
     * from the port circle outwards (Timoshenko-style thin-disc formula, physics.md §6.1 RD-05 form).
     */
    @Test
    void demoDesignDiscsAndTotal() {
        Dims d = Dims.of(TestDesigns.demo());
        RotatingInertia.Result r = RotatingInertia.of(d, GeometryContext.withChordTolerance(0.02), PLA_KG_PER_M3);
        RotatingInertia.Share disc = r.shares().stream().filter(s -> s.part().equals("rotor-disc")).findFirst()
                .orElseThrow();
        double t = d.discThickness() / 1000;
        double ro = d.discDiameter() / 2000;
        double full = Math.PI / 2 * PLA_KG_PER_M3 * t * (Math.pow(ro, 4) - Math.pow(d.discBoreAcrossFlats() / 2000, 4));
        double outerRing = Math.PI / 2 * PLA_KG_PER_M3 * t
                * (Math.pow(ro, 4) - Math.pow((d.portCircleDiameter() + d.portDiameter()) / 2000, 4));
        assertTrue(disc.eachKgM2() < full && disc.eachKgM2() > outerRing,
                disc.eachKgM2() + " not in (" + outerRing + ", " + full + ")");
        double sum = r.metalShaftKgM2();
        for (RotatingInertia.Share s : r.shares()) {
            sum += s.totalKgM2();
        }
        assertEquals(sum, r.totalKgM2(), 1e-15);
        assertTrue(r.shares().stream().noneMatch(s -> s.part().startsWith("housing") || s.part().startsWith("cover")));
    }
}
