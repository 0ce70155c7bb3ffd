package org.shearstack.view;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.shearstack.geom.Mesh;
import org.shearstack.geom.Transform;
import org.shearstack.io.mesh.ThreeMfModel;

/**
 * 3MF models as view scenes: every build item, assemblies flattened into their placed mesh objects.
 * A file carries no layered solids, so the section view cuts the meshes themselves.
 */
public final class ThreeMfScenes {

    /** Gap between neighbours at full spread, as a fraction of the assembly's diagonal. */
    private static final double SPREAD_GAP_FRACTION = 0.12;

    private ThreeMfScenes() {
    }

    /** One mesh object placed in the build. */
    public record Placed(String name, Mesh mesh, String colourHex, Transform transform) {
    }

    /** The placed mesh objects of every build item, in file order; copies get " #n" names. */
    public static List<Placed> flatten(ThreeMfModel model) {
        Map<Integer, ThreeMfModel.ThreeMfObject> byId = new HashMap<>();
        model.objects().forEach(o -> byId.put(o.id(), o));
        List<Placed> out = new ArrayList<>();
        for (ThreeMfModel.Item item : model.items()) {
            collect(byId.get(item.objectId()), item.transform(), byId, out, 0);
        }
        return numberCopies(out);
    }

    private static void collect(ThreeMfModel.ThreeMfObject o, Transform toWorld, Map<Integer, ThreeMfModel.ThreeMfObject> byId,
            List<Placed> out, int depth) {
        if (depth > 32) {
            throw new IllegalArgumentException("3MF object " + o.id() + ": components nested deeper than 32 levels");
        }
        if (!o.isAssembly()) {
            out.add(new Placed(o.name() == null || o.name().isBlank() ? "object " + o.id() : o.name(), o.mesh(),
                    o.colourHex(), toWorld));
            return;
        }
        for (ThreeMfModel.Component c : o.components()) {
            collect(byId.get(c.objectId()), c.transform().then(toWorld), byId, out, depth + 1);
        }
    }

    private static List<Placed> numberCopies(List<Placed> placed) {
        Map<String, Integer> total = new HashMap<>();
        placed.forEach(p -> total.merge(p.name(), 1, Integer::sum));
        Map<String, Integer> seen = new HashMap<>();
        List<Placed> out = new ArrayList<>();
        for (Placed p : placed) {
            int n = seen.merge(p.name(), 1, Integer::sum);
            String name = total.get(p.name()) == 1 ? p.name() : p.name() + " #" + n;
            out.add(new Placed(name, p.mesh(), p.colourHex(), p.transform()));
        }
        return out;
    }

    /** A scene from a 3MF file: exploded offsets planned along the axis. */
    public static ViewScene fromFile(String title, ThreeMfModel model) {
        List<ViewPart> parts = parts(flatten(model));
        Box3 all = Box3.EMPTY;
        for (ViewPart p : parts) {
            all = all.union(Box3.of(p.placedMesh()));
        }
        List<ViewPart> spread = ExplodePlanner.alongAxis(parts, SPREAD_GAP_FRACTION * all.diagonal());
        return new ViewScene(title, spread, List.of(), List.of(),
                List.of("from a 3MF file: section cut from the file's meshes, spread planned along Z"));
    }

    /** A scene from a kit folder's assembly and exploded assembly (same parts in the same order). */
    public static ViewScene fromKitFiles(String title, ThreeMfModel assembled, ThreeMfModel exploded) {
        List<Placed> at = flatten(assembled);
        List<Placed> apart = flatten(exploded);
        if (at.size() != apart.size()) {
            throw new IllegalArgumentException("kit: assembly.3mf has " + at.size() + " placed parts, expected the "
                    + "same in assembly-exploded.3mf, found " + apart.size());
        }
        List<ViewPart> parts = parts(at);
        List<ViewPart> out = new ArrayList<>();
        for (int i = 0; i < parts.size(); i++) {
            Transform a = at.get(i).transform();
            Transform e = apart.get(i).transform();
            out.add(parts.get(i).withExplodedOffset(new OffsetMm(e.element(0, 3) - a.element(0, 3),
                    e.element(1, 3) - a.element(1, 3), e.element(2, 3) - a.element(2, 3))));
        }
        return new ViewScene(title, out, List.of(), List.of(),
                List.of("from a kit folder: section cut from the meshes; findings are in the kit's report"));
    }

    private static List<ViewPart> parts(List<Placed> placed) {
        List<ViewPart> parts = new ArrayList<>();
        Map<String, Integer> colourIndex = new HashMap<>();
        for (Placed p : placed) {
            String base = p.name().replaceFirst(" #\\d+$", "");
            int index = colourIndex.computeIfAbsent(base, k -> colourIndex.size());
            parts.add(ViewPart.of(p.name(), p.mesh(), Palette.parseOr(p.colourHex(), index),
                    Placement.of(p.transform()), OffsetMm.ZERO));
        }
        return parts;
    }
}
