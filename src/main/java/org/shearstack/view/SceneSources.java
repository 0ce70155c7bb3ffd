package org.shearstack.view;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.function.Function;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.profile.Profiles;

/**
 * Chooses how to read what the user named: a spec (.yaml, .yml), a kit folder, a 3MF or STL file.
 */
public final class SceneSources {

    private SceneSources() {
    }

    /**
     * A source for a path.
     *
     * @throws SceneLoadException naming the path when it does not exist or is of a kind the viewer cannot read
     */
    public static SceneSource forPath(Path path, Profiles profiles) throws SceneLoadException {
        return forPath(path, profiles, DesignScenes::fromDesign);
    }

    /**
     * A source for a path, with the step that turns a resolved spec into a scene (the command line passes
     * the full design job: performance, safety checks and kit).
     */
    public static SceneSource forPath(Path path, Profiles profiles, Function<ResolvedDesign, ViewScene> designToScene)
            throws SceneLoadException {
        if (!Files.exists(path)) {
            throw new SceneLoadException(path + ": expected a spec (.yaml), a kit folder or a .3mf file, found nothing "
                    + "at that path");
        }
        String name = String.valueOf(path.getFileName()).toLowerCase(Locale.ROOT);
        if (Files.isDirectory(path) || name.endsWith(".3mf") || name.endsWith(".stl")) {
            return MeshFileSource.of(path);
        }
        if (name.endsWith(".yaml") || name.endsWith(".yml")) {
            return SpecSceneSource.of(path, profiles, designToScene);
        }
        throw new SceneLoadException(path + ": expected a spec (.yaml or .yml), a kit folder, a .3mf or .stl file, "
                + "found '" + path.getFileName() + "'");
    }

    /** The built-in sample assembly. */
    public static SceneSource sample() {
        return SceneSource.fixed(SampleAssembly.scene());
    }
}
