package org.shearstack.io.mesh;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;

import org.junit.jupiter.api.Test;
import org.shearstack.geom.Mesh;
import org.shearstack.geom.MeshCheck;

class StlTest {

    @Test
    void binaryLayoutFollowsTheFormat() {
        Mesh m = SampleParts.washer();
        byte[] b = StlWriter.toBytes(m, "washer");
        // binary STL: 80-byte header, uint32 count, 50 bytes per triangle (3D Systems 1989 "StereoLithography
        // Interface Specification"; layout summarised in reference/3mf.md §6)
        assertEquals(84 + 50L * m.triangleCount(), b.length);
        String head = new String(b, 0, 5, StandardCharsets.US_ASCII);
        assertFalse(head.equalsIgnoreCase("solid"), head);
        ByteBuffer bb = ByteBuffer.wrap(b).order(ByteOrder.LITTLE_ENDIAN);
        assertEquals(m.triangleCount(), bb.getInt(80));
        // first triangle: vertex 1 as float32 LE and a unit normal consistent with the winding
        int a = m.corner(0, 0);
        assertEquals((float) m.x(a), bb.getFloat(96));
        assertEquals((float) m.y(a), bb.getFloat(100));
        assertEquals((float) m.z(a), bb.getFloat(104));
        double nx = bb.getFloat(84);
        double ny = bb.getFloat(88);
        double nz = bb.getFloat(92);
        assertEquals(1.0, Math.sqrt(nx * nx + ny * ny + nz * nz), 1e-6);
        assertEquals(0, bb.getShort(84 + 48));
    }

    @Test
    void writingIsDeterministic() {
        assertArrayEquals(StlWriter.toBytes(SampleParts.steppedBoss(), "x"),
                StlWriter.toBytes(SampleParts.steppedBoss(), "x"));
    }

    @Test
    void binaryRoundTripKeepsCountsCoordinatesAndTopology() throws Exception {
        Mesh m = SampleParts.steppedBoss();
        Mesh back = StlReader.read(StlWriter.toBytes(m, "boss"), "boss.stl");
        assertEquals(m.triangleCount(), back.triangleCount());
        assertEquals(m.vertexCount(), back.vertexCount(), "grid vertices stay distinct as float32");
        for (int t = 0; t < m.triangleCount(); t++) {
            for (int c = 0; c < 3; c++) {
                int v = m.corner(t, c);
                int w = back.corner(t, c);
                assertEquals((float) m.x(v), (float) back.x(w));
                assertEquals((float) m.y(v), (float) back.y(w));
                assertEquals((float) m.z(v), (float) back.z(w));
            }
        }
        assertTrue(MeshCheck.validate(back).isValidSolid());
    }

    @Test
    void asciiIsRead() throws Exception {
        String text = "solid t\n facet normal 0 0 1\n  outer loop\n   vertex 0 0 0\n   vertex 1 0 0\n   vertex 0 1 0\n"
                + "  endloop\n endfacet\n facet normal 0 0 1\n  outer loop\n   vertex 1 0 0\n   vertex 1 1 0\n"
                + "   vertex 0 1 0\n  endloop\n endfacet\nendsolid t\n";
        Mesh m = StlReader.read(text.getBytes(StandardCharsets.US_ASCII), "t.stl");
        assertEquals(2, m.triangleCount());
        assertEquals(4, m.vertexCount());
    }

    @Test
    void hostileBinaryInputGivesClearErrors() {
        byte[] good = StlWriter.toBytes(SampleParts.washer(), "w");
        MeshFormatException truncated = assertThrows(MeshFormatException.class,
                () -> StlReader.read(Arrays.copyOf(good, good.length - 7), "cut.stl"));
        assertTrue(truncated.getMessage().contains("byte offset 80"), truncated.getMessage());
        assertTrue(truncated.getMessage().contains("truncated"), truncated.getMessage());

        byte[] hugeCount = good.clone();
        ByteBuffer.wrap(hugeCount).order(ByteOrder.LITTLE_ENDIAN).putInt(80, -1);
        assertThrows(MeshFormatException.class, () -> StlReader.read(hugeCount, "count.stl"));

        byte[] nan = good.clone();
        ByteBuffer.wrap(nan).order(ByteOrder.LITTLE_ENDIAN).putFloat(84 + 50 * 3 + 12 + 4, Float.NaN);
        MeshFormatException e = assertThrows(MeshFormatException.class, () -> StlReader.read(nan, "nan.stl"));
        assertTrue(e.getMessage().contains("triangle 3 vertex 0"), e.getMessage());
        assertTrue(e.getMessage().contains("byte offset " + (84 + 50 * 3 + 12)), e.getMessage());

        assertThrows(MeshFormatException.class, () -> StlReader.read(new byte[10], "tiny.stl"));
    }

    @Test
    void hostileAsciiInputNamesTheLine() {
        String bad = "solid t\n facet normal 0 0 1\n  outer loop\n   vertex 0 0 zero\n";
        MeshFormatException e = assertThrows(MeshFormatException.class,
                () -> StlReader.read(bad.getBytes(StandardCharsets.US_ASCII), "bad.stl"));
        assertTrue(e.getMessage().contains("line 4"), e.getMessage());
        String cut = "solid t\n facet normal 0 0 1\n  outer loop\n   vertex 0 0 0\n";
        MeshFormatException e2 = assertThrows(MeshFormatException.class,
                () -> StlReader.read(cut.getBytes(StandardCharsets.US_ASCII), "cut.stl"));
        assertTrue(e2.getMessage().contains("endsolid"), e2.getMessage());
        String inf = "solid t\n facet normal 0 0 1\n  outer loop\n   vertex 0 0 Infinity\n";
        assertThrows(MeshFormatException.class, () -> StlReader.read(inf.getBytes(StandardCharsets.US_ASCII), "i.stl"));
    }
}
