package org.shearstack.io.mesh;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;

import org.shearstack.geom.Mesh;

/**
 * Reads binary and ASCII STL safely. Binary is recognised by its size (84 + 50 × count bytes); anything
 * starting with "solid" that is not such a file is read as ASCII. Vertices are shared where their float32
 * coordinates are bit-identical (the only topology STL has). Limits: {@link #MAX_BYTES} and
 * {@link #MAX_TRIANGLES}. Every problem is a {@link MeshFormatException} naming the byte offset or line.
 */
public final class StlReader {

    public static final long MAX_BYTES = 1L << 30;
    public static final int MAX_TRIANGLES = 20_000_000;

    private StlReader() {
    }

    public static Mesh read(Path file) throws IOException, MeshFormatException {
        long size = Files.size(file);
        if (size > MAX_BYTES) {
            throw new MeshFormatException(file + ": " + size + " bytes exceeds the limit of " + MAX_BYTES);
        }
        return read(Files.readAllBytes(file), file.toString());
    }

    /** Reads at most {@link #MAX_BYTES} from a stream. */
    public static Mesh read(InputStream in, String source) throws IOException, MeshFormatException {
        byte[] data = in.readNBytes((int) Math.min(Integer.MAX_VALUE - 8, MAX_BYTES + 1));
        if (data.length > MAX_BYTES) {
            throw new MeshFormatException(source + ": more than " + MAX_BYTES + " bytes");
        }
        return read(data, source);
    }

    public static Mesh read(byte[] data, String source) throws MeshFormatException {
        if (data.length >= 84) {
            long count = ByteBuffer.wrap(data, 80, 4).order(ByteOrder.LITTLE_ENDIAN).getInt() & 0xffffffffL;
            if (84 + 50 * count == data.length) {
                return readBinary(data, count, source);
            }
        }
        if (startsWithSolid(data)) {
            return readAscii(data, source);
        }
        if (data.length < 84) {
            throw new MeshFormatException(source + ": " + data.length
                    + " bytes is too short for a binary STL (at least 84) and it does not start with \"solid\"");
        }
        long count = ByteBuffer.wrap(data, 80, 4).order(ByteOrder.LITTLE_ENDIAN).getInt() & 0xffffffffL;
        throw new MeshFormatException(source + ": byte offset 80: triangle count " + count + " needs a file of "
                + (84 + 50 * count) + " bytes, found " + data.length + " bytes (truncated or not an STL)");
    }

    private static boolean startsWithSolid(byte[] data) {
        int i = 0;
        while (i < data.length && i < 256 && Character.isWhitespace(data[i])) {
            i++;
        }
        if (data.length - i < 5) {
            return false;
        }
        return new String(data, i, 5, StandardCharsets.US_ASCII).equalsIgnoreCase("solid");
    }

    private static Mesh readBinary(byte[] data, long count, String source) throws MeshFormatException {
        if (count > MAX_TRIANGLES) {
            throw new MeshFormatException(source + ": byte offset 80: " + count + " triangles exceeds the limit of "
                    + MAX_TRIANGLES);
        }
        ByteBuffer b = ByteBuffer.wrap(data).order(ByteOrder.LITTLE_ENDIAN);
        Builder builder = new Builder((int) count);
        for (int t = 0; t < count; t++) {
            int off = 84 + 50 * t + 12;
            int[] idx = new int[3];
            for (int k = 0; k < 3; k++) {
                int at = off + 12 * k;
                float x = b.getFloat(at);
                float y = b.getFloat(at + 4);
                float z = b.getFloat(at + 8);
                if (!Float.isFinite(x) || !Float.isFinite(y) || !Float.isFinite(z)) {
                    throw new MeshFormatException(source + ": byte offset " + at + ": triangle " + t + " vertex " + k
                            + ": expected finite coordinates, found (" + x + ", " + y + ", " + z + ")");
                }
                idx[k] = builder.vertex(x, y, z);
            }
            builder.triangle(idx);
        }
        return builder.build();
    }

    private static Mesh readAscii(byte[] data, String source) throws MeshFormatException {
        String text = new String(data, StandardCharsets.US_ASCII);
        String[] lines = text.split("\r?\n|\r", -1);
        Builder builder = new Builder(Math.max(16, lines.length / 7));
        int state = 0; // 0 before solid, 1 in solid, 2 in facet, 3 in loop, 4 after endloop, 5 after endsolid
        int[] idx = new int[3];
        int k = 0;
        int lastLine = 0;
        for (int ln = 0; ln < lines.length; ln++) {
            String line = lines[ln].trim();
            if (line.isEmpty()) {
                continue;
            }
            lastLine = ln + 1;
            String where = source + ": line " + (ln + 1) + ": ";
            String[] tok = line.split("\\s+");
            String kw = tok[0].toLowerCase(java.util.Locale.ROOT);
            switch (kw) {
                case "solid" -> state = expect(state, 0, 1, where, "solid", line);
                case "facet" -> {
                    state = expect(state, 1, 2, where, "facet", line);
                    if (tok.length != 5 || !tok[1].equalsIgnoreCase("normal")) {
                        throw new MeshFormatException(where + "expected \"facet normal nx ny nz\", found \"" + line + "\"");
                    }
                }
                case "outer" -> {
                    state = expect(state, 2, 3, where, "outer loop", line);
                    k = 0;
                }
                case "vertex" -> {
                    if (state != 3 || k >= 3) {
                        throw new MeshFormatException(where + "unexpected \"vertex\" (a facet has exactly 3 vertices inside "
                                + "\"outer loop\" ... \"endloop\")");
                    }
                    if (tok.length != 4) {
                        throw new MeshFormatException(where + "expected \"vertex x y z\", found \"" + line + "\"");
                    }
                    float[] c = new float[3];
                    for (int i = 0; i < 3; i++) {
                        try {
                            c[i] = Float.parseFloat(tok[i + 1]);
                        } catch (NumberFormatException e) {
                            throw new MeshFormatException(where + "expected a number, found \"" + tok[i + 1] + "\"");
                        }
                        if (!Float.isFinite(c[i])) {
                            throw new MeshFormatException(where + "expected a finite number, found \"" + tok[i + 1] + "\"");
                        }
                    }
                    idx[k++] = builder.vertex(c[0], c[1], c[2]);
                }
                case "endloop" -> {
                    if (k != 3) {
                        throw new MeshFormatException(where + "expected 3 vertices in the loop, found " + k);
                    }
                    state = expect(state, 3, 4, where, "endloop", line);
                }
                case "endfacet" -> {
                    state = expect(state, 4, 1, where, "endfacet", line);
                    if (builder.triangles() >= MAX_TRIANGLES) {
                        throw new MeshFormatException(where + "more than " + MAX_TRIANGLES + " triangles");
                    }
                    builder.triangle(idx.clone());
                }
                case "endsolid" -> state = expect(state, 1, 5, where, "endsolid", line);
                default -> throw new MeshFormatException(where + "expected an STL keyword, found \"" + tok[0] + "\"");
            }
        }
        if (state != 5) {
            throw new MeshFormatException(source + ": line " + lastLine + ": end of file" + (state > 1
                    ? " inside a facet: expected the rest of the facet and \"endsolid\" " : ": expected \"endsolid\" ")
                    + "(file truncated?)");
        }
        return builder.build();
    }

    private static int expect(int state, int required, int next, String where, String keyword, String line)
            throws MeshFormatException {
        if (state != required) {
            throw new MeshFormatException(where + "\"" + keyword + "\" out of place: found \"" + line + "\"");
        }
        return next;
    }

    private record Key(int x, int y, int z) {
    }

    /** Shares vertices by exact float32 bit pattern. */
    private static final class Builder {
        private final Map<Key, Integer> index = new HashMap<>();
        private double[] xyz;
        private int nv;
        private int[] tri;
        private int nt;

        Builder(int triangles) {
            xyz = new double[3 * Math.max(4, triangles / 2 + 4)];
            tri = new int[3 * Math.max(4, triangles)];
        }

        int vertex(float x, float y, float z) {
            Key key = new Key(Float.floatToIntBits(x + 0f), Float.floatToIntBits(y + 0f), Float.floatToIntBits(z + 0f));
            Integer i = index.get(key);
            if (i != null) {
                return i;
            }
            if (3 * nv + 3 > xyz.length) {
                xyz = java.util.Arrays.copyOf(xyz, xyz.length * 2);
            }
            xyz[3 * nv] = x;
            xyz[3 * nv + 1] = y;
            xyz[3 * nv + 2] = z;
            index.put(key, nv);
            return nv++;
        }

        void triangle(int[] idx) {
            if (3 * nt + 3 > tri.length) {
                tri = java.util.Arrays.copyOf(tri, tri.length * 2);
            }
            tri[3 * nt] = idx[0];
            tri[3 * nt + 1] = idx[1];
            tri[3 * nt + 2] = idx[2];
            nt++;
        }

        int triangles() {
            return nt;
        }

        Mesh build() {
            return Mesh.of(java.util.Arrays.copyOf(xyz, 3 * nv), java.util.Arrays.copyOf(tri, 3 * nt));
        }
    }
}
