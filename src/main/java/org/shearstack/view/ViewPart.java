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
 * @param sectionMesh     the part's assembled-frame half kept by the section cut, closed, when the
 *                        producer built it from the layered solid; empty to let the viewer slice the mesh
 */
public record ViewPart(String name, Mesh mesh, Rgb colour, Placement placement, OffsetMm explodedOffset,
        Optional<Mesh> sectionMesh) {

    public ViewPart {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(mesh, "mesh");
        Objects.requireNonNull(colour, "colour");
        Objects.requireNonNull(placement, "placement");
        Objects.requireNonNull(explodedOffset, "explodedOffset");
        Objects.requireNonNull(sectionMesh, "sectionMesh");
        if (name.isBlank()) {
            throw new IllegalArgumentException("part name: expected a non-blank name, found '" + name + "'");
        }
    }

    /** A part without a prepared section. */
    public static ViewPart of(String name, Mesh mesh, Rgb colour, Placement placement, OffsetMm explodedOffset) {
        return new ViewPart(name, mesh, colour, placement, explodedOffset, Optional.empty());
    }

    /** The mesh in the assembly frame. */
    public Mesh placedMesh() {
        return placement.apply(mesh);
    }

    public ViewPart withExplodedOffset(OffsetMm offset) {
        return new ViewPart(name, mesh, colour, placement, offset, sectionMesh);
    }
}
