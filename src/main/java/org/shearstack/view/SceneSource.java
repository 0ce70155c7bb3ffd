package org.shearstack.view;

import java.nio.file.Path;
import java.util.List;

/**
 * Makes a view scene from somewhere (a spec through the design pipeline, a kit folder, a 3MF file, the
 * built-in sample). {@link #load()} is called again whenever a watched file changes.
 */
public interface SceneSource {

    /** Reads and resolves afresh. */
    ViewScene load() throws SceneLoadException;

    /** Files whose change should trigger a reload (empty when nothing is watched). */
    List<Path> watchedFiles();

    /** Short description for titles and messages, for example the file name. */
    String describe();

    /** A source that always yields the same scene. */
    static SceneSource fixed(ViewScene scene) {
        return new SceneSource() {
            @Override
            public ViewScene load() {
                return scene;
            }

            @Override
            public List<Path> watchedFiles() {
                return List.of();
            }

            @Override
            public String describe() {
                return scene.title();
            }
        };
    }
}
