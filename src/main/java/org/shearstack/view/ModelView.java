package org.shearstack.view;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import javafx.scene.AmbientLight;
import javafx.scene.DepthTest;
import javafx.scene.Group;
import javafx.scene.PerspectiveCamera;
import javafx.scene.PointLight;
import javafx.scene.paint.Color;
import javafx.scene.paint.PhongMaterial;
import javafx.scene.shape.Sphere;
import javafx.scene.transform.Affine;
import javafx.scene.transform.Rotate;
import javafx.scene.transform.Translate;
import org.shearstack.check.Finding;
import org.shearstack.geom.Mesh;

/**
 * The 3D content of one view scene: parts, finding marker, lights and camera, with the view state
 * (explode fraction, section, visibility, highlight). Must be used on the JavaFX thread once shown.
 *
 * <p>The model frame has Z along the turbine axis; it is shown with that axis horizontal (to the right),
 * the way the machine sits on a bench, and the section's kept half (y &ge; 0) behind the cut.
 */
final class ModelView {

    private static final Rgb MARKER = Rgb.parse("#e0117f");

    /** The window's spread slider goes to three times the producer's exploded offsets. */
    static final double MAX_SPREAD = 3;

    private final ViewScene scene;
    private final double[] originMm;
    private final Map<String, PartNode> parts = new LinkedHashMap<>();
    private final Map<String, Boolean> visible = new LinkedHashMap<>();
    private final Group modelGroup = new Group();
    private final Group root = new Group();
    private final PerspectiveCamera camera = new PerspectiveCamera(true);
    private final Group rig = new Group();
    private final Translate rigTarget = new Translate();
    private final Rotate rigYaw = new Rotate(0, Rotate.Y_AXIS);
    private final Rotate rigPitch = new Rotate(0, Rotate.X_AXIS);
    private final Translate rigBack = new Translate();
    private final PointLight headLight = new PointLight(Color.gray(0.72));
    private final PointLight fillLight = new PointLight(Color.gray(0.3));
    private final Sphere marker = new Sphere(1);
    private final List<String> notes = new ArrayList<>();
    private double explode;
    private boolean section;
    private Optional<Finding> highlighted = Optional.empty();
    private Orbit orbit = Orbit.initial();

    private ModelView(ViewScene scene, double[] originMm) {
        this.scene = scene;
        this.originMm = originMm;
    }

    /**
     * Builds the nodes for a scene (may run off the JavaFX thread: nothing is shown yet).
     *
     * @throws IllegalArgumentException naming the part when a mesh cannot be shown
     */
    static ModelView build(ViewScene scene) {
        FxToolkit.ensureStarted(); // Prism reads its settings once, when the first node is made
        Map<String, Mesh> placed = new LinkedHashMap<>();
        Box3 all = Box3.EMPTY;
        for (ViewPart p : scene.parts()) {
            Mesh m = p.placedMesh();
            placed.put(p.name(), m);
            all = all.union(Box3.of(m));
        }
        ModelView view = new ModelView(scene, medianCentre(placed.values()));
        for (ViewPart p : scene.parts()) {
            Mesh m = placed.get(p.name());
            FxMeshArrays arrays;
            try {
                arrays = MeshAdapter.toArrays(m, view.originMm, MeshAdapter.DEFAULT_CREASE_DEGREES);
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("part '" + p.name() + "': " + e.getMessage(), e);
            }
            if (arrays.isEmpty()) {
                view.notes.add("part '" + p.name() + "' has no triangles to draw");
            } else if (arrays.droppedDegenerate() > 0) {
                view.notes.add("part '" + p.name() + "': " + arrays.droppedDegenerate() + " degenerate triangles not drawn");
            }
            PartNode node = new PartNode(p, m, view.originMm, arrays);
            view.parts.put(p.name(), node);
            view.visible.put(p.name(), true);
            view.modelGroup.getChildren().add(node.node());
        }
        view.assemble(all);
        return view;
    }

    /**
     * The origin for float coordinates: per axis, the median of the parts' box centres. One part far away
     * (a file in the wrong unit) then fails with its own name instead of moving every other part out of range.
     */
    private static double[] medianCentre(java.util.Collection<Mesh> meshes) {
        List<double[]> centres = new ArrayList<>();
        for (Mesh m : meshes) {
            Box3 b = Box3.of(m);
            if (!b.isEmpty()) {
                centres.add(b.centre());
            }
        }
        double[] origin = new double[3];
        for (int axis = 0; axis < 3 && !centres.isEmpty(); axis++) {
            final int a = axis;
            double[] values = centres.stream().mapToDouble(c -> c[a]).sorted().toArray();
            origin[axis] = values[(values.length - 1) / 2];
        }
        return origin;
    }

    private void assemble(Box3 all) {
        // model (x, y, z) -> display (z, x, y): axis to the right, x downwards, y away from the viewer
        modelGroup.getTransforms().add(new Affine(0, 0, 1, 0, 1, 0, 0, 0, 0, 1, 0, 0));
        PhongMaterial markerMaterial = new PhongMaterial(PartNode.fx(MARKER));
        marker.setMaterial(markerMaterial);
        marker.setRadius(Math.max(all.diagonal(), 1) * 0.018);
        marker.setVisible(false);
        marker.setDepthTest(DepthTest.DISABLE); // drawn last and over everything: visible inside a part too
        modelGroup.getChildren().add(marker);
        rig.getTransforms().addAll(rigTarget, rigYaw, rigPitch, rigBack);
        camera.setFieldOfView(Orbit.FIELD_OF_VIEW_DEGREES);
        rig.getChildren().addAll(camera, headLight, fillLight);
        AmbientLight ambient = new AmbientLight(Color.gray(0.36));
        root.getChildren().addAll(modelGroup, rig, ambient);
        applyOrbit();
    }

    Group root() {
        return root;
    }

    PerspectiveCamera camera() {
        return camera;
    }

    double[] originMm() {
        return originMm.clone();
    }

    ViewScene scene() {
        return scene;
    }

    List<String> notes() {
        return List.copyOf(notes);
    }

    List<PartNode> partNodes() {
        return List.copyOf(parts.values());
    }

    Orbit orbit() {
        return orbit;
    }

    void setOrbit(Orbit value) {
        orbit = value;
        applyOrbit();
    }

    /** Aims the camera so every visible part fits the picture. */
    void fit(double aspect) {
        setOrbit(orbit.fitting(displayBounds(), aspect));
    }

    void setExplode(double fraction) {
        explode = Math.max(0, Math.min(MAX_SPREAD, fraction));
        parts.values().forEach(p -> p.setExplode(explode));
        placeMarker();
    }

    double explode() {
        return explode;
    }

    /** Switches the section view; returns notes on parts whose cut face could not be made. */
    List<String> setSection(boolean on) {
        section = on;
        List<String> problems = new ArrayList<>();
        for (PartNode p : parts.values()) {
            String note = p.showSection(on);
            if (!note.isEmpty()) {
                problems.add("section of '" + p.part().name() + "': " + note);
            }
        }
        return problems;
    }

    boolean section() {
        return section;
    }

    void setVisible(String part, boolean value) {
        PartNode p = parts.get(part);
        if (p != null) {
            visible.put(part, value);
            p.node().setVisible(value);
        }
    }

    boolean isVisible(String part) {
        return visible.getOrDefault(part, false);
    }

    void setColour(String part, Rgb colour) {
        PartNode p = parts.get(part);
        if (p != null) {
            p.setColour(colour, isDimmed(part));
        }
    }

    /** Highlights a finding's part (the others are dimmed) and marks its location, or clears with empty. */
    void highlight(Optional<Finding> finding) {
        highlighted = finding;
        parts.values().forEach(p -> p.setColour(p.colour(), isDimmed(p.part().name())));
        placeMarker();
    }

    private boolean isDimmed(String part) {
        if (highlighted.isEmpty()) {
            return false;
        }
        String target = highlighted.get().part();
        boolean anyMatch = parts.values().stream().anyMatch(p -> p.part().isCopyOf(target));
        return anyMatch && !parts.get(part).part().isCopyOf(target);
    }

    private void placeMarker() {
        Optional<double[]> at = highlighted.flatMap(this::markerPosition);
        marker.setVisible(at.isPresent());
        at.ifPresent(p -> {
            marker.setTranslateX(p[0]);
            marker.setTranslateY(p[1]);
            marker.setTranslateZ(p[2]);
        });
    }

    /** Where a finding's location is drawn, model frame relative to the origin, or empty when it has no place. */
    Optional<double[]> markerPosition(Finding f) {
        PartNode p = parts.values().stream().filter(n -> n.part().isCopyOf(f.part())).findFirst().orElse(null);
        if (p == null || !f.where().isKnown()) {
            return Optional.empty();
        }
        Finding.Location w = f.where();
        double[] q = p.part().placement().apply(w.xMm(), w.yMm(), w.zMm());
        OffsetMm o = p.part().explodedOffset().scaled(explode);
        return Optional.of(new double[] {
            q[0] + o.xMm() - originMm[0], q[1] + o.yMm() - originMm[1], q[2] + o.zMm() - originMm[2]});
    }

    /** Bounds of the visible content in display coordinates. */
    Box3 displayBounds() {
        Box3 m = Box3.EMPTY;
        for (PartNode p : parts.values()) {
            if (isVisible(p.part().name())) {
                m = m.union(p.modelBounds(section, explode));
            }
        }
        return m.isEmpty() ? m : new Box3(m.minZ(), m.minX(), m.minY(), m.maxZ(), m.maxX(), m.maxY());
    }

    private void applyOrbit() {
        rigTarget.setX(orbit.targetX());
        rigTarget.setY(orbit.targetY());
        rigTarget.setZ(orbit.targetZ());
        rigYaw.setAngle(orbit.yawDegrees());
        rigPitch.setAngle(orbit.pitchDegrees());
        rigBack.setZ(-orbit.distanceMm());
        camera.setNearClip(Math.max(orbit.distanceMm() / 200, 1e-3));
        camera.setFarClip(orbit.distanceMm() * 20);
        headLight.setTranslateX(-orbit.distanceMm() * 0.35);
        headLight.setTranslateY(-orbit.distanceMm() * 0.45);
        fillLight.setTranslateX(orbit.distanceMm() * 0.7);
        fillLight.setTranslateY(orbit.distanceMm() * 0.2);
    }
}
