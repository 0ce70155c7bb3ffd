package org.shearstack.view;

import java.io.IOException;
import java.util.function.Consumer;

/**
 * Entry points for the command line. Signatures use no JavaFX types and nothing here starts the
 * graphics toolkit until a window or picture is actually asked for, so callers work without a display.
 */
public final class ViewLauncher {

    private ViewLauncher() {
    }

    /** True when a display is configured. */
    public static boolean displayAvailable() {
        return Snapshots.displayAvailable();
    }

    /**
     * Loads the source, opens the window and blocks until the user closes it. With {@code watch}, saving a
     * watched file reloads the view; a failed reload shows its error and keeps the last good model.
     *
     * @param log receives short progress lines (for the command's output)
     * @throws SceneLoadException          when the first load fails (nothing is opened)
     * @throws DisplayUnavailableException when there is no display or no 3D
     */
    public static void openWindow(SceneSource source, boolean watch, Consumer<String> log)
            throws SceneLoadException, IOException, InterruptedException {
        ViewScene first = source.load();
        FxToolkit.ensureStarted();
        ViewSession session = ViewSession.open(source, first, watch, log);
        session.awaitClose();
        FxToolkit.shutdown();
    }

    /**
     * Loads the source once and renders a PNG.
     *
     * @throws SceneLoadException          when loading fails
     * @throws DisplayUnavailableException when there is no display or no 3D
     */
    public static byte[] snapshot(SceneSource source, SnapshotOptions options) throws SceneLoadException {
        ViewScene scene = source.load();
        if (scene.parts().isEmpty()) {
            throw new SceneLoadException(source.describe() + ": nothing to draw: the scene has no parts"
                    + (scene.notes().isEmpty() ? "" : " (" + String.join("; ", scene.notes()) + ")"));
        }
        return Snapshots.render(scene, options);
    }
}
