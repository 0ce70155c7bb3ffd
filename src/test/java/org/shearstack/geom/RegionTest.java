package org.shearstack.geom;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class RegionTest {

    private final GeometryContext ctx = GeometryContext.standard();

    @Test
    void segmentCountIsAMultipleOfFourWithinTheChordTolerance() {
        for (double r : new double[] {0.5, 1, 2.5, 10, 40, 100, 300}) {
            int n = ctx.segmentCount(r);
            assertEquals(0, n % 4, "r " + r);
            // circumscribed deviation r(sec(pi/n) - 1) and inscribed sagitta r(1 - cos(pi/n)) within tolerance
            assertTrue(r * (1 / Math.cos(Math.PI / n) - 1) <= ctx.chordToleranceMm() + 1e-12, "r " + r);
            assertTrue(r * (1 - Math.cos(Math.PI / n)) <= ctx.chordToleranceMm(), "r " + r);
            // and the next smaller multiple of 4 would not be
            int m = n - 4;
            assertTrue(m < 8 || r * (1 / Math.cos(Math.PI / m) - 1) > ctx.chordToleranceMm(), "r " + r);
        }
        assertEquals(ctx.segmentCount(12.5), ctx.segmentCount(12.5));
    }

    @Test
    void gridValuesAreExactInDoubleAndFloat() {
        double v = ctx.snap(1234.56789);
        assertEquals(v, (double) (float) v, "1/2048 mm grid is exact in float32 below 8192 mm");
        assertEquals(Math.rint(v * 2048), v * 2048);
    }

    @Test
    void discAreaIsTheInscribedPolygonArea() {
        Region d = Region.disc(ctx, 0, 0, 20);
        int n = ctx.segmentCount(10);
        // regular n-gon of circumradius R: A = n/2 R^2 sin(2 pi/n) (elementary geometry)
        assertEquals(n / 2.0 * 100 * Math.sin(2 * Math.PI / n), d.areaMm2(), 10 * 20 * Math.PI * ctx.gridMm());
        assertEquals(n, d.rings().get(0).size());
    }

    @Test
    void boreHasTheTargetInscribedCircle() {
        Region bore = Region.boreCircle(ctx, 3, -2, 6);
        // every edge midpoint (apothem) is at the target radius 3 mm, within grid rounding
        Ring ring = bore.rings().get(0);
        for (int i = 0; i < ring.size(); i++) {
            int j = (i + 1) % ring.size();
            double mx = (ring.xMm(i) + ring.xMm(j)) / 2 - 3;
            double my = (ring.yMm(i) + ring.yMm(j)) / 2 + 2;
            assertEquals(3.0, Math.hypot(mx, my), ctx.gridMm());
        }
        assertTrue(bore.areaMm2() > Math.PI * 9);
    }

    @Test
    void ringsAreCounterClockwiseShellsAndClockwiseHoles() {
        Region washer = Region.annulus(ctx, 0, 0, 20, 8);
        assertEquals(2, washer.rings().size());
        for (Ring r : washer.rings()) {
            double a2 = 0;
            for (int i = 0; i < r.size(); i++) {
                int j = (i + 1) % r.size();
                a2 += r.xMm(i) * r.yMm(j) - r.xMm(j) * r.yMm(i);
            }
            assertEquals(r.isHole(), a2 < 0, r.toString());
        }
    }

    @Test
    void quarterTurnsAreExact() {
        Region r = Region.slot(ctx, 1, 2, 7, 5, 3).minus(Region.boreCircle(ctx, 4, 3.5, 1));
        Region back = r.rotatedDeg(90).rotatedDeg(180).rotatedDeg(90);
        assertEquals(r, back);
        assertEquals(r.areaMm2(), r.rotatedDeg(90).areaMm2(), 0.0);
        assertEquals(r, r.translated(3.5, -1.25).translated(-3.5, 1.25));
    }

    @Test
    void arcBandsShareTheAnnulusBoundary() {
        Region ring = Region.annulus(ctx, 0, 0, 30, 10);
        Region band = Region.arcBand(ctx, 0, 0, 10, 30, 17, 100);
        // a band cut from the annulus leaves no sliver along the arcs: only its grid-rounded end points can
        // move the boundary, by at most half a grid cell along the band's two radial ends
        Region rest = ring.minus(band);
        double bound = 2 * 10 * ctx.gridMm();
        assertEquals(ring.areaMm2() - band.areaMm2(), rest.areaMm2(), bound);
        assertEquals(ring.areaMm2(), rest.union(band).areaMm2(), bound);
        assertEquals(1, rest.partCount());
    }

    @Test
    void polarPatternAndOffset() {
        Region hole = Region.boreCircle(ctx, 10, 0, 3);
        Region six = hole.patternPolar(6);
        assertEquals(6, six.partCount());
        assertEquals(6 * hole.areaMm2(), six.areaMm2(), six.perimeterMm() * ctx.gridMm()); // copies at 60° re-round
        Region sq = Region.centredRectangle(ctx, 0, 0, 10, 10);
        // offset of a square by d: area (a + 2d)^2 - (4 - pi) d^2 for round joins (faceted: slightly less)
        double grown = sq.offset(1).areaMm2();
        assertTrue(grown <= 144 - (4 - Math.PI) + 1e-6 && grown > 144 - (4 - Math.PI) - 0.05, "" + grown);
        assertEquals(64, sq.offset(-1).areaMm2(), 1e-6);
    }

    @Test
    void badInputNamesWhatWasExpected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Region.polygon(ctx, 0, 0, 10, 10, 10, 0, 0, 10));
        assertTrue(e.getMessage().contains("not a simple polygon"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Region.disc(ctx, 0, 0, -1));
        assertThrows(IllegalArgumentException.class, () -> Region.disc(ctx, 0, 0, 1e-4));
        assertThrows(IllegalArgumentException.class, () -> Region.annulus(ctx, 0, 0, 5, 6));
    }
}
