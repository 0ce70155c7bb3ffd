package org.shearstack.io.mesh;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;

import javax.imageio.ImageIO;
import javax.xml.validation.Schema;

import org.junit.jupiter.api.Test;
import org.shearstack.geom.Mesh;
import org.shearstack.geom.Transform;

class ThreeMfTest {

    private static final class Holder {
        static final ThreeMfModel MODEL = build();

        private static ThreeMfModel build() {
            try {
                return buildAssembly();
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
        }
    }

    static ThreeMfModel assembly() {
        return Holder.MODEL;
    }

    static ThreeMfModel buildAssembly() throws Exception {
        ThreeMfModel.Builder b = ThreeMfModel.builder();
        int washer = b.addMesh("washer", SampleParts.washer(), "#1F77B4");
        int disc = b.addMesh("disc & <ports>", SampleParts.portedDisc(), "#FF7F0EFF");
        int boss = b.addMesh("boss", SampleParts.steppedBoss(), null);
        int stack = b.addAssembly("rotor", List.of(
                new ThreeMfModel.Component(disc, Transform.translation(0, 0, 2)),
                new ThreeMfModel.Component(disc, Transform.rotationZDeg(30).then(Transform.translation(0, 0, 3.5))),
                new ThreeMfModel.Component(washer, Transform.identity())));
        b.item(stack, Transform.translation(50, 50, 0), "R-1");
        b.item(boss, Transform.flipOverX().then(Transform.translation(10.5, -3.25, 6)), null);
        b.metadata("Title", "Test rotor").metadata("Application", "ShearStack").metadata("shearstack:Spec", "abc");
        java.awt.image.BufferedImage img = new java.awt.image.BufferedImage(4, 4, java.awt.image.BufferedImage.TYPE_INT_RGB);
        ByteArrayOutputStream png = new ByteArrayOutputStream();
        ImageIO.write(img, "png", png);
        b.thumbnailPng(png.toByteArray());
        return b.build();
    }

    @Test
    void rerunsAreByteIdenticalAndEntriesAreInFixedOrder() throws Exception {
        byte[] a = ThreeMfWriter.toBytes(assembly());
        byte[] b = ThreeMfWriter.toBytes(buildAssembly());
        assertArrayEquals(a, b);
        List<String> names = new ArrayList<>();
        try (ZipInputStream zip = new ZipInputStream(new ByteArrayInputStream(a))) {
            ZipEntry e;
            while ((e = zip.getNextEntry()) != null) {
                names.add(e.getName());
                assertEquals(java.time.LocalDateTime.of(1980, 1, 1, 0, 0), e.getTimeLocal());
                assertTrue(e.getMethod() == ZipEntry.DEFLATED || e.getMethod() == ZipEntry.STORED);
            }
        }
        assertEquals(List.of("[Content_Types].xml", "_rels/.rels", "3D/3dmodel.model", "Metadata/thumbnail.png"), names);
    }

    @Test
    void modelXmlValidatesAgainstThePublishedCoreSchema() throws Exception {
        Path folder = ThreeMfSchema.folder();
        assumeTrue(folder != null, "3MF schemas not found at ../shared/standards/3mf relative to the project root;"
                + " schema validation skipped");
        Schema schema = ThreeMfSchema.core(folder);
        String xml = ThreeMfWriter.modelXml(assembly());
        ThreeMfSchema.validate(schema, xml);
        // 3MF Core 1.4.0 §3 forbids xsi: attributes and xml:space, which the schema cannot catch
        assertFalse(xml.contains("xsi:"));
        assertFalse(xml.contains("xml:space"));
        assertFalse(xml.contains("<!DOCTYPE"));
        // and the validator really rejects a wrong unit (guard against a validator that accepts anything)
        assertThrows(org.xml.sax.SAXException.class,
                () -> ThreeMfSchema.validate(schema, xml.replace("unit=\"millimeter\"", "unit=\"mm\"")));
    }

    @Test
    void roundTripKeepsObjectsColoursComponentsItemsAndMetadata() throws Exception {
        ThreeMfModel m = assembly();
        ThreeMfModel back = ThreeMfReader.read(ThreeMfWriter.toBytes(m), "a.3mf");
        assertEquals(m.objects().size(), back.objects().size());
        for (int i = 0; i < m.objects().size(); i++) {
            ThreeMfModel.ThreeMfObject o = m.objects().get(i);
            ThreeMfModel.ThreeMfObject r = back.objects().get(i);
            assertEquals(o.id(), r.id());
            assertEquals(o.name(), r.name());
            assertEquals(o.colourHex(), r.colourHex());
            assertEquals(o.components(), r.components());
            if (o.mesh() != null) {
                Mesh a = o.mesh();
                Mesh c = r.mesh();
                assertArrayEquals(a.triangleArray(), c.triangleArray());
                assertArrayEquals(a.vertexArray(), c.vertexArray(), 0.0, "shortest round-trip decimals are exact");
            }
        }
        assertEquals(m.items(), back.items());
        assertEquals(m.metadata(), back.metadata());
        assertArrayEquals(m.thumbnailPng(), back.thumbnailPng());
    }

    @Test
    void hostilePackagesAreRefusedWithClearErrors() throws Exception {
        byte[] good = ThreeMfWriter.toBytes(assembly());
        String modelXml = ThreeMfWriter.modelXml(assembly());

        String xxe = "<?xml version=\"1.0\"?>\n<!DOCTYPE model [<!ENTITY x SYSTEM \"file:///etc/passwd\">]>\n"
                + modelXml.substring(modelXml.indexOf("<model"));
        MeshFormatException e = assertThrows(MeshFormatException.class,
                () -> ThreeMfReader.read(pkg("3D/3dmodel.model", xxe), "xxe.3mf"));
        assertTrue(e.getMessage().contains("DTD"), e.getMessage());

        assertThrows(MeshFormatException.class,
                () -> ThreeMfReader.read(pkg("../evil.model", modelXml), "trav.3mf"));

        String badIndex = modelXml.replaceFirst("v1=\"\\d+\"", "v1=\"999999\"");
        MeshFormatException idx = assertThrows(MeshFormatException.class,
                () -> ThreeMfReader.read(pkg("3D/3dmodel.model", badIndex), "idx.3mf"));
        assertTrue(idx.getMessage().contains("line "), idx.getMessage());
        assertTrue(idx.getMessage().contains("999999"), idx.getMessage());

        String nan = modelXml.replaceFirst("<vertex x=\"[^\"]+\"", "<vertex x=\"NaN\"");
        assertThrows(MeshFormatException.class, () -> ThreeMfReader.read(pkg("3D/3dmodel.model", nan), "nan.3mf"));

        ThreeMfReader.Limits small = new ThreeMfReader.Limits(1000, 10_000, 1_000_000);
        MeshFormatException bomb = assertThrows(MeshFormatException.class,
                () -> ThreeMfReader.read(good, "big.3mf", small));
        assertTrue(bomb.getMessage().contains("decompressed size"), bomb.getMessage());
        assertThrows(MeshFormatException.class,
                () -> ThreeMfReader.read(good, "tris.3mf", new ThreeMfReader.Limits(1000, 1L << 30, 100)));
        assertThrows(MeshFormatException.class,
                () -> ThreeMfReader.read(good, "entries.3mf", new ThreeMfReader.Limits(2, 1L << 30, 1_000_000)));
        assertThrows(MeshFormatException.class, () -> ThreeMfReader.read("not a zip".getBytes(), "junk.3mf"));
        assertThrows(MeshFormatException.class,
                () -> ThreeMfReader.read(java.util.Arrays.copyOf(good, good.length / 2), "cut.3mf"));
    }

    @Test
    void foreignUnitsAreConvertedToMillimetres() throws Exception {
        String xml = "<?xml version=\"1.0\" encoding=\"UTF-8\"?><model unit=\"inch\" xmlns=\"" + ThreeMfWriter.CORE_NAMESPACE
                + "\"><resources><object id=\"1\" type=\"model\"><mesh><vertices><vertex x=\"0\" y=\"0\" z=\"0\"/>"
                + "<vertex x=\"1\" y=\"0\" z=\"0\"/><vertex x=\"0\" y=\"1\" z=\"0\"/><vertex x=\"0\" y=\"0\" z=\"1\"/>"
                + "</vertices><triangles><triangle v1=\"0\" v2=\"2\" v3=\"1\"/><triangle v1=\"0\" v2=\"1\" v3=\"3\"/>"
                + "<triangle v1=\"0\" v2=\"3\" v3=\"2\"/><triangle v1=\"1\" v2=\"2\" v3=\"3\"/></triangles></mesh>"
                + "</object></resources><build><item objectid=\"1\"/></build></model>";
        ThreeMfModel m = ThreeMfReader.read(pkg("3D/3dmodel.model", xml), "inch.3mf");
        assertNotNull(m.objects().get(0).mesh());
        assertEquals(25.4, m.objects().get(0).mesh().x(1), 0.0); // 1 in = 25.4 mm exactly (NIST SP 811, 2008)
    }

    @Test
    void numbersAreExactLocaleFreeDecimals() {
        double[] values = {0, -0.0, 1, -1, 0.5, 1.0 / 2048, -1234.5678, 7.25, 1e-9, 123456.789, 0.1, -3.0 / 65536};
        for (double v : values) {
            StringBuilder sb = new StringBuilder();
            ThreeMfWriter.appendNumber(sb, v);
            String text = sb.toString();
            assertEquals(v + 0.0, Double.parseDouble(text), 0.0, text);
            assertTrue(text.matches("-?[0-9]+(\\.[0-9]+)?([eE]-?[0-9]+)?"), text);
            assertFalse(text.startsWith("-0") && Double.parseDouble(text) == 0, text);
        }
        StringBuilder sb = new StringBuilder();
        ThreeMfWriter.appendNumber(sb, 1.0 / 2048);
        assertEquals("0.00048828125", sb.toString());
    }

    /** A minimal package with the given model entry name, relationships pointing at it. */
    static byte[] pkg(String modelEntry, String xml) throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (ZipOutputStream zip = new ZipOutputStream(out)) {
            zip.putNextEntry(new ZipEntry("[Content_Types].xml"));
            zip.write(ThreeMfWriter.contentTypes(false).getBytes(StandardCharsets.UTF_8));
            zip.putNextEntry(new ZipEntry("_rels/.rels"));
            zip.write(ThreeMfWriter.rels(false).replace("/3D/3dmodel.model", "/" + modelEntry)
                    .getBytes(StandardCharsets.UTF_8));
            zip.putNextEntry(new ZipEntry(modelEntry));
            zip.write(xml.getBytes(StandardCharsets.UTF_8));
        }
        return out.toByteArray();
    }
}
