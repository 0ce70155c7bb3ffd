package org.shearstack.view;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.shearstack.geom.Mesh;
import org.shearstack.io.mesh.MeshFormatException;
import org.shearstack.io.mesh.StlReader;
import org.shearstack.io.mesh.ThreeMfModel;
import org.shearstack.io.mesh.ThreeMfReader;

/**
 * A 3MF or STL file, or a kit folder (its {@code assembly.3mf} and {@code assembly-exploded.3mf}), read
 * afresh on each load with the readers' size limits.
 */
public final class MeshFileSource implements SceneSource {

    static final String ASSEMBLY = "assembly.3mf";
    static final String ASSEMBLY_EXPLODED = "assembly-exploded.3mf";

    private final Path path;

    private MeshFileSource(Path path) {
        this.path = path;
    }

    /** A .3mf or .stl file, or a kit folder. */
    public static MeshFileSource of(Path path) {
        return new MeshFileSource(path);
    }

    @Override
    public ViewScene load() throws SceneLoadException {
        try {
            if (Files.isDirectory(path)) {
                return kitFolder();
            }
            String name = String.valueOf(path.getFileName());
            if (name.toLowerCase(Locale.ROOT).endsWith(".stl")) {
                Mesh mesh = StlReader.read(path);
                ViewPart part = ViewPart.of(name.replaceFirst("(?i)\\.stl$", ""), mesh, Palette.colour(0),
                        Placement.IDENTITY, OffsetMm.ZERO);
                return new ViewScene(name, List.of(part), List.of(), List.of(),
                        List.of("from an STL file: section cut from the mesh"));
            }
            return ThreeMfScenes.fromFile(name, ThreeMfReader.read(path));
        } catch (MeshFormatException | IllegalArgumentException e) {
            throw new SceneLoadException(e.getMessage(), e);
        } catch (IOException e) {
            throw new SceneLoadException(path + ": cannot read: " + e.getMessage(), e);
        }
    }

    private ViewScene kitFolder() throws IOException, MeshFormatException, SceneLoadException {
        Path assembled = path.resolve(ASSEMBLY);
        if (!Files.isRegularFile(assembled)) {
            throw new SceneLoadException(path + ": expected a kit folder holding " + ASSEMBLY + ", found no such file");
        }
        ThreeMfModel at = ThreeMfReader.read(assembled);
        Path explodedFile = path.resolve(ASSEMBLY_EXPLODED);
        String title = at.metadata().getOrDefault("Title", String.valueOf(path.getFileName()));
        if (!Files.isRegularFile(explodedFile)) {
            return ThreeMfScenes.fromFile(title, at);
        }
        return ThreeMfScenes.fromKitFiles(title, at, ThreeMfReader.read(explodedFile));
    }

    @Override
    public List<Path> watchedFiles() {
        return Files.isDirectory(path) ? List.of(path.resolve(ASSEMBLY), path.resolve(ASSEMBLY_EXPLODED)) : List.of(path);
    }

    @Override
    public String describe() {
        return String.valueOf(path.getFileName());
    }
}
