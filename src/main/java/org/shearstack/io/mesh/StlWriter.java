package org.shearstack.io.mesh;

import java.io.BufferedOutputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

import org.shearstack.geom.Mesh;

/**
 * Writes binary STL (millimetres): an 80-byte ASCII header that never starts with "solid", a little-endian
 * uint32 triangle count, then per triangle the unit normal and three vertices as float32 little-endian and
 * a zero attribute word. Each vertex is converted to float32 once, so shared vertices keep one bit
 * pattern. Output depends only on the mesh and the header text.
 */
public final class StlWriter {

    /** Header prefix; the header therefore never starts with "solid". */
    public static final String HEADER_PREFIX = "ShearStack binary STL, mm";
    private static final int CHUNK = 4096;

    private StlWriter() {
    }

    /** Writes the mesh to a stream (not closed). */
    public static void write(Mesh mesh, String title, OutputStream out) throws IOException {
        int nv = mesh.vertexCount();
        float[] f = new float[3 * nv];
        for (int v = 0; v < nv; v++) {
            f[3 * v] = (float) mesh.x(v);
            f[3 * v + 1] = (float) mesh.y(v);
            f[3 * v + 2] = (float) mesh.z(v);
        }
        out.write(header(title));
        ByteBuffer buf = ByteBuffer.allocate(50 * CHUNK).order(ByteOrder.LITTLE_ENDIAN);
        buf.putInt(mesh.triangleCount());
        out.write(buf.array(), 0, 4);
        buf.clear();
        int nt = mesh.triangleCount();
        for (int t = 0; t < nt; t++) {
            int a = 3 * mesh.corner(t, 0);
            int b = 3 * mesh.corner(t, 1);
            int c = 3 * mesh.corner(t, 2);
            double ux = (double) f[b] - f[a];
            double uy = (double) f[b + 1] - f[a + 1];
            double uz = (double) f[b + 2] - f[a + 2];
            double vx = (double) f[c] - f[a];
            double vy = (double) f[c + 1] - f[a + 1];
            double vz = (double) f[c + 2] - f[a + 2];
            double nx = uy * vz - uz * vy;
            double ny = uz * vx - ux * vz;
            double nz = ux * vy - uy * vx;
            double len = Math.sqrt(nx * nx + ny * ny + nz * nz);
            if (len > 0) {
                nx /= len;
                ny /= len;
                nz /= len;
            }
            buf.putFloat((float) nx + 0f).putFloat((float) ny + 0f).putFloat((float) nz + 0f);
            buf.putFloat(f[a]).putFloat(f[a + 1]).putFloat(f[a + 2]);
            buf.putFloat(f[b]).putFloat(f[b + 1]).putFloat(f[b + 2]);
            buf.putFloat(f[c]).putFloat(f[c + 1]).putFloat(f[c + 2]);
            buf.putShort((short) 0);
            if (!buf.hasRemaining()) {
                out.write(buf.array(), 0, buf.position());
                buf.clear();
            }
        }
        out.write(buf.array(), 0, buf.position());
    }

    public static byte[] toBytes(Mesh mesh, String title) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(84 + 50 * mesh.triangleCount());
        try {
            write(mesh, title, out);
        } catch (IOException e) {
            throw new IllegalStateException("in-memory write failed", e);
        }
        return out.toByteArray();
    }

    /** Writes atomically: to a temporary file beside the target, then renamed over it. */
    public static void write(Mesh mesh, String title, Path file) throws IOException {
        Path dir = file.toAbsolutePath().getParent();
        Path tmp = Files.createTempFile(dir, ".stl-", ".part");
        try {
            try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(tmp), 1 << 16)) {
                write(mesh, title, out);
            }
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /** The 80-byte header: prefix, the title's printable ASCII characters, padded with spaces. */
    static byte[] header(String title) {
        StringBuilder sb = new StringBuilder(HEADER_PREFIX);
        if (title != null && !title.isEmpty()) {
            sb.append(": ");
            for (char ch : title.toCharArray()) {
                sb.append(ch >= 32 && ch < 127 ? ch : '?');
            }
        }
        byte[] h = new byte[80];
        java.util.Arrays.fill(h, (byte) ' ');
        byte[] text = sb.toString().getBytes(StandardCharsets.US_ASCII);
        System.arraycopy(text, 0, h, 0, Math.min(80, text.length));
        return h;
    }
}
