package org.shearstack.part;

import org.shearstack.rules.geometry.TestDesigns;

/** Probe (not a test): the radii along the exhaust path of the demo. */
public final class PathProbe {
    public static void main(String[] a) {
        Dims d = Dims.of(TestDesigns.demo());
        System.out.println("hexCorner " + d.hexCornerRadius() + " portCircle/2 " + d.portCircleDiameter() / 2 + " portDia "
                + d.portDiameter() + " portInnerR " + d.portInnerRadius() + " spacerOut/2 " + d.spacerOutside() / 2
                + " endSpacerOut/2 " + EndSpacer.outside(d) / 2 + " land/2 " + d.endSpacerLand() / 2
                + " coverExh " + d.coverExhaustInner() / 2 + ".." + d.coverExhaustOuter() / 2 + " seat/2 " + d.seatDiameter() / 2
                + " shaftBore " + d.shaftBore() + " journal " + d.journal() + " endPlay " + d.endPlay()
                + " endSpacerT " + d.endSpacerThickness() + " landH " + d.endSpacerLandHeight());
    }
}
