package org.shearstack.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Mesh;
import org.shearstack.geom.Region;
import org.shearstack.geom.Transform;
import org.shearstack.io.mesh.StlReader;
import org.shearstack.io.mesh.StlWriter;
import org.shearstack.io.mesh.ThreeMfModel;
import org.shearstack.io.mesh.ThreeMfWriter;

/**
 * {@code check FILE.stl|FILE.3mf --printer NAME}: the hand-written fixtures in tests-fixtures/mesh (see its
 * README) and meshes made here, with the exit codes of the brief (0 nothing fails, 3 something fails, 2 unreadable).
 */
class MeshCheckCommandTest {

    static final Path FIXTURES = Path.of("tests-fixtures", "mesh");
    static final GeometryContext CTX = GeometryContext.standard();

    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return Main.run(args, new PrintWriter(out), new PrintWriter(err));
    }

    @Test
    void handWrittenBoxPasses() {
        int code = run("check", FIXTURES.resolve("box-10mm.stl").toString(), "--printer", "generic-0.4", "--filament",
                "pla", "--all");
        String text = out.toString();
        assertEquals(0, code, text + err);
        assertTrue(text.contains("MESH-VALID"), text);
        assertTrue(text.contains("sliced at every layer"), text);
        // 1000 mm³ of PLA at 1.24 g/cm³ (profiles/filaments/pla.yaml) = 1.24 g
        assertTrue(text.contains("about 1.24 g of pla"), text);
    }

    @Test
    void boxWithoutItsTopFailsValidity() {
        int code = run("check", FIXTURES.resolve("box-open-top.stl").toString(), "--printer", "generic-0.4");
        assertEquals(3, code, out.toString());
        assertTrue(out.toString().contains("FAIL    MESH-OPEN"), out.toString());
    }

    @Test
    void truncatedAsciiStlExitsTwoWithTheFileAndLine() {
        Path f = FIXTURES.resolve("box-truncated.stl");
        assertEquals(2, run("check", f.toString(), "--printer", "generic-0.4"));
        assertEquals("", out.toString());
        assertTrue(err.toString().startsWith(f + ":40:0: end of file inside a facet"), err.toString());
        assertTrue(err.toString().contains("truncated"), err.toString());
    }

    @Test
    void truncatedBinaryStlExitsTwoWithTheByteOffset() throws Exception {
        byte[] whole = StlWriter.toBytes(StlReader.read(FIXTURES.resolve("box-10mm.stl")), "box");
        Path f = dir.resolve("cut.stl");
        Files.write(f, Arrays.copyOf(whole, whole.length - 20));
        assertEquals(2, run("check", f.toString(), "--printer", "generic-0.4"));
        assertTrue(err.toString().startsWith(f.toString()) && err.toString().contains("byte offset 80: triangle count 12"), err.toString());
    }

    @Test
    void meshWithoutPrinterOrWithUnknownPrinterIsBadInput() {
        assertEquals(2, run("check", FIXTURES.resolve("box-10mm.stl").toString()));
        assertTrue(err.toString().contains("--printer"), err.toString());
        assertEquals(2, run("check", FIXTURES.resolve("box-10mm.stl").toString(), "--printer", "nope"));
        assertTrue(err.toString().contains("generic-0.4"), err.toString());
    }

    @Test
    void meshKindIsFoundByContentToo() throws IOException {
        Path f = dir.resolve("box.model");
        Files.copy(FIXTURES.resolve("box-10mm.stl"), f);
        assertEquals(0, run("check", f.toString(), "--printer", "generic-0.4"), out.toString() + err);
        assertTrue(out.toString().startsWith("mesh " + f + " (STL"), out.toString());
    }

    @Test
    void overhangingShelfIsReportedWithItsPlace() throws IOException {
        Mesh m = LayeredSolid.builder(CTX).slab(0, 10, Region.rectangle(CTX, 0, 0, 10, 10))
                .slab(10, 12, Region.rectangle(CTX, 0, 0, 22, 10)).build().toMesh(CTX);
        Path f = dir.resolve("shelf.stl");
        StlWriter.write(m, "shelf", f);
        run("check", f.toString(), "--printer", "generic-0.4");
        assertTrue(out.toString().contains("CAUTION OVERHANG  [shelf.stl, overhang]"), out.toString());
        assertTrue(out.toString().contains("z 10.00 mm (file frame)"), out.toString());
    }

    @Test
    void threeMfWithOverlappingBoxesFailsAndSeparateBoxesPass() throws IOException {
        Mesh box = LayeredSolid.extrusion(Region.rectangle(CTX, 0, 0, 10, 10), 0, 10).toMesh(CTX);
        Path overlapping = dir.resolve("overlapping.3mf");
        ThreeMfWriter.write(twoBoxes(box, 5), overlapping);
        assertEquals(3, run("check", overlapping.toString(), "--printer", "generic-0.4"), out.toString() + err);
        assertTrue(out.toString().contains("FAIL    MESH-INTERFERENCE  [box, overlaps box #2]"), out.toString());
        assertTrue(out.toString().contains("about 500 mm³"), out.toString());

        out.getBuffer().setLength(0);
        Path apart = dir.resolve("apart.3mf");
        ThreeMfWriter.write(twoBoxes(box, 15), apart);
        assertEquals(0, run("check", apart.toString(), "--printer", "generic-0.4", "--all"), out.toString() + err);
        assertTrue(out.toString().contains("OK      MESH-INTERFERENCE"), out.toString());
    }

    @Test
    void assemblyComponentsArePlacedByBothTransforms() throws IOException {
        Mesh box = LayeredSolid.extrusion(Region.rectangle(CTX, 0, 0, 10, 10), 0, 10).toMesh(CTX);
        ThreeMfModel.Builder b = ThreeMfModel.builder();
        int id = b.addMesh("cube", box, null);
        // two components 8 mm apart inside one assembly, the assembly itself moved: the cubes overlap by 2 mm
        int asm = b.addAssembly("pair", java.util.List.of(new ThreeMfModel.Component(id, Transform.identity()),
                new ThreeMfModel.Component(id, Transform.translation(8, 0, 0))));
        b.item(asm, Transform.translation(50, 50, 0), "");
        Path f = dir.resolve("pair.3mf");
        ThreeMfWriter.write(b.build(), f);
        assertEquals(3, run("check", f.toString(), "--printer", "generic-0.4"), out.toString() + err);
        // the overlap is 2 × 10 × 10 mm = 200 mm³, between the components "pair/cube" and "pair/cube #2"
        assertTrue(out.toString().contains("pair/cube and pair/cube #2 overlap: about 200 mm³"), out.toString());
        assertTrue(out.toString().contains("at x 59."), out.toString());
    }

    private static ThreeMfModel twoBoxes(Mesh box, double dxMm) {
        ThreeMfModel.Builder b = ThreeMfModel.builder();
        int id = b.addMesh("box", box, null);
        b.item(id, Transform.translation(0, 0, 0), "");
        int id2 = b.addMesh("box", box, null);
        b.item(id2, Transform.translation(dxMm, 0, 0), "");
        return b.build();
    }
}
