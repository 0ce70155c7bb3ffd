package org.shearstack.view;

import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import javafx.application.ConditionalFeature;
import javafx.application.Platform;

/**
 * Starts the JavaFX toolkit once per process (the toolkit itself is a process-wide singleton, which is why
 * this class keeps the one flag it needs) and runs work on its thread.
 *
 * <p>Before starting it asks Prism to use the GPU pipeline even on a software OpenGL (Mesa under Xvfb):
 * without that, JavaFX silently falls back to a renderer that draws no 3D. After starting it checks
 * {@link ConditionalFeature#SCENE3D} and fails loudly when 3D is missing.
 */
final class FxToolkit {

    private static final Object LOCK = new Object();
    private static boolean started;

    private FxToolkit() {
    }

    /** True when a display seems available (DISPLAY or WAYLAND_DISPLAY on Linux and other Unix systems). */
    static boolean displayAvailable() {
        String os = System.getProperty("os.name", "").toLowerCase(Locale.ROOT);
        if (os.contains("win") || os.contains("mac")) {
            return true;
        }
        return notBlank(System.getenv("DISPLAY")) || notBlank(System.getenv("WAYLAND_DISPLAY"));
    }

    static void ensureStarted() {
        synchronized (LOCK) {
            if (!started) {
                if (!displayAvailable()) {
                    throw new DisplayUnavailableException("no display: DISPLAY is not set. Run under a desktop, or "
                            + "headless with: xvfb-run -a shearstack view ...");
                }
                if (System.getProperty("prism.forceGPU") == null) {
                    System.setProperty("prism.forceGPU", "true");
                }
                CountDownLatch ready = new CountDownLatch(1);
                try {
                    Platform.startup(ready::countDown);
                } catch (IllegalStateException alreadyRunning) {
                    ready.countDown();
                } catch (UnsupportedOperationException | Error e) {
                    throw new DisplayUnavailableException("the graphics toolkit could not start: " + e);
                }
                await(ready);
                Platform.setImplicitExit(false);
                started = true;
            }
        }
        if (!Platform.isSupported(ConditionalFeature.SCENE3D)) {
            throw new DisplayUnavailableException("3D rendering is not available: JavaFX fell back to a pipeline "
                    + "without 3D. With a software OpenGL (Mesa, Xvfb) start Java with -Dprism.forceGPU=true "
                    + "and install libgl1-mesa-dri.");
        }
    }

    /** Runs a task on the JavaFX thread and waits for its result (at most a minute). */
    static <T> T call(Callable<T> task) {
        ensureStarted();
        if (Platform.isFxApplicationThread()) {
            try {
                return task.call();
            } catch (RuntimeException e) {
                throw e;
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
        }
        CompletableFuture<T> result = new CompletableFuture<>();
        Platform.runLater(() -> {
            try {
                result.complete(task.call());
            } catch (Throwable e) {
                result.completeExceptionally(e);
            }
        });
        try {
            return result.get(60, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while waiting for the graphics thread", e);
        } catch (TimeoutException e) {
            throw new IllegalStateException("the graphics thread did not answer within 60 s", e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            if (e.getCause() instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(e.getCause());
        }
    }

    /** Ends the toolkit (for the command line, after its window has closed). */
    static void shutdown() {
        synchronized (LOCK) {
            if (started) {
                Platform.exit();
            }
        }
    }

    private static void await(CountDownLatch latch) {
        try {
            if (!latch.await(30, TimeUnit.SECONDS)) {
                throw new DisplayUnavailableException("the graphics toolkit did not start within 30 s");
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while starting the graphics toolkit", e);
        }
    }

    private static boolean notBlank(String s) {
        return s != null && !s.isBlank();
    }
}
