package org.shearstack.view;

import java.util.Objects;
import java.util.Optional;
import org.shearstack.geom.Mesh;

/**
 * One part as the viewer sees it.
 *
 * @param name            unique name within the scene (findings refer to it)
 * @param mesh            the part's mesh in its own (print) frame, mm
 * @param colour          display colour
 * @param placement       where the part sits in the assembly
 * @param explodedOffset  displacement at full explosion (slider at 1)
 * @param section         makes the part's section from its exact model (the layered solid); empty to let
 *                        the viewer cut the mesh itself
 */
public record ViewPart(String name, Mesh mesh, Rgb colour, Placement placement, OffsetMm explodedOffset,
        Optional<SectionMaker> section) {

    public ViewPart {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(mesh, "mesh");
        Objects.requireNonNull(colour, "colour");
        Objects.requireNonNull(placement, "placement");
        Objects.requireNonNull(explodedOffset, "explodedOffset");
        Objects.requireNonNull(section, "section");
        if (name.isBlank()) {
            throw new IllegalArgumentException("part name: expected a non-blank name, found '" + name + "'");
        }
    }

    /** A part without a prepared section. */
    public static ViewPart of(String name, Mesh mesh, Rgb colour, Placement placement, OffsetMm explodedOffset) {
        return new ViewPart(name, mesh, colour, placement, explodedOffset, Optional.empty());
    }

    /** The same part with its section made by {@code maker}. */
    public ViewPart withSection(SectionMaker maker) {
        return new ViewPart(name, mesh, colour, placement, explodedOffset, Optional.of(maker));
    }

    /** True when this part is the finding part {@code findingPart} or one of its numbered copies ("disc #3"). */
    public boolean isCopyOf(String findingPart) {
        return !findingPart.isEmpty() && (name.equals(findingPart) || name.startsWith(findingPart + " #"));
    }

    /** The mesh in the assembly frame. */
    public Mesh placedMesh() {
        return placement.apply(mesh);
    }

    public ViewPart withExplodedOffset(OffsetMm offset) {
        return new ViewPart(name, mesh, colour, placement, offset, section);
    }
}
