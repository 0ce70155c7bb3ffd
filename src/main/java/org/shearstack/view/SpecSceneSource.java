package org.shearstack.view;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.profile.Profiles;
import org.shearstack.rules.DesignResolver;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.Problem;
import org.shearstack.spec.SpecResult;

/**
 * A spec file, read and resolved afresh on every load, turned into a scene by a design-to-scene step
 * (the kit builder once it is wired in). Problems with the spec become a {@link SceneLoadException}
 * listing every located problem.
 */
public final class SpecSceneSource implements SceneSource {

    private final Path specFile;
    private final Profiles profiles;
    private final Function<ResolvedDesign, ViewScene> toScene;

    private SpecSceneSource(Path specFile, Profiles profiles, Function<ResolvedDesign, ViewScene> toScene) {
        this.specFile = Objects.requireNonNull(specFile, "specFile");
        this.profiles = Objects.requireNonNull(profiles, "profiles");
        this.toScene = Objects.requireNonNull(toScene, "toScene");
    }

    /**
     * @param toScene turns a resolved design into what the viewer shows (parts, findings, figures)
     */
    public static SpecSceneSource of(Path specFile, Profiles profiles, Function<ResolvedDesign, ViewScene> toScene) {
        return new SpecSceneSource(specFile, profiles, toScene);
    }

    @Override
    public ViewScene load() throws SceneLoadException {
        SpecResult read = org.shearstack.spec.SpecReader.read(specFile);
        if (!read.ok()) {
            throw new SceneLoadException(format(read.problems()));
        }
        try {
            ResolvedDesign design = DesignResolver.resolve(read.spec().orElseThrow(), profiles);
            return toScene.apply(design);
        } catch (BadInputException e) {
            throw new SceneLoadException(format(e.problems()), e);
        }
    }

    @Override
    public List<Path> watchedFiles() {
        return List.of(specFile);
    }

    @Override
    public String describe() {
        return String.valueOf(specFile.getFileName());
    }

    private static String format(List<Problem> problems) {
        return problems.stream().map(Problem::format).collect(Collectors.joining(System.lineSeparator()));
    }
}
