package org.shearstack.io.mesh;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.shearstack.check.mesh.ForeignMeshCheck.MeshObject;
import org.shearstack.geom.Transform;

/**
 * Mesh files made elsewhere, as objects placed in the file's frame: an STL is one object; a 3MF gives one object
 * per mesh its build places (an assembly's components each become an object, placed by the component transform
 * followed by the item's).
 */
public final class MeshFiles {

    /** What a file holds. */
    public enum Kind { STL, THREE_MF }

    private MeshFiles() {
    }

    /**
     * The mesh kind of a file: by extension (.stl, .3mf), else by content (a zip package is a 3MF; a file that
     * starts with "solid" or whose size matches a binary STL's triangle count is an STL). Empty for anything else
     * (a spec).
     */
    public static Optional<Kind> kindOf(Path file) throws IOException {
        String name = file.getFileName() == null ? "" : file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".stl")) {
            return Optional.of(Kind.STL);
        }
        if (name.endsWith(".3mf")) {
            return Optional.of(Kind.THREE_MF);
        }
        if (name.endsWith(".yaml") || name.endsWith(".yml") || !Files.isRegularFile(file)) {
            return Optional.empty();
        }
        byte[] head;
        try (InputStream in = Files.newInputStream(file)) {
            head = in.readNBytes(84);
        }
        if (head.length >= 4 && head[0] == 'P' && head[1] == 'K' && head[2] == 3 && head[3] == 4) {
            return Optional.of(Kind.THREE_MF);
        }
        if (new String(head, StandardCharsets.US_ASCII).stripLeading().toLowerCase(Locale.ROOT).startsWith("solid ")) {
            return Optional.of(Kind.STL);
        }
        if (head.length == 84) {
            long count = ByteBuffer.wrap(head, 80, 4).order(ByteOrder.LITTLE_ENDIAN).getInt() & 0xffffffffL;
            if (84 + 50 * count == Files.size(file)) {
                return Optional.of(Kind.STL);
            }
        }
        return Optional.empty();
    }

    /** Reads the objects of a mesh file of the given kind. */
    public static List<MeshObject> read(Path file, Kind kind) throws IOException, MeshFormatException {
        if (kind == Kind.STL) {
            String name = file.getFileName() == null ? file.toString() : file.getFileName().toString();
            return List.of(new MeshObject(name, StlReader.read(file)));
        }
        return placed(ThreeMfReader.read(file), file.toString());
    }

    /** The meshes a 3MF build places, each moved by its placement. */
    public static List<MeshObject> placed(ThreeMfModel model, String source) throws MeshFormatException {
        if (model.items().isEmpty()) {
            throw new MeshFormatException(source + ": 3D/3dmodel.model: <build>: expected at least one <item>,"
                    + " found none (nothing is placed for printing)");
        }
        Map<Integer, ThreeMfModel.ThreeMfObject> byId = new HashMap<>();
        model.objects().forEach(o -> byId.put(o.id(), o));
        List<String> names = new ArrayList<>();
        List<MeshObject> out = new ArrayList<>();
        for (ThreeMfModel.Item item : model.items()) {
            collect(byId, byId.get(item.objectId()), item.transform(), "", names, out);
        }
        return out;
    }

    private static void collect(Map<Integer, ThreeMfModel.ThreeMfObject> byId, ThreeMfModel.ThreeMfObject o,
            Transform placement, String prefix, List<String> names, List<MeshObject> out) {
        String own = o.name().isBlank() ? "object " + o.id() : o.name();
        String name = prefix.isEmpty() ? own : prefix + "/" + own;
        if (!o.isAssembly()) {
            String unique = name;
            for (int k = 2; names.contains(unique); k++) {
                unique = name + " #" + k;
            }
            names.add(unique);
            out.add(new MeshObject(unique, placement.isIdentity() ? o.mesh() : o.mesh().transformed(placement)));
            return;
        }
        for (ThreeMfModel.Component c : o.components()) {
            collect(byId, byId.get(c.objectId()), c.transform().then(placement), name, names, out);
        }
    }
}
