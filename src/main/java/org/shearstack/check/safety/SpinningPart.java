package org.shearstack.check.safety;

import org.shearstack.physics.stress.SpinningAnnulus;

/**
 * A named spinning part for the burst check.
 *
 * @param name             part name as in the kit ("disc", "spacer", "hub")
 * @param shape            its burst geometry at the design size
 * @param scalesWithDiscs  true when a change of disc diameter scales this part too (the discs themselves)
 */
public record SpinningPart(String name, SpinningAnnulus shape, boolean scalesWithDiscs) {

    /** The part at a disc-diameter scale. */
    public SpinningAnnulus shapeAt(double diameterScale) {
        if (!scalesWithDiscs || diameterScale == 1) {
            return shape;
        }
        return new SpinningAnnulus(shape.outerRadiusM() * diameterScale, shape.innerRadiusM() * diameterScale,
                shape.concentration());
    }
}
