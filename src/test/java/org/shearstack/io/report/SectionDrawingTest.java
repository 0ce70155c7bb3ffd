package org.shearstack.io.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Region;
import org.shearstack.geom.Slab;

class SectionDrawingTest {

    private final GeometryContext ctx = GeometryContext.standard();

    @Test
    void aWasherCutThroughTheAxisIsTwoRectangles() {
        // washer: 40 mm outside, 10 mm hole, 2 mm thick
        LayeredSolid washer = LayeredSolid.extrusion(Region.annulus(ctx, 0, 0, 40, 10), 0, 2);
        List<SectionDrawing.Cell> cells = SectionDrawing.section(washer);
        assertEquals(2, cells.size());
        SectionDrawing.Cell left = cells.get(0);
        SectionDrawing.Cell right = cells.get(1);
        double grid = ctx.gridMm();
        // the outer polygon has a vertex on the x axis at the radius (segment counts are multiples of 4)
        assertEquals(-20, left.x0Mm(), grid);
        assertEquals(20, right.x1Mm(), grid);
        // a hole is faceted so its inscribed circle has the diameter: the cut meets it at or just outside 5 mm
        assertTrue(right.x0Mm() >= 5 - grid && right.x0Mm() < 5.01, "hole edge " + right.x0Mm());
        assertEquals(-right.x0Mm(), left.x1Mm(), grid);
        assertEquals(0, left.z0Mm());
        assertEquals(2, left.z1Mm());
    }

    @Test
    void aSteppedPartKeepsItsSlabsAndIsDrawnWithStatedExaggeration() {
        LayeredSolid stepped = LayeredSolid.of(ctx, List.of(
                new Slab(0, 0.8, Region.annulus(ctx, 0, 0, 80, 12)),
                new Slab(0.8, 1.2, Region.annulus(ctx, 0, 0, 20, 12))));
        List<SectionDrawing.Cell> cells = SectionDrawing.section(stepped);
        assertEquals(4, cells.size());
        assertEquals(0.8, cells.get(2).z0Mm(), ctx.gridMm()); // heights sit on the geometry grid
        assertEquals(10, cells.get(3).x1Mm(), ctx.gridMm());
        String svg = SectionDrawing.svg("disc", stepped);
        assertEquals(4, svg.split("class=\"cut\"", -1).length - 1);
        assertTrue(svg.contains("height drawn"), "a 1.2 mm tall, 80 mm wide part is exaggerated and says so");
        assertTrue(svg.contains(">80.00 mm</text>") && svg.contains(">1.20 mm</text>"), svg);
    }
}
