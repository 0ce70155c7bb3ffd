package org.shearstack.view;

import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.shearstack.check.Finding;

/**
 * Everything the viewer shows, independent of how it was made (a kit, a 3MF file, a spec).
 *
 * @param title      shown in the window title and above the model
 * @param parts      the parts, in list order
 * @param findings   findings; those naming a part can be highlighted on it
 * @param headlines  headline figures
 * @param notes      short remarks about the source (for example "section: sliced from file meshes")
 */
public record ViewScene(String title, List<ViewPart> parts, List<Finding> findings,
        List<HeadlineFigure> headlines, List<String> notes) {

    public ViewScene {
        Objects.requireNonNull(title, "title");
        parts = List.copyOf(parts);
        findings = List.copyOf(findings);
        headlines = List.copyOf(headlines);
        notes = List.copyOf(notes);
        Set<String> names = new HashSet<>();
        for (ViewPart p : parts) {
            if (!names.add(p.name())) {
                throw new IllegalArgumentException("scene '" + title + "': part names must be unique, found '"
                        + p.name() + "' twice");
            }
        }
    }

    /** A scene of parts only. */
    public static ViewScene ofParts(String title, List<ViewPart> parts) {
        return new ViewScene(title, parts, List.of(), List.of(), List.of());
    }

    public Optional<ViewPart> part(String name) {
        return parts.stream().filter(p -> p.name().equals(name)).findFirst();
    }
}
