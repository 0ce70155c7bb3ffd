package org.shearstack.assembly;

import java.util.List;

import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Mesh;
import org.shearstack.geom.MeshReport;

/**
 * A distinct part of the kit in its print orientation, its mesh and mesh check, and where its copies sit.
 *
 * @param name       file-name stem ("rotor-disc")
 * @param family     colour family
 * @param printed    false for hardware shown in the assembly (bearings, metal shaft)
 * @param rotating   turns with the rotor
 * @param expectedGenus genus its features give it
 * @param solid      layered solid, print orientation
 * @param mesh       the solid's mesh
 * @param report     the shared mesh check of {@code mesh}
 * @param placements one per copy, print orientation → assembly frame
 */
public record KitPart(String name, String family, boolean printed, boolean rotating, int expectedGenus,
        LayeredSolid solid, Mesh mesh, MeshReport report, List<Placement> placements) {

    public KitPart {
        placements = List.copyOf(placements);
    }

    public int count() {
        return placements.size();
    }
}
