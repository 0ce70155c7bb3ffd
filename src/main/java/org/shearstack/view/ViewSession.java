package org.shearstack.view;

import java.io.IOException;
import java.util.Optional;
import java.util.concurrent.CountDownLatch;
import java.util.function.Consumer;
import javafx.application.Platform;
import javafx.stage.Stage;

/**
 * One open viewer window with its watcher: loads first, shows, then applies each reload (built off the
 * JavaFX thread, shown on it).
 */
final class ViewSession {

    private final SceneSource source;
    private final CountDownLatch closed = new CountDownLatch(1);
    private ViewerWindow window;
    private SceneWatcher watcher;

    private ViewSession(SceneSource source) {
        this.source = source;
    }

    /** Opens the window for a scene that has just loaded; starts watching when asked. */
    static ViewSession open(SceneSource source, ViewScene first, boolean watch, Consumer<String> log) throws IOException {
        ViewSession session = new ViewSession(source);
        ModelView model = ModelView.build(first);
        FxToolkit.call(() -> {
            session.window = new ViewerWindow(new Stage());
            session.window.show(model, 0);
            session.window.stage().setOnHidden(e -> session.closed.countDown());
            session.window.stage().show();
            return null;
        });
        if (watch && !source.watchedFiles().isEmpty()) {
            session.watcher = SceneWatcher.start(source, SceneWatcher.DEFAULT_DEBOUNCE, session::onReload);
            log.accept("watching " + session.watcher.files() + " for changes");
        }
        return session;
    }

    /** Blocks until the user closes the window. */
    void awaitClose() throws InterruptedException {
        closed.await();
        if (watcher != null) {
            watcher.close();
        }
    }

    void onReload(Reload reload) {
        Optional<ModelView> built = Optional.empty();
        Reload outcome = reload;
        if (reload instanceof Reload.Loaded loaded) {
            try {
                built = Optional.of(ModelView.build(loaded.scene()));
            } catch (RuntimeException e) {
                outcome = new Reload.Failed(source.describe() + ": " + e.getMessage());
            }
        }
        Reload shown = outcome;
        Optional<ModelView> model = built;
        Platform.runLater(() -> window.apply(shown, model));
    }

    ViewerWindow window() {
        return window;
    }

    /** Closes the window and stops watching (for tests and for callers that embed the viewer). */
    void close() {
        FxToolkit.call(() -> {
            window.stage().hide();
            return null;
        });
        if (watcher != null) {
            watcher.close();
        }
    }
}
