package org.shearstack.view;

import org.shearstack.geom.Mesh;

/**
 * Makes a part's section from its own exact model (for kit parts, the layered solid cut by the half-plane
 * y &ge; 0 and meshed again). Called at most once per part, when the section view is first shown.
 */
@FunctionalInterface
public interface SectionMaker {

    /** The kept half in the assembly frame, mm, closed; may be empty when nothing is kept. */
    Mesh keptHalf();
}
