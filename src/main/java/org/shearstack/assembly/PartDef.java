package org.shearstack.assembly;

import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.part.Dims;

/**
 * One distinct printed part: its file name, family (one colour per family in the assembly), whether it turns
 * with the rotor, the genus its features give it (for the mesh check), and its recipe.
 */
public record PartDef(String name, String family, boolean rotating, int expectedGenus, Recipe recipe) {

    /** A pure function of the design's dimensions and the geometry context. */
    @FunctionalInterface
    public interface Recipe {
        LayeredSolid build(Dims d, GeometryContext ctx);
    }
}
