package org.shearstack.view;

/** The outcome of one (re)load of a scene source. */
public sealed interface Reload {

    /** The scene was made; {@code loadNanos} is how long loading took (for the status line, not for logic). */
    record Loaded(ViewScene scene, long loadNanos) implements Reload {
    }

    /** The scene could not be made; the previous scene stays on screen. */
    record Failed(String message) implements Reload {
    }

    /** Loads once, turning every failure into a {@link Failed} with a readable message. */
    static Reload from(SceneSource source) {
        long start = System.nanoTime();
        try {
            return new Loaded(source.load(), System.nanoTime() - start);
        } catch (SceneLoadException e) {
            return new Failed(e.getMessage());
        } catch (RuntimeException e) {
            return new Failed(source.describe() + ": " + e);
        }
    }
}
