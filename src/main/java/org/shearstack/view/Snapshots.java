package org.shearstack.view;

import java.nio.IntBuffer;
import javafx.scene.Group;
import javafx.scene.Scene;
import javafx.scene.SceneAntialiasing;
import javafx.scene.SnapshotParameters;
import javafx.scene.SubScene;
import javafx.scene.image.PixelFormat;
import javafx.scene.image.WritableImage;

/**
 * Still pictures of a view scene, rendered off screen. Needs a display (a desktop, or Xvfb) with 3D;
 * {@link #displayAvailable()} tells callers such as the report whether to try.
 */
public final class Snapshots {

    /** Background of pictures and of the window's 3D area. */
    public static final Rgb BACKGROUND = Rgb.parse("#f7f5f0");

    private Snapshots() {
    }

    /** True when a display is configured, so rendering can be attempted. */
    public static boolean displayAvailable() {
        return FxToolkit.displayAvailable();
    }

    /**
     * Renders a PNG.
     *
     * @throws DisplayUnavailableException when there is no display or no 3D support
     * @throws IllegalArgumentException    naming the part when a mesh cannot be shown
     */
    public static byte[] render(ViewScene scene, SnapshotOptions options) {
        return renderPixels(scene, options).toPng();
    }

    /** Renders and returns the pixels (for tests and for callers that compose images). */
    public static ImagePixels renderPixels(ViewScene scene, SnapshotOptions options) {
        FxToolkit.ensureStarted();
        ModelView view = ModelView.build(scene);
        return FxToolkit.call(() -> draw(view, options));
    }

    private static ImagePixels draw(ModelView view, SnapshotOptions options) {
        int w = options.widthPx();
        int h = options.heightPx();
        view.setExplode(options.exploded() ? 1 : 0);
        view.setSection(options.section());
        view.fit((double) w / h);
        SubScene sub = new SubScene(view.root(), w, h, true, SceneAntialiasing.BALANCED);
        sub.setFill(PartNode.fx(BACKGROUND));
        sub.setCamera(view.camera());
        new Scene(new Group(sub), w, h);
        SnapshotParameters params = new SnapshotParameters();
        params.setFill(PartNode.fx(BACKGROUND));
        WritableImage image = sub.snapshot(params, new WritableImage(w, h));
        int[] argb = new int[w * h];
        image.getPixelReader().getPixels(0, 0, w, h, PixelFormat.getIntArgbInstance(), IntBuffer.wrap(argb), w);
        return new ImagePixels(w, h, argb);
    }
}
