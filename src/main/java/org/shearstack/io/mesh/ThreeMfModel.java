package org.shearstack.io.mesh;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.regex.Pattern;

import org.shearstack.geom.Mesh;
import org.shearstack.geom.Transform;

/**
 * What a 3MF package holds, as values: objects (each either a mesh with an optional colour, or an assembly of
 * components referring to earlier objects with transforms), build items, model metadata and an optional
 * thumbnail. Units are millimetres. Build one with {@link #builder()}.
 *
 * @param objects      in definition order; every reference points to an earlier object
 * @param items        the build: objects placed on the plate
 * @param metadata     well-known 3MF names (Title, Designer, Description, Copyright, LicenseTerms, Rating,
 *                     CreationDate, ModificationDate, Application) or names prefixed {@code shearstack:}
 * @param thumbnailPng PNG bytes for the package thumbnail, or null
 */
public record ThreeMfModel(List<ThreeMfObject> objects, List<Item> items, Map<String, String> metadata,
        byte[] thumbnailPng) {

    /** The namespace of our own metadata names (prefix {@code shearstack}). */
    public static final String SHEARSTACK_NAMESPACE = "https://shearstack.org/3mf/metadata/2025";

    private static final Set<String> WELL_KNOWN = Set.of("Title", "Designer", "Description", "Copyright",
            "LicenseTerms", "Rating", "CreationDate", "ModificationDate", "Application");
    private static final Pattern COLOUR = Pattern.compile("#[0-9A-F]{6}([0-9A-F]{2})?");
    private static final Pattern OWN_NAME = Pattern.compile("shearstack:[A-Za-z_][A-Za-z0-9_.-]*");

    public ThreeMfModel {
        objects = List.copyOf(objects);
        items = List.copyOf(items);
        metadata = Collections.unmodifiableMap(new LinkedHashMap<>(metadata));
        thumbnailPng = thumbnailPng == null ? null : thumbnailPng.clone();
        validate(objects, items, metadata);
    }

    @Override
    public byte[] thumbnailPng() {
        return thumbnailPng == null ? null : thumbnailPng.clone();
    }

    /** A component of an assembly object: another object placed by a transform. */
    public record Component(int objectId, Transform transform) {
        public Component {
            Objects.requireNonNull(transform, "transform");
        }
    }

    /** A build item: an object placed on the build plate, with an optional part number. */
    public record Item(int objectId, Transform transform, String partNumber) {
        public Item {
            Objects.requireNonNull(transform, "transform");
        }
    }

    /**
     * An object: a mesh (components empty) or an assembly (mesh null).
     *
     * @param id         resource id, &ge; 1, unique
     * @param name       display name
     * @param mesh       the triangles, or null for an assembly
     * @param colourHex  "#RRGGBB" or "#RRGGBBAA" (upper case) for a mesh, or null
     * @param components the parts of an assembly
     */
    public record ThreeMfObject(int id, String name, Mesh mesh, String colourHex, List<Component> components) {
        public ThreeMfObject {
            Objects.requireNonNull(name, "name");
            components = List.copyOf(components);
        }

        public static ThreeMfObject mesh(int id, String name, Mesh mesh, String colourHex) {
            return new ThreeMfObject(id, name, Objects.requireNonNull(mesh, "mesh"), colourHex, List.of());
        }

        public static ThreeMfObject assembly(int id, String name, List<Component> components) {
            return new ThreeMfObject(id, name, null, null, components);
        }

        public boolean isAssembly() {
            return mesh == null;
        }
    }

    public static Builder builder() {
        return new Builder();
    }

    /** The distinct colours of the mesh objects, in order of first use. */
    public List<String> colours() {
        List<String> out = new ArrayList<>();
        for (ThreeMfObject o : objects) {
            if (o.colourHex() != null && !out.contains(o.colourHex())) {
                out.add(o.colourHex());
            }
        }
        return out;
    }

    private static void validate(List<ThreeMfObject> objects, List<Item> items, Map<String, String> metadata) {
        Set<Integer> defined = new HashSet<>();
        for (ThreeMfObject o : objects) {
            String where = "3MF object " + o.id() + " (" + o.name() + "): ";
            if (o.id() < 1) {
                throw new IllegalArgumentException(where + "expected an id >= 1");
            }
            if (!defined.add(o.id())) {
                throw new IllegalArgumentException(where + "duplicate id");
            }
            if (o.mesh() == null) {
                if (o.components().isEmpty()) {
                    throw new IllegalArgumentException(where + "expected a mesh or at least one component");
                }
                if (o.colourHex() != null) {
                    throw new IllegalArgumentException(where + "an assembly cannot carry a colour; colour its parts");
                }
                for (Component c : o.components()) {
                    if (c.objectId() == o.id() || !defined.contains(c.objectId())) {
                        throw new IllegalArgumentException(where + "component refers to object " + c.objectId()
                                + ", expected an object defined earlier");
                    }
                }
            } else {
                if (!o.components().isEmpty()) {
                    throw new IllegalArgumentException(where + "expected a mesh or components, not both");
                }
                if (o.mesh().triangleCount() == 0) {
                    throw new IllegalArgumentException(where + "a mesh object needs at least one triangle");
                }
                if (o.colourHex() != null && !COLOUR.matcher(o.colourHex()).matches()) {
                    throw new IllegalArgumentException(where + "colour: expected #RRGGBB or #RRGGBBAA in upper-case hex,"
                            + " found " + o.colourHex());
                }
            }
        }
        for (Item i : items) {
            if (!defined.contains(i.objectId())) {
                throw new IllegalArgumentException("3MF build item: refers to object " + i.objectId()
                        + ", expected one of " + defined);
            }
        }
        for (String name : metadata.keySet()) {
            if (!WELL_KNOWN.contains(name) && !OWN_NAME.matcher(name).matches()) {
                throw new IllegalArgumentException("3MF metadata name: expected one of " + WELL_KNOWN
                        + " or shearstack:Name, found " + name);
            }
        }
    }

    /** Collects objects, items and metadata. */
    public static final class Builder {
        private final List<ThreeMfObject> objects = new ArrayList<>();
        private final List<Item> items = new ArrayList<>();
        private final Map<String, String> metadata = new LinkedHashMap<>();
        private byte[] thumbnail;

        /** Adds a mesh object with the next id and returns that id. */
        public int addMesh(String name, Mesh mesh, String colourHex) {
            int id = objects.size() + 1;
            objects.add(ThreeMfObject.mesh(id, name, mesh, colourHex));
            return id;
        }

        /** Adds an assembly of earlier objects with the next id and returns that id. */
        public int addAssembly(String name, List<Component> components) {
            int id = objects.size() + 1;
            objects.add(ThreeMfObject.assembly(id, name, components));
            return id;
        }

        public Builder item(int objectId, Transform transform, String partNumber) {
            items.add(new Item(objectId, transform, partNumber));
            return this;
        }

        public Builder metadata(String name, String value) {
            metadata.put(name, value);
            return this;
        }

        public Builder thumbnailPng(byte[] png) {
            thumbnail = png;
            return this;
        }

        public ThreeMfModel build() {
            return new ThreeMfModel(objects, items, metadata, thumbnail);
        }
    }
}
