package org.shearstack.io.mesh;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;

import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;

import org.shearstack.geom.Mesh;
import org.shearstack.geom.Transform;

/**
 * Reads the core of a 3MF package (objects with meshes, base-material colours, components, build items with
 * transforms, model metadata) into a {@link ThreeMfModel}, converting the model unit to millimetres.
 *
 * <p>Safe with hostile input: DTDs and external entities are refused, the package is limited to
 * {@link #MAX_ENTRIES} entries and {@link #MAX_UNCOMPRESSED_BYTES} decompressed bytes, entry names with
 * {@code ..}, backslashes or a leading slash are refused, and every numeric or index problem is a
 * {@link MeshFormatException} naming the entry, line and column.
 */
public final class ThreeMfReader {

    public static final int MAX_ENTRIES = 1000;
    public static final long MAX_UNCOMPRESSED_BYTES = 512L << 20;
    public static final long MAX_PACKAGE_BYTES = 512L << 20;
    public static final int MAX_TRIANGLES = StlReader.MAX_TRIANGLES;

    /**
     * Resource limits for one read.
     *
     * @param maxEntries             zip entries
     * @param maxUncompressedBytes   decompressed bytes over all entries
     * @param maxTriangles           triangles over all objects
     */
    public record Limits(int maxEntries, long maxUncompressedBytes, int maxTriangles) {
        /** The defaults: 1000 entries, 512 MiB, 20 M triangles. */
        public static final Limits DEFAULT = new Limits(MAX_ENTRIES, MAX_UNCOMPRESSED_BYTES, MAX_TRIANGLES);
    }

    private static final Set<String> WELL_KNOWN = Set.of("Title", "Designer", "Description", "Copyright",
            "LicenseTerms", "Rating", "CreationDate", "ModificationDate", "Application");
    private static final Map<String, Double> UNIT_MM = Map.of("micron", 0.001, "millimeter", 1.0, "centimeter", 10.0,
            "inch", 25.4, "foot", 304.8, "meter", 1000.0);

    private ThreeMfReader() {
    }

    public static ThreeMfModel read(Path file) throws IOException, MeshFormatException {
        long size = Files.size(file);
        if (size > MAX_PACKAGE_BYTES) {
            throw new MeshFormatException(file + ": " + size + " bytes exceeds the limit of " + MAX_PACKAGE_BYTES);
        }
        return read(Files.readAllBytes(file), file.toString());
    }

    public static ThreeMfModel read(byte[] data, String source) throws MeshFormatException {
        return read(data, source, Limits.DEFAULT);
    }

    public static ThreeMfModel read(byte[] data, String source, Limits limits) throws MeshFormatException {
        Map<String, byte[]> entries = unzip(data, source, limits);
        String modelName = startPart(entries, source);
        byte[] model = entries.get(modelName);
        if (model == null) {
            throw new MeshFormatException(source + ": the start part /" + modelName + " named in _rels/.rels is missing");
        }
        byte[] thumb = entries.get(ThreeMfWriter.THUMBNAIL_ENTRY);
        try {
            return new ModelParser(source + ": " + modelName, thumb, limits.maxTriangles()).parse(model);
        } catch (XMLStreamException e) {
            throw new MeshFormatException(source + ": " + modelName + ": " + e.getMessage(), e);
        }
    }

    private static Map<String, byte[]> unzip(byte[] data, String source, Limits limits) throws MeshFormatException {
        Map<String, byte[]> out = new LinkedHashMap<>();
        long total = 0;
        byte[] buf = new byte[1 << 16];
        try (ZipInputStream zip = new ZipInputStream(new ByteArrayInputStream(data))) {
            ZipEntry e;
            while ((e = zip.getNextEntry()) != null) {
                String name = e.getName();
                if (out.size() >= limits.maxEntries()) {
                    throw new MeshFormatException(source + ": more than " + limits.maxEntries() + " zip entries");
                }
                if (name.startsWith("/") || name.contains("\\") || Arrays.asList(name.split("/")).contains("..")
                        || name.isEmpty()) {
                    throw new MeshFormatException(source + ": zip entry \"" + name
                            + "\": expected a relative part name without \"..\" or backslashes");
                }
                ByteArrayOutputStream content = new ByteArrayOutputStream();
                int n;
                while ((n = zip.read(buf)) > 0) {
                    total += n;
                    if (total > limits.maxUncompressedBytes()) {
                        throw new MeshFormatException(source + ": zip entry \"" + name + "\": decompressed size exceeds "
                                + limits.maxUncompressedBytes() + " bytes in total");
                    }
                    content.write(buf, 0, n);
                }
                if (out.put(name, content.toByteArray()) != null) {
                    throw new MeshFormatException(source + ": duplicate zip entry \"" + name + "\"");
                }
            }
        } catch (IOException ex) {
            throw new MeshFormatException(source + ": not a readable zip package: " + ex.getMessage(), ex);
        }
        if (out.isEmpty()) {
            throw new MeshFormatException(source + ": not a 3MF package (no zip entries)");
        }
        return out;
    }

    private static String startPart(Map<String, byte[]> entries, String source) throws MeshFormatException {
        byte[] rels = entries.get("_rels/.rels");
        if (rels == null) {
            throw new MeshFormatException(source + ": missing _rels/.rels (package relationships)");
        }
        try {
            XMLStreamReader r = factory().createXMLStreamReader(new ByteArrayInputStream(rels));
            while (r.hasNext()) {
                int ev = r.next();
                refuseDtd(ev, r, source + ": _rels/.rels");
                if (ev == XMLStreamConstants.START_ELEMENT && r.getLocalName().equals("Relationship")
                        && ThreeMfWriter.START_PART_TYPE.equals(r.getAttributeValue(null, "Type"))) {
                    String target = r.getAttributeValue(null, "Target");
                    if (target == null || target.contains("..") || target.contains("://")) {
                        throw new MeshFormatException(source + ": _rels/.rels: start part target \"" + target
                                + "\": expected an absolute part name inside the package");
                    }
                    return target.startsWith("/") ? target.substring(1) : target;
                }
            }
        } catch (XMLStreamException e) {
            throw new MeshFormatException(source + ": _rels/.rels: " + e.getMessage(), e);
        }
        throw new MeshFormatException(source + ": _rels/.rels: no StartPart relationship (" + ThreeMfWriter.START_PART_TYPE
                + ")");
    }

    static XMLInputFactory factory() {
        XMLInputFactory f = XMLInputFactory.newFactory();
        f.setProperty(XMLInputFactory.SUPPORT_DTD, false);
        f.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, false);
        f.setProperty(XMLInputFactory.IS_REPLACING_ENTITY_REFERENCES, false);
        return f;
    }

    static void refuseDtd(int event, XMLStreamReader r, String where) throws MeshFormatException {
        if (event == XMLStreamConstants.DTD || event == XMLStreamConstants.ENTITY_REFERENCE) {
            throw new MeshFormatException(where + ": line " + r.getLocation().getLineNumber()
                    + ": DTDs and entity references are not allowed in 3MF");
        }
    }

    /** Streaming parser of one model part. */
    private static final class ModelParser {
        private final String where;
        private final byte[] thumbnail;
        private XMLStreamReader r;
        private double unitMm = 1;
        private final Map<String, String> metadata = new LinkedHashMap<>();
        private final Map<Integer, List<String>> materials = new HashMap<>();
        private final List<ThreeMfModel.ThreeMfObject> objects = new ArrayList<>();
        private final List<ThreeMfModel.Item> items = new ArrayList<>();
        private long triangleTotal;
        private final int maxTriangles;

        ModelParser(String where, byte[] thumbnail, int maxTriangles) {
            this.where = where;
            this.thumbnail = thumbnail;
            this.maxTriangles = maxTriangles;
        }

        ThreeMfModel parse(byte[] xml) throws XMLStreamException, MeshFormatException {
            r = factory().createXMLStreamReader(new ByteArrayInputStream(xml), "UTF-8");
            boolean sawModel = false;
            while (r.hasNext()) {
                int ev = r.next();
                refuseDtd(ev, r, where);
                if (ev != XMLStreamConstants.START_ELEMENT) {
                    continue;
                }
                String name = r.getLocalName();
                if (!ThreeMfWriter.CORE_NAMESPACE.equals(r.getNamespaceURI())) {
                    continue; // extension content is ignored
                }
                switch (name) {
                    case "model" -> {
                        sawModel = true;
                        String unit = r.getAttributeValue(null, "unit");
                        if (unit != null) {
                            Double mm = UNIT_MM.get(unit);
                            if (mm == null) {
                                throw error("unit: expected one of " + UNIT_MM.keySet() + ", found " + unit);
                            }
                            unitMm = mm;
                        }
                    }
                    case "metadata" -> {
                        String key = r.getAttributeValue(null, "name");
                        String value = r.getElementText();
                        if (key != null && (WELL_KNOWN.contains(key) || key.startsWith("shearstack:"))) {
                            metadata.put(key, value);
                        }
                    }
                    case "basematerials" -> materials.put(intAttr("id"), new ArrayList<>());
                    case "base" -> {
                        String colour = r.getAttributeValue(null, "displaycolor");
                        lastMaterials().add(colour == null ? null : colour.toUpperCase(java.util.Locale.ROOT));
                    }
                    case "object" -> readObject();
                    case "item" -> items.add(new ThreeMfModel.Item(intAttr("objectid"), transform(),
                            r.getAttributeValue(null, "partnumber")));
                    default -> {
                    }
                }
            }
            if (!sawModel) {
                throw new MeshFormatException(where + ": no <model> element in the core namespace");
            }
            try {
                return new ThreeMfModel(objects, items, metadata, thumbnail);
            } catch (IllegalArgumentException e) {
                throw new MeshFormatException(where + ": " + e.getMessage(), e);
            }
        }

        private int lastMaterialsId = -1;

        private List<String> lastMaterials() throws MeshFormatException {
            if (materials.isEmpty()) {
                throw error("<base> outside <basematerials>");
            }
            return materials.get(lastMaterialsId);
        }

        private int intAttr(String name) throws MeshFormatException {
            String v = r.getAttributeValue(null, name);
            if (v == null) {
                throw error("<" + r.getLocalName() + ">: missing attribute " + name);
            }
            try {
                int i = Integer.parseInt(v.trim());
                if ("id".equals(name) && "basematerials".equals(r.getLocalName())) {
                    lastMaterialsId = i;
                }
                return i;
            } catch (NumberFormatException e) {
                throw error("<" + r.getLocalName() + "> " + name + ": expected an integer, found \"" + v + "\"");
            }
        }

        private double number(String name) throws MeshFormatException {
            String v = r.getAttributeValue(null, name);
            if (v == null) {
                throw error("<" + r.getLocalName() + ">: missing attribute " + name);
            }
            double d;
            try {
                d = Double.parseDouble(v.trim());
            } catch (NumberFormatException e) {
                throw error("<" + r.getLocalName() + "> " + name + ": expected a number, found \"" + v + "\"");
            }
            if (!Double.isFinite(d) || v.contains("N") || v.contains("n") || v.contains("I")) {
                throw error("<" + r.getLocalName() + "> " + name + ": expected a finite number, found \"" + v + "\"");
            }
            return d;
        }

        private Transform transform() throws MeshFormatException {
            String v = r.getAttributeValue(null, "transform");
            if (v == null) {
                return Transform.identity();
            }
            String[] parts = v.trim().split("\\s+");
            if (parts.length != 12) {
                throw error("transform: expected 12 numbers, found " + parts.length);
            }
            double[] m = new double[12];
            for (int i = 0; i < 12; i++) {
                try {
                    m[i] = Double.parseDouble(parts[i]);
                } catch (NumberFormatException e) {
                    throw error("transform: expected a number, found \"" + parts[i] + "\"");
                }
                if (!Double.isFinite(m[i])) {
                    throw error("transform: expected finite numbers, found \"" + parts[i] + "\"");
                }
                if (i >= 9) {
                    m[i] *= unitMm;
                }
            }
            return Transform.from3mfMatrix(m);
        }

        private void readObject() throws XMLStreamException, MeshFormatException {
            int id = intAttr("id");
            String name = r.getAttributeValue(null, "name");
            String pid = r.getAttributeValue(null, "pid");
            String pindex = r.getAttributeValue(null, "pindex");
            String colour = null;
            if (pid != null) {
                List<String> group = materials.get(intAttr("pid"));
                int idx = pindex == null ? 0 : intAttr("pindex");
                if (group == null || idx < 0 || idx >= group.size()) {
                    throw error("object " + id + ": pid " + pid + " / pindex " + pindex + " refers to no base material");
                }
                colour = group.get(idx);
            }
            double[] xyz = new double[48];
            int nv = 0;
            int[] tri = new int[48];
            int nt = 0;
            List<ThreeMfModel.Component> components = new ArrayList<>();
            boolean hasMesh = false;
            while (r.hasNext()) {
                int ev = r.next();
                refuseDtd(ev, r, where);
                if (ev == XMLStreamConstants.END_ELEMENT && r.getLocalName().equals("object")) {
                    break;
                }
                if (ev != XMLStreamConstants.START_ELEMENT) {
                    continue;
                }
                switch (r.getLocalName()) {
                    case "mesh" -> hasMesh = true;
                    case "vertex" -> {
                        if (3 * nv + 3 > xyz.length) {
                            if (nv >= 3L * maxTriangles + 3) {
                                throw error("more than " + 3L * maxTriangles + " vertices");
                            }
                            xyz = Arrays.copyOf(xyz, xyz.length * 2);
                        }
                        xyz[3 * nv] = number("x") * unitMm;
                        xyz[3 * nv + 1] = number("y") * unitMm;
                        xyz[3 * nv + 2] = number("z") * unitMm;
                        nv++;
                    }
                    case "triangle" -> {
                        if (++triangleTotal > maxTriangles) {
                            throw error("more than " + maxTriangles + " triangles");
                        }
                        if (3 * nt + 3 > tri.length) {
                            tri = Arrays.copyOf(tri, tri.length * 2);
                        }
                        for (int k = 0; k < 3; k++) {
                            int v = intAttr("v" + (k + 1));
                            if (v < 0 || v >= nv) {
                                throw error("triangle " + nt + " v" + (k + 1) + ": expected a vertex index in [0, " + nv
                                        + "), found " + v);
                            }
                            tri[3 * nt + k] = v;
                        }
                        nt++;
                    }
                    case "component" -> components.add(new ThreeMfModel.Component(intAttr("objectid"), transform()));
                    default -> {
                    }
                }
            }
            if (hasMesh) {
                if (nt == 0) {
                    throw error("object " + id + ": a mesh without triangles");
                }
                Mesh mesh = Mesh.of(Arrays.copyOf(xyz, 3 * nv), Arrays.copyOf(tri, 3 * nt));
                objects.add(new ThreeMfModel.ThreeMfObject(id, name == null ? "" : name, mesh, colour, List.of()));
            } else {
                objects.add(new ThreeMfModel.ThreeMfObject(id, name == null ? "" : name, null, null, components));
            }
        }

        private MeshFormatException error(String message) {
            return new MeshFormatException(where + ": line " + r.getLocation().getLineNumber() + ", column "
                    + r.getLocation().getColumnNumber() + ": " + message);
        }
    }
}
