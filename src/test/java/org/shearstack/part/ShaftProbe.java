package org.shearstack.part;

import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.MeshCheck;
import org.shearstack.rules.geometry.TestDesigns;

/** Probe (not a test): meshes the hub shaft of random designs at several chord tolerances. */
public final class ShaftProbe {
    public static void main(String[] a) {
        for (long seed : new long[] {7, 1, 2, 3}) {
            Dims d = Dims.of(TestDesigns.random(seed));
            for (double chord : new double[] {0.05, 0.1, 0.2, 0.4}) {
                GeometryContext ctx = GeometryContext.withChordTolerance(chord);
                var s = HubShaft.solid(d, ctx);
                System.out.println(seed + " " + chord + " metal=" + d.metalShaft() + " af=" + d.hexAcrossFlats() + " j="
                        + d.journal() + " " + MeshCheck.validate(s.toMesh(ctx)).summary());
            }
        }
    }
}
