package org.shearstack.view;

import javafx.scene.Group;
import javafx.scene.paint.Color;
import javafx.scene.paint.PhongMaterial;
import javafx.scene.shape.CullFace;
import javafx.scene.shape.MeshView;
import javafx.scene.shape.TriangleMesh;
import javafx.scene.shape.VertexFormat;
import javafx.scene.transform.Translate;
import org.shearstack.geom.Mesh;

/**
 * The scene-graph nodes of one part: the whole part, and (made on first use) the kept half and cut face
 * of the section view, inside a group that the exploded view moves.
 */
final class PartNode {

    private static final Rgb CUT_TINT = Rgb.parse("#f4efe2");

    private final ViewPart part;
    private final Mesh placed;
    private final double[] originMm;
    private final Group group = new Group();
    private final Translate explode = new Translate();
    private final MeshView whole;
    private final PhongMaterial material = new PhongMaterial();
    private final PhongMaterial cutMaterial = new PhongMaterial();
    private final Box3 wholeBox;
    private SectionResult section;
    private Group sectionGroup;
    private Rgb colour;
    private boolean dimmed;

    PartNode(ViewPart part, Mesh placed, double[] originMm, FxMeshArrays arrays) {
        this.part = part;
        this.placed = placed;
        this.originMm = originMm.clone();
        this.wholeBox = Box3.of(placed);
        this.whole = meshView(arrays, material);
        group.getTransforms().add(explode);
        group.getChildren().add(whole);
        setColour(part.colour(), false);
        material.setSpecularColor(Color.gray(0.25));
        material.setSpecularPower(24);
        cutMaterial.setSpecularColor(Color.gray(0.1));
    }

    Group node() {
        return group;
    }

    ViewPart part() {
        return part;
    }

    Rgb colour() {
        return colour;
    }

    boolean dimmed() {
        return dimmed;
    }

    void setColour(Rgb rgb, boolean dim) {
        colour = rgb;
        dimmed = dim;
        Rgb shown = dim ? rgb.mix(Rgb.parse("#d9d6cf"), 0.7) : rgb;
        material.setDiffuseColor(fx(shown));
        cutMaterial.setDiffuseColor(fx(shown.mix(CUT_TINT, 0.45)));
    }

    void setExplode(double fraction) {
        OffsetMm o = part.explodedOffset().scaled(fraction);
        explode.setX(o.xMm());
        explode.setY(o.yMm());
        explode.setZ(o.zMm());
    }

    /** Shows the whole part or its section; returns a note when the section has a problem. */
    String showSection(boolean on) {
        String note = "";
        if (on) {
            if (sectionGroup == null) {
                buildSection();
            }
            note = section.note();
        }
        whole.setVisible(!on);
        if (sectionGroup != null) {
            sectionGroup.setVisible(on);
        }
        return note;
    }

    /** Bounds in the model frame relative to the origin, including the explode offset. */
    Box3 modelBounds(boolean sectioned, double explodeFraction) {
        Box3 box = sectioned ? sectionBounds() : wholeBox;
        OffsetMm o = part.explodedOffset().scaled(explodeFraction);
        return box.shifted(o.xMm() - originMm[0], o.yMm() - originMm[1], o.zMm() - originMm[2]);
    }

    private Box3 sectionBounds() {
        if (section == null) {
            section = cut();
        }
        return Box3.of(section.combined());
    }

    private void buildSection() {
        if (section == null) {
            section = cut();
        }
        sectionGroup = new Group(
                meshView(MeshAdapter.toArrays(section.body(), originMm, MeshAdapter.DEFAULT_CREASE_DEGREES), material),
                meshView(MeshAdapter.toArrays(section.cap(), originMm, MeshAdapter.DEFAULT_CREASE_DEGREES), cutMaterial));
        group.getChildren().add(sectionGroup);
    }

    private SectionResult cut() {
        if (part.section().isPresent()) {
            return splitCutFace(part.section().get().keptHalf());
        }
        return MeshSection.keepPositiveY(placed);
    }

    /** Separates the triangles lying in the cut plane (drawn in the cut tint) from the rest. */
    static SectionResult splitCutFace(Mesh half) {
        int[] tri = half.triangleArray();
        int[] body = new int[tri.length];
        int[] cap = new int[tri.length];
        int nb = 0;
        int nc = 0;
        for (int t = 0; t < tri.length; t += 3) {
            boolean inPlane = half.y(tri[t]) == 0 && half.y(tri[t + 1]) == 0 && half.y(tri[t + 2]) == 0;
            int[] into = inPlane ? cap : body;
            int at = inPlane ? nc : nb;
            System.arraycopy(tri, t, into, at, 3);
            if (inPlane) {
                nc += 3;
            } else {
                nb += 3;
            }
        }
        double[] xyz = half.vertexArray();
        return new SectionResult(Mesh.of(xyz, java.util.Arrays.copyOf(body, nb)),
                Mesh.of(xyz, java.util.Arrays.copyOf(cap, nc)), "");
    }

    static MeshView meshView(FxMeshArrays arrays, PhongMaterial material) {
        TriangleMesh mesh = new TriangleMesh(VertexFormat.POINT_NORMAL_TEXCOORD);
        mesh.getPoints().setAll(arrays.points());
        mesh.getNormals().setAll(arrays.normals());
        mesh.getTexCoords().setAll(arrays.texCoords());
        mesh.getFaces().setAll(arrays.faces());
        MeshView view = new MeshView(mesh);
        view.setMaterial(material);
        view.setCullFace(CullFace.BACK);
        return view;
    }

    static Color fx(Rgb rgb) {
        return Color.rgb(rgb.red(), rgb.green(), rgb.blue());
    }
}
