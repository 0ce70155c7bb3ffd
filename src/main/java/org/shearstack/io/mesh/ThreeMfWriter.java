package org.shearstack.io.mesh;

import java.io.BufferedOutputStream;
import java.io.ByteArrayOutputStream;
import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.LocalDateTime;
import java.util.List;
import java.util.Map;
import java.util.zip.Deflater;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;

import org.shearstack.geom.Mesh;
import org.shearstack.geom.Transform;

/**
 * Writes a 3MF package per the 3MF Core Specification 1.4.0: {@code [Content_Types].xml}, {@code _rels/.rels}
 * (StartPart, and Thumbnail when present), the model part {@code 3D/3dmodel.model} (unit millimeter,
 * metadata, one basematerials group for the part colours, mesh objects, assembly objects with components,
 * build items with transforms) and an optional {@code Metadata/thumbnail.png}. The model XML is streamed,
 * entries are written in a fixed order with a fixed time (1980-01-01 00:00, local DOS time, no extra
 * fields) so the same model gives the same bytes.
 */
public final class ThreeMfWriter {

    public static final String CORE_NAMESPACE = "http://schemas.microsoft.com/3dmanufacturing/core/2015/02";
    static final String MODEL_ENTRY = "3D/3dmodel.model";
    static final String THUMBNAIL_ENTRY = "Metadata/thumbnail.png";
    static final String START_PART_TYPE = "http://schemas.microsoft.com/3dmanufacturing/2013/01/3dmodel";
    static final String THUMBNAIL_TYPE = "http://schemas.openxmlformats.org/package/2006/relationships/metadata/thumbnail";
    private static final LocalDateTime ENTRY_TIME = LocalDateTime.of(1980, 1, 1, 0, 0);

    private ThreeMfWriter() {
    }

    public static void write(ThreeMfModel model, OutputStream out) throws IOException {
        write(model, out, new MeshTexts());
    }

    /**
     * The {@code <mesh>} XML of meshes, formatted once and shared by every package written with the same
     * instance (an assembly, its exploded variant and the print plates hold the same meshes). Thread-safe; keyed
     * by mesh identity.
     */
    public static final class MeshTexts {
        private final java.util.Map<Mesh, byte[]> byMesh = new java.util.IdentityHashMap<>();

        byte[] of(Mesh mesh) {
            synchronized (byMesh) {
                byte[] s = byMesh.get(mesh);
                if (s != null) {
                    return s;
                }
            }
            byte[] s = meshBytes(mesh);
            synchronized (byMesh) {
                byte[] known = byMesh.putIfAbsent(mesh, s);
                return known != null ? known : s;
            }
        }
    }

    /** As {@link #write(ThreeMfModel, OutputStream)}, sharing formatted meshes through {@code texts}. */
    public static void write(ThreeMfModel model, OutputStream out, MeshTexts texts) throws IOException {
        ZipOutputStream zip = new ZipOutputStream(new NonClosing(out), StandardCharsets.UTF_8);
        // Deflate level 1 (BEST_SPEED), default strategy: the fastest level that still matches strings (the XML
        // shrinks about 7:1; Huffman-only coding is slower here and keeps about 2:1); a fixed level gives the same
        // bytes on every run
        zip.setLevel(Deflater.BEST_SPEED);
        boolean thumb = model.thumbnailPng() != null;
        entry(zip, "[Content_Types].xml");
        text(zip, contentTypes(thumb));
        entry(zip, "_rels/.rels");
        text(zip, rels(thumb));
        entry(zip, MODEL_ENTRY);
        BufferedOutputStream w = new BufferedOutputStream(new NonClosing(zip), 1 << 16);
        writeModel(model, w, texts);
        w.flush();
        if (thumb) {
            entry(zip, THUMBNAIL_ENTRY);
            zip.write(model.thumbnailPng());
        }
        zip.closeEntry();
        zip.finish();
        zip.flush();
    }

    public static byte[] toBytes(ThreeMfModel model) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            write(model, out);
        } catch (IOException e) {
            throw new IllegalStateException("in-memory write failed", e);
        }
        return out.toByteArray();
    }

    /** Writes atomically: to a temporary file beside the target, then renamed over it. */
    public static void write(ThreeMfModel model, Path file) throws IOException {
        write(model, file, new MeshTexts());
    }

    /** As {@link #write(ThreeMfModel, Path)}, sharing formatted meshes through {@code texts}. */
    public static void write(ThreeMfModel model, Path file, MeshTexts texts) throws IOException {
        Path dir = file.toAbsolutePath().getParent();
        Path tmp = Files.createTempFile(dir, ".3mf-", ".part");
        try {
            try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(tmp), 1 << 16)) {
                write(model, out, texts);
            }
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /** The model part's XML, for tests that validate it against the schema. */
    public static String modelXml(ThreeMfModel model) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            writeModel(model, out, new MeshTexts());
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
        return out.toString(StandardCharsets.UTF_8);
    }

    private static void entry(ZipOutputStream zip, String name) throws IOException {
        ZipEntry e = new ZipEntry(name);
        e.setTimeLocal(ENTRY_TIME);
        zip.putNextEntry(e);
    }

    private static void text(ZipOutputStream zip, String s) throws IOException {
        zip.write(s.getBytes(StandardCharsets.UTF_8));
    }

    static String contentTypes(boolean thumbnail) {
        return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
                + "<Types xmlns=\"http://schemas.openxmlformats.org/package/2006/content-types\">\n"
                + " <Default Extension=\"rels\" ContentType=\"application/vnd.openxmlformats-package.relationships+xml\"/>\n"
                + " <Default Extension=\"model\" ContentType=\"application/vnd.ms-package.3dmanufacturing-3dmodel+xml\"/>\n"
                + (thumbnail ? " <Default Extension=\"png\" ContentType=\"image/png\"/>\n" : "")
                + "</Types>\n";
    }

    static String rels(boolean thumbnail) {
        return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
                + "<Relationships xmlns=\"http://schemas.openxmlformats.org/package/2006/relationships\">\n"
                + " <Relationship Id=\"rel0\" Target=\"/" + MODEL_ENTRY + "\" Type=\"" + START_PART_TYPE + "\"/>\n"
                + (thumbnail ? " <Relationship Id=\"rel1\" Target=\"/" + THUMBNAIL_ENTRY + "\" Type=\"" + THUMBNAIL_TYPE
                        + "\"/>\n" : "")
                + "</Relationships>\n";
    }

    private static void writeModel(ThreeMfModel model, OutputStream out, MeshTexts texts) throws IOException {
        Utf8 w = new Utf8(out);
        boolean own = model.metadata().keySet().stream().anyMatch(k -> k.startsWith("shearstack:"));
        w.write("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<model unit=\"millimeter\" xml:lang=\"en-US\" xmlns=\"");
        w.write(CORE_NAMESPACE);
        w.write('"');
        if (own) {
            w.write(" xmlns:shearstack=\"" + ThreeMfModel.SHEARSTACK_NAMESPACE + "\"");
        }
        w.write(">\n");
        for (Map.Entry<String, String> m : model.metadata().entrySet()) {
            w.write(" <metadata name=\"" + escape(m.getKey()) + "\">" + escape(m.getValue()) + "</metadata>\n");
        }
        w.write(" <resources>\n");
        List<String> colours = model.colours();
        int materialsId = 1;
        for (ThreeMfModel.ThreeMfObject o : model.objects()) {
            materialsId = Math.max(materialsId, o.id() + 1);
        }
        if (!colours.isEmpty()) {
            w.write("  <basematerials id=\"" + materialsId + "\">\n");
            for (int i = 0; i < colours.size(); i++) {
                w.write("   <base name=\"colour " + (i + 1) + "\" displaycolor=\"" + colours.get(i) + "\"/>\n");
            }
            w.write("  </basematerials>\n");
        }
        for (ThreeMfModel.ThreeMfObject o : model.objects()) {
            w.write("  <object id=\"" + o.id() + "\" type=\"model\" name=\"" + escape(o.name()) + "\"");
            if (o.colourHex() != null) {
                w.write(" pid=\"" + materialsId + "\" pindex=\"" + colours.indexOf(o.colourHex()) + "\"");
            }
            w.write(">\n");
            if (o.isAssembly()) {
                w.write("   <components>\n");
                for (ThreeMfModel.Component c : o.components()) {
                    w.write("    <component objectid=\"" + c.objectId() + "\"" + transformAttribute(c.transform()) + "/>\n");
                }
                w.write("   </components>\n");
            } else {
                out.write(texts.of(o.mesh()));
            }
            w.write("  </object>\n");
        }
        w.write(" </resources>\n <build>\n");
        for (ThreeMfModel.Item i : model.items()) {
            w.write("  <item objectid=\"" + i.objectId() + "\"" + transformAttribute(i.transform()));
            if (i.partNumber() != null) {
                w.write(" partnumber=\"" + escape(i.partNumber()) + "\"");
            }
            w.write("/>\n");
        }
        w.write(" </build>\n</model>\n");
    }

    /** The {@code <mesh>} element of a mesh as ASCII bytes. */
    static byte[] meshBytes(Mesh mesh) {
        int nv = mesh.vertexCount();
        int nt = mesh.triangleCount();
        Ascii b = new Ascii((int) Math.min(Integer.MAX_VALUE - 64, 48L + 72L * nv + 48L * nt));
        b.text("   <mesh>\n    <vertices>\n");
        for (int v = 0; v < nv; v++) {
            b.text("     <vertex x=\"").number(mesh.x(v)).text("\" y=\"").number(mesh.y(v)).text("\" z=\"")
                    .number(mesh.z(v)).text("\"/>\n");
        }
        b.text("    </vertices>\n    <triangles>\n");
        for (int t = 0; t < nt; t++) {
            b.text("     <triangle v1=\"").integer(mesh.corner(t, 0)).text("\" v2=\"").integer(mesh.corner(t, 1))
                    .text("\" v3=\"").integer(mesh.corner(t, 2)).text("\"/>\n");
        }
        b.text("    </triangles>\n   </mesh>\n");
        return b.toBytes();
    }

    private static final int DYADIC_BITS = 16;
    private static final long DYADIC_SCALE = 1L << DYADIC_BITS;
    private static final long FIVE_POW_16 = 152_587_890_625L;

    /**
     * Appends {@link #number(double)}'s text. Values on a dyadic grid of 2^-16 (the kernel's grids included)
     * are written as their exact decimal expansion without going through Double.toString; it reads back to
     * the same double.
     */
    static void appendNumber(StringBuilder sb, double v) {
        Ascii a = new Ascii(32);
        a.number(v);
        sb.append(new String(a.buf, 0, a.len, StandardCharsets.US_ASCII));
    }

    /** A growable ASCII byte buffer with exact number formatting (no String per number). */
    static final class Ascii {
        private byte[] buf;
        private int len;

        Ascii(int capacity) {
            buf = new byte[Math.max(64, capacity)];
        }

        private void ensure(int more) {
            if (len + more > buf.length) {
                long cap = Math.max((long) buf.length * 2, (long) len + more);
                if (cap > Integer.MAX_VALUE - 16) {
                    throw new IllegalStateException("3MF mesh text larger than 2 GB");
                }
                buf = java.util.Arrays.copyOf(buf, (int) cap);
            }
        }

        /** Appends ASCII text (the mesh markup). */
        Ascii text(String s) {
            int n = s.length();
            ensure(n);
            for (int i = 0; i < n; i++) {
                buf[len++] = (byte) s.charAt(i);
            }
            return this;
        }

        Ascii integer(long v) {
            ensure(20);
            if (v < 0) {
                buf[len++] = '-';
                v = -v;
            }
            int digits = 1;
            for (long p = 10; digits < 19 && v >= p; p *= 10) {
                digits++;
            }
            for (int i = len + digits - 1; i >= len; i--) {
                buf[i] = (byte) ('0' + v % 10);
                v /= 10;
            }
            len += digits;
            return this;
        }

        /**
         * {@link #number(double)}'s value. Values on a dyadic grid of 2^-16 (the kernel's grids included) are
         * written as their exact decimal expansion without going through Double.toString; it reads back to the
         * same double.
         */
        Ascii number(double v) {
            double scaled = v * DYADIC_SCALE;
            if (scaled == Math.rint(scaled) && Math.abs(scaled) < 1e15) {
                long k = (long) scaled;
                if (k < 0) {
                    ensure(1);
                    buf[len++] = '-';
                    k = -k;
                }
                integer(k >>> DYADIC_BITS);
                long frac = k & (DYADIC_SCALE - 1);
                if (frac != 0) {
                    // frac / 2^16 = frac * 5^16 / 10^16: exactly 16 decimal digits, trailing zeros dropped
                    long d = frac * FIVE_POW_16;
                    int digits = DYADIC_BITS;
                    while (d % 10 == 0) {
                        d /= 10;
                        digits--;
                    }
                    ensure(1 + digits);
                    buf[len++] = '.';
                    for (int i = len + digits - 1; i >= len; i--) {
                        buf[i] = (byte) ('0' + d % 10);
                        d /= 10;
                    }
                    len += digits;
                }
                return this;
            }
            return text(ThreeMfWriter.number(v));
        }

        byte[] toBytes() {
            return java.util.Arrays.copyOf(buf, len);
        }
    }

    /** Writes strings as UTF-8 to a stream (the model's markup around the meshes). */
    private static final class Utf8 {
        private final OutputStream out;

        Utf8(OutputStream out) {
            this.out = out;
        }

        void write(String s) throws IOException {
            out.write(s.getBytes(StandardCharsets.UTF_8));
        }

        void write(char c) throws IOException {
            out.write(String.valueOf(c).getBytes(StandardCharsets.UTF_8));
        }
    }

    private static String transformAttribute(Transform t) {
        if (t.isIdentity()) {
            return "";
        }
        double[] m = t.to3mfMatrix();
        StringBuilder sb = new StringBuilder(" transform=\"");
        for (int i = 0; i < 12; i++) {
            if (i > 0) {
                sb.append(' ');
            }
            sb.append(number(m[i]));
        }
        return sb.append('"').toString();
    }

    /** Shortest decimal that reads back to the same double; locale-independent; never "-0". */
    static String number(double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("3MF number: expected a finite value, found " + v);
        }
        double x = v + 0.0;
        if (x == Math.rint(x) && Math.abs(x) < 1e15) {
            return Long.toString((long) x);
        }
        return Double.toString(x);
    }

    static String escape(String s) {
        StringBuilder sb = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '&' -> sb.append("&amp;");
                case '"' -> sb.append("&quot;");
                case '\'' -> sb.append("&apos;");
                default -> {
                    if (c < 0x20 && c != '\t' && c != '\n' && c != '\r') {
                        sb.append('?');
                    } else {
                        sb.append(c);
                    }
                }
            }
        }
        return sb.toString();
    }

    /** Keeps the zip (or caller's) stream open when a wrapper is closed. */
    private static final class NonClosing extends FilterOutputStream {
        NonClosing(OutputStream out) {
            super(out);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
        }

        @Override
        public void close() throws IOException {
            flush();
        }
    }
}
