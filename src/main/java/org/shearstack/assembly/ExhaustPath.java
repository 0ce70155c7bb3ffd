package org.shearstack.assembly;

import java.util.List;
import java.util.Locale;

import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.Region;
import org.shearstack.geom.Slab;
import org.shearstack.part.Dims;
import org.shearstack.part.EndCover;
import org.shearstack.part.Shapes;

/**
 * The exhaust path in the assembly: the air leaves the discs through their ports near the hub, runs along the
 * axis through the ports of every disc and spacer (all ports line up on the keyed hub) and out through the
 * covers' openings. The check asks that no turning part closes the ports' column anywhere between the covers
 * (in the rotor's own frame), and measures the outlet: the covers' openings over the band the turning ports
 * sweep, or, where the bearing seat pushes the openings outside that band, the radial passage the end play
 * leaves between the outer disc and the cover (2π r × end play at the ports' outer edge).
 */
final class ExhaustPath {

    /** Open areas below this are no path (mm²). */
    static final double MIN_OPEN_MM2 = 0.01;

    private ExhaustPath() {
    }

    /** ASM-EXHAUST-PATH: OK with the open area, or FAIL when the passage is missing or blocked. */
    static Finding check(List<Body> bodies, Dims d, GeometryContext ctx) {
        Region passage = Shapes.ports(ctx, d.portCount(), d.portCircleDiameter(), d.portDiameter());
        Region swept = Region.annulus(ctx, 0, 0, d.portCircleDiameter() + d.portDiameter(),
                Math.max(2 * ctx.gridMm() * 64, d.portCircleDiameter() - d.portDiameter()));
        double overlap = swept.intersect(EndCover.exhaust(d, ctx)).areaMm2();
        double portOuter = (d.portCircleDiameter() + d.portDiameter()) / 2;
        boolean radialGap = overlap <= MIN_OPEN_MM2 && d.coverExhaustInner() / 2 >= portOuter - 1e-9;
        double open = radialGap ? 2 * Math.PI * portOuter * d.endPlay() : overlap;
        double tolerance = Math.max(MIN_OPEN_MM2, 0.01 * passage.areaMm2());
        String blocked = null;
        double worst = 0;
        for (Body b : bodies) {
            if (!b.rotating()) {
                continue;
            }
            for (Slab s : b.solid().slabs()) {
                if (s.z1Mm() <= 0 || s.z0Mm() >= d.chamberDepth()) {
                    continue; // outside the chamber: beyond the covers
                }
                double shut = s.region().intersect(passage).areaMm2();
                if (shut > worst) {
                    worst = shut;
                    blocked = b.name();
                }
            }
        }
        double left = worst < tolerance ? open : open - worst;
        boolean ok = open > MIN_OPEN_MM2 && worst < tolerance;
        String what = String.format(Locale.ROOT, "exhaust: %s %.1f mm²%s", radialGap ? "through the end-play gap to the cover openings,"
                : "cover openings over the band the disc ports sweep,", open, blocked == null || worst < tolerance ? ""
                        : String.format(Locale.ROOT, ", %s closes %.1f mm² of it", blocked, worst));
        return Findings.of("ASM-EXHAUST-PATH", ok ? Severity.OK : Severity.FAIL, what, left, MIN_OPEN_MM2, "mm2",
                left / MIN_OPEN_MM2, "assembly", "exhaust path",
                ok ? "" : "line the disc ports up with the cover openings, or open the part that closes them");
    }
}
