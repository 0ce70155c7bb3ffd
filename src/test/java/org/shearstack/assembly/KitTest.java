package org.shearstack.assembly;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.check.Finding;
import org.shearstack.check.Severity;
import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.io.kit.KitWriter;
import org.shearstack.part.Dims;
import org.shearstack.part.EndCover;
import org.shearstack.part.DesignValues;
import org.shearstack.rules.ProfileKeys;
import org.shearstack.rules.geometry.GeoKeys;
import org.shearstack.rules.geometry.TestDesigns;

class KitTest {

    static final GeometryContext CTX = GeometryContext.withChordTolerance(0.05);
    /** Coarser faceting where a test is about the assembly, not the facets. */
    static final GeometryContext COARSE = GeometryContext.withChordTolerance(0.2);

    /** The demo kit, built once for the whole class (a kit is an immutable value). */
    private static Kit demoKit;

    static synchronized Kit demoKit() {
        if (demoKit == null) {
            demoKit = Kit.build("demo", TestDesigns.demo(), CTX);
        }
        return demoKit;
    }

    static void assertPasses(Kit kit) {
        List<Finding> fails = kit.findings().stream().filter(f -> f.severity() == Severity.FAIL).toList();
        assertTrue(fails.isEmpty(), fails.stream().map(Finding::message).toList().toString());
    }

    static Finding finding(Kit kit, String code) {
        return kit.findings().stream().filter(f -> f.code().equals(code)).findFirst().orElseThrow();
    }

    @Test
    void demoKitAssemblesWithTheChosenClearances() {
        Kit kit = demoKit();
        assertPasses(kit);
        // the swept discs keep the rules' radial clearance to the housing, and the pack its end play
        assertEquals(kit.dims().radialClearance(), finding(kit, "ASM-RADIAL-CLEARANCE").measured(), 0.05);
        assertEquals(kit.dims().endPlay(), finding(kit, "ASM-END-PLAY").measured(), 1e-9);
        // the axial stack fills the chamber: pack + 2 × end play = chamber depth
        assertEquals(kit.dims().chamberDepth(), kit.dims().packHeight() + 2 * kit.dims().endPlay(), 1e-9);
        int discs = kit.parts().stream().filter(p -> p.name().equals("rotor-disc")).findFirst().orElseThrow().count();
        assertEquals(8, discs);
        assertFalse(kit.plates().isEmpty());
        // the exhaust runs from the disc ports along the axis to the cover openings, and nothing turning closes it
        Finding path = finding(kit, "ASM-EXHAUST-PATH");
        assertEquals(Severity.OK, path.severity(), path.message());
        assertTrue(path.measured() > 10, path.message());
    }

    @Test
    void aClosedExhaustIsCaught() {
        Kit kit = demoKit();
        // a solid disc (no ports) in the pack closes the passage
        List<Body> bodies = new java.util.ArrayList<>();
        for (KitPart p : kit.parts()) {
            for (int k = 0; k < p.count(); k++) {
                bodies.add(new Body(p.name() + " #" + k, p.family(), p.rotating(), p.placements().get(k).apply(p.solid())));
            }
        }
        double z = kit.dims().packZ0();
        bodies.add(new Body("blank disc", "rotor", true, LayeredSolid.extrusion(org.shearstack.geom.Region.annulus(CTX, 0, 0,
                kit.dims().discDiameter(), kit.dims().hexAcrossFlats() + 0.5), z, z + kit.dims().discThickness())));
        Finding f = ExhaustPath.check(bodies, kit.dims(), CTX);
        assertEquals(Severity.FAIL, f.severity(), f.message());
        assertTrue(f.message().contains("blank disc"), f.message());
    }

    @Test
    void extremeAndRandomKitsAssemble() {
        assertPasses(Kit.build("smallest", TestDesigns.smallest(), COARSE));
        assertPasses(Kit.build("random-7", TestDesigns.random(7), COARSE));
    }

    @Test
    void aDisplacedPartIsCaught() {
        Kit kit = demoKit();
        List<Body> bodies = new java.util.ArrayList<>();
        for (KitPart p : kit.parts()) {
            for (int k = 0; k < p.count(); k++) {
                Placement pl = p.placements().get(k);
                if (p.name().equals("rotor-disc") && k == 0) {
                    pl = pl.raised(-kit.dims().endPlay() - 0.5); // into the free cover
                }
                bodies.add(new Body(p.name() + " #" + k, p.family(), p.rotating(), pl.apply(p.solid())));
            }
        }
        List<Finding> f = Interference.check(bodies, kit.dims(), CTX);
        assertTrue(f.stream().anyMatch(x -> x.code().equals("ASM-INTERFERENCE") && x.severity() == Severity.FAIL));
        assertTrue(f.stream().anyMatch(x -> x.code().equals("ASM-END-PLAY") && x.severity() == Severity.FAIL));
    }

    @Test
    void aPartTooLargeForTheBedFails() {
        DesignValues v = TestDesigns.demo();
        DesignValues small = DesignValues.of(k -> k.equals(ProfileKeys.BED_X) || k.equals(ProfileKeys.BED_Y) ? 100 : v.get(k),
                v::text, k -> k.equals(ProfileKeys.BED_X) || k.equals(ProfileKeys.BED_Y) || v.has(k));
        Kit kit = Kit.build("demo", small, COARSE);
        assertTrue(kit.findings().stream().anyMatch(f -> f.code().equals("PLATE-TOO-LARGE")
                && f.part().equals("housing-ring") && f.severity() == Severity.FAIL));
        for (PrintPlates.Plate p : kit.plates()) {
            for (PrintPlates.Item i : p.items()) {
                assertTrue(i.xMm() + i.footprint().widthMm() <= 100 && i.yMm() + i.footprint().heightMm() <= 100);
            }
        }
    }

    @Test
    void holeSizesFollowThePrinterProfile() {
        Dims a = Dims.of(TestDesigns.demo());
        Dims b = Dims.of(TestDesigns.resolve(TestDesigns.demoInputs().put(GeoKeys.HOLE_COMPENSATION, 0.35)));
        // the bearing seat's modelled diameter grows by the compensation difference: its section shrinks
        assertEquals(0.2, b.seatDiameter() - a.seatDiameter(), 1e-12);
        // and the printed section around the seat loses the ring between the two seat diameters
        double window = Math.min(a.coverExhaustInner(), b.coverExhaustInner()) - 0.2;
        double sa = seatWall(a, window);
        double sb = seatWall(b, window);
        double expected = Math.PI / 4 * (b.seatDiameter() * b.seatDiameter() - a.seatDiameter() * a.seatDiameter());
        assertEquals(expected, sa - sb, 0.02 * expected);
    }

    /** Area of the drive cover's section just below the lead-in, inside the exhaust openings. */
    static double seatWall(Dims d, double windowDiameter) {
        LayeredSolid cover = EndCover.solid(d, CTX, EndCover.Side.DRIVE);
        double u = d.coverThickness() - d.leadInDepth() - 0.01;
        var slab = cover.slabAt(u).orElseThrow();
        return slab.region().intersect(org.shearstack.geom.Region.disc(CTX, 0, 0, windowDiameter)).areaMm2();
    }

    @Test
    void writingIsRepeatableAndReplacesThePreviousKit(@TempDir Path tmp) throws Exception {
        Kit kit = demoKit();
        Path out = tmp.resolve("kit");
        KitWriter.write(kit, out);
        for (String f : KitWriter.files(kit)) {
            assertTrue(Files.size(out.resolve(f)) > 0, f);
        }
        byte[] asm = Files.readAllBytes(out.resolve("assembly.3mf"));
        byte[] disc = Files.readAllBytes(out.resolve("parts/rotor-disc.stl"));
        Files.writeString(out.resolve("stale.txt"), "from an older run");
        Kit again = Kit.build("demo", TestDesigns.demo(), CTX);
        KitWriter.write(again, out);
        assertArrayEquals(asm, Files.readAllBytes(out.resolve("assembly.3mf")));
        assertArrayEquals(disc, Files.readAllBytes(out.resolve("parts/rotor-disc.stl")));
        assertFalse(Files.exists(out.resolve("stale.txt")));
        try (Stream<Path> s = Files.list(tmp)) {
            assertEquals(List.of(out), s.toList());
        }
        String bom = Files.readString(out.resolve("bom.csv"));
        assertTrue(bom.contains("bearing 608,2,"));
        assertTrue(bom.contains("screw M3 × "));
    }
}
