package org.shearstack.check.print;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.shearstack.check.Finding;
import org.shearstack.check.Severity;
import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;

/**
 * Parts made to be too thin, too close, to overhang, to bridge too far, to float and to stand on a point, and
 * parts made to pass. Limits: a 0.4 mm nozzle printer (standards.md §7/§8: line width 0.45, layer 0.2,
 * 45° overhang, 10 mm bridge; minimum gap 0.3 mm).
 */
class PrintabilityTest {

    static final GeometryContext CTX = GeometryContext.standard();
    static final PrintLimits LIMITS = PrintLimits.generic04();

    static List<Finding> check(LayeredSolid s) {
        return Printability.check("test-part", s, LIMITS);
    }

    static List<String> codes(List<Finding> f) {
        return f.stream().map(Finding::code).distinct().sorted().collect(Collectors.toList());
    }

    @Test
    void plainBlockPasses() {
        assertEquals(List.of(), check(LayeredSolid.extrusion(Region.rectangle(CTX, 0, 0, 20, 20), 0, 10)));
    }

    @Test
    void tubeWithSixTenthsWallIsThin() {
        // 0.6 mm wall: above the 0.4 mm nozzle, below two line widths (0.9 mm)
        Region tube = Region.annulus(CTX, 0, 0, 21.2, 20);
        LayeredSolid plainTube = LayeredSolid.extrusion(tube, 0, 5);
        List<Finding> g = check(plainTube);
        Finding thin = g.stream().filter(x -> x.code().equals("WALL-THIN")).findFirst().orElseThrow();
        assertEquals(0.6, thin.measured(), 0.02);
        assertEquals(0.9, thin.limit(), 1e-12);
        assertTrue(thin.where().isKnown());
        double r = Math.hypot(thin.where().xMm(), thin.where().yMm());
        assertEquals(10.3, r, 0.05);
    }

    @Test
    void freeStandingFinNarrowerThanNozzleFails() {
        Region parts = Region.rectangle(CTX, 0, 0, 10, 10).union(Region.rectangle(CTX, 12, 4.85, 18, 5.15));
        List<Finding> f = check(LayeredSolid.extrusion(parts, 0, 3));
        Finding fin = f.stream().filter(x -> x.code().equals("PRINT-FEATURE-SMALL")).findFirst().orElseThrow();
        assertEquals(Severity.FAIL, fin.severity());
        assertEquals(0.3, fin.measured(), 0.02);
        assertTrue(fin.where().xMm() > 12 && fin.where().xMm() < 18, fin.toString());
    }

    @Test
    void attachedFinNarrowerThanNozzleIsACaution() {
        Region base = Region.rectangle(CTX, 0, 0, 10, 10).union(Region.rectangle(CTX, 10, 4.85, 16, 5.15));
        List<Finding> f = check(LayeredSolid.extrusion(base, 0, 3));
        Finding fin = f.stream().filter(x -> x.code().equals("WALL-THIN")).findFirst().orElseThrow();
        assertEquals(Severity.CAUTION, fin.severity());
        assertTrue(fin.message().contains("narrower than the nozzle"), fin.message());
        assertTrue(f.stream().noneMatch(x -> x.severity() == Severity.FAIL), f.toString());
    }

    @Test
    void narrowSlotIsFlagged() {
        Region slotted = Region.rectangle(CTX, 0, 0, 20, 10).minus(Region.rectangle(CTX, 5, 2, 15, 2.2));
        Finding g = check(LayeredSolid.extrusion(slotted, 0, 2)).stream()
                .filter(x -> x.code().equals("GAP-NARROW")).findFirst().orElseThrow();
        assertEquals(0.2, g.measured(), 0.02);
        assertEquals(1.0, g.where().zMm() + 1, 1e-9);
    }

    @Test
    void mushroomCapOverhangs() {
        // 4 × 5 stem, then a 24 × 5 cap: 10 mm ledges on both sides at z = 10
        LayeredSolid s = LayeredSolid.builder(CTX)
                .slab(0, 10, Region.rectangle(CTX, 10, 0, 14, 5))
                .slab(10, 12, Region.rectangle(CTX, 0, 0, 24, 5))
                .build();
        List<Finding> f = check(s);
        List<Finding> over = f.stream().filter(x -> x.code().equals("OVERHANG")).collect(Collectors.toList());
        assertEquals(2, over.size(), f.toString());
        assertEquals(10, over.get(0).measured(), 0.05);
        assertEquals(10, over.get(0).where().zMm(), 1e-9);
        assertTrue(codes(f).contains("FIRST-LAYER-SMALL"));
    }

    @Test
    void fortyFiveDegreeStepsPass() {
        // a cone in one-layer steps of 0.2 mm outwards per 0.2 mm layer: exactly 45°
        LayeredSolid.Builder b = LayeredSolid.builder(CTX);
        for (int i = 0; i < 20; i++) {
            b.slab(i * 0.2, (i + 1) * 0.2, Region.disc(CTX, 0, 0, 20 + 0.4 * i));
        }
        assertEquals(List.of(), check(b.build()));
    }

    @Test
    void longBridgeAndShortBridge() {
        LayeredSolid longOne = LayeredSolid.builder(CTX)
                .slab(0, 10, Region.rectangle(CTX, 0, 0, 5, 10).union(Region.rectangle(CTX, 25, 0, 30, 10)))
                .slab(10, 12, Region.rectangle(CTX, 0, 0, 30, 10))
                .build();
        Finding bridge = check(longOne).stream().filter(x -> x.code().equals("BRIDGE-LONG")).findFirst().orElseThrow();
        // span between the pillars 20 mm, less the carried step on each side (0.2 + 0.225 mm)
        assertEquals(20 - 2 * LIMITS.carriedStepMm(), bridge.measured(), 0.05);
        LayeredSolid shortOne = LayeredSolid.builder(CTX)
                .slab(0, 10, Region.rectangle(CTX, 0, 0, 5, 10).union(Region.rectangle(CTX, 11, 0, 16, 10)))
                .slab(10, 12, Region.rectangle(CTX, 0, 0, 16, 10))
                .build();
        assertTrue(check(shortOne).stream().noneMatch(x -> x.code().equals("BRIDGE-LONG") || x.code().equals("OVERHANG")));
    }

    @Test
    void floatingShellFails() {
        LayeredSolid s = LayeredSolid.builder(CTX)
                .slab(0, 2, Region.rectangle(CTX, 0, 0, 10, 10))
                .slab(4, 6, Region.rectangle(CTX, 20, 0, 30, 10))
                .build();
        Finding f = check(s).stream().filter(x -> x.code().equals("PRINT-FLOATING")).findFirst().orElseThrow();
        assertEquals(Severity.FAIL, f.severity());
        assertEquals(4, f.where().zMm(), 1e-9);
    }
}
