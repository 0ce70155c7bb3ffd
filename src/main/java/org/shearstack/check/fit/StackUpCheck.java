package org.shearstack.check.fit;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.physics.fit.StackUp;

/**
 * STACK-AXIAL and STACK-RADIAL. Axial: chamber depth minus the pack (discs and spacers, each with its
 * thickness tolerance) gives the end play, worst case and RSS; cover deflection under pressure is reported
 * beside it. Radial: housing bore minus disc rim, less runout and sideways play. RSS at or below zero is a
 * FAIL; only the worst case at or below zero is a CAUTION.
 */
public final class StackUpCheck {

    private StackUpCheck() {
    }

    /**
     * @param chamberDepthMm     axial depth between the covers' inner faces
     * @param chamberDepthTolMm  ± on the depth
     * @param discs              number of discs
     * @param discThicknessMm    disc thickness
     * @param discTolMm          ± per disc
     * @param spacers            number of spacers in the pack
     * @param spacerThicknessMm  spacer thickness
     * @param spacerTolMm        ± per spacer
     * @param otherPackMm        other axial length in the pack (hub flanges, end washers)
     * @param otherPackTolMm     ± on it
     * @param coverDeflectionMm  cover centre deflection under the supply pressure (informative)
     */
    public record Axial(double chamberDepthMm, double chamberDepthTolMm, int discs, double discThicknessMm,
            double discTolMm, int spacers, double spacerThicknessMm, double spacerTolMm, double otherPackMm,
            double otherPackTolMm, double coverDeflectionMm) {
    }

    /**
     * @param chamberDiameterMm housing bore
     * @param chamberTolMm      ± on the bore diameter
     * @param discDiameterMm    disc outer diameter
     * @param discTolMm         ± on the disc diameter
     * @param runoutMm          total indicated runout of the rim (radial)
     * @param sidePlayMm        radial play of the pack: half the bore clearance plus bearing and seat play
     */
    public record Radial(double chamberDiameterMm, double chamberTolMm, double discDiameterMm, double discTolMm,
            double runoutMm, double sidePlayMm) {
    }

    public static StackUp axialStack(Axial a) {
        List<StackUp.Link> links = new ArrayList<>();
        links.add(StackUp.Link.opens("chamber depth", a.chamberDepthMm(), a.chamberDepthTolMm()));
        links.add(StackUp.Link.closes("disc thickness", a.discs(), a.discThicknessMm(), a.discTolMm()));
        if (a.spacers() > 0) {
            links.add(StackUp.Link.closes("spacer thickness", a.spacers(), a.spacerThicknessMm(), a.spacerTolMm()));
        }
        if (a.otherPackMm() > 0) {
            links.add(StackUp.Link.closes("other pack length", 1, a.otherPackMm(), a.otherPackTolMm()));
        }
        return StackUp.of(links);
    }

    public static Finding axial(Axial a) {
        StackUp.Result r = axialStack(a).evaluate();
        Severity sev = r.rssMinMm() <= 0 ? Severity.FAIL : (r.worstMinMm() <= 0 ? Severity.CAUTION : Severity.OK);
        return Findings.of("STACK-AXIAL", sev,
                "Axial end play of the pack: nominal " + Findings.num(r.meanMm(), 3) + " mm, worst case "
                        + Findings.num(r.worstMinMm(), 3) + "…" + Findings.num(r.worstMaxMm(), 3) + " mm, RSS "
                        + Findings.num(r.rssMinMm(), 3) + "…" + Findings.num(r.rssMaxMm(), 3) + " mm (" + a.discs()
                        + " discs, " + a.spacers() + " spacers); under full pressure the covers bulge out by up to "
                        + Findings.num(a.coverDeflectionMm(), 3) + " mm each.",
                r.worstMinMm(), 0, "mm", Double.NaN, "rotor", "end play",
                sev == Severity.OK ? "" : "deepen the chamber by " + Findings.num(-r.worstMinMm() + 0.2, 3)
                        + " mm, thin the spacers, or sand the pack");
    }

    public static Finding radial(Radial r) {
        StackUp s = StackUp.of(List.of(
                StackUp.Link.opens("housing bore radius", r.chamberDiameterMm() / 2, r.chamberTolMm() / 2),
                StackUp.Link.closes("disc rim radius", 1, r.discDiameterMm() / 2, r.discTolMm() / 2),
                new StackUp.Link("rim runout", -1, 1, 0, 0, r.runoutMm()),
                new StackUp.Link("side play", -1, 1, 0, 0, r.sidePlayMm())));
        StackUp.Result res = s.evaluate();
        Severity sev = res.rssMinMm() <= 0 ? Severity.FAIL : (res.worstMinMm() <= 0 ? Severity.CAUTION : Severity.OK);
        return Findings.of("STACK-RADIAL", sev,
                "Radial clearance of the disc rims to the housing: nominal "
                        + Findings.num((r.chamberDiameterMm() - r.discDiameterMm()) / 2, 3) + " mm, worst case "
                        + Findings.num(res.worstMinMm(), 3) + "…" + Findings.num(res.worstMaxMm(), 3) + " mm, RSS "
                        + Findings.num(res.rssMinMm(), 3) + "…" + Findings.num(res.rssMaxMm(), 3)
                        + " mm after runout and side play.",
                res.worstMinMm(), 0, "mm", Double.NaN, "housing-ring", "rim clearance",
                sev == Severity.OK ? "" : "enlarge the chamber bore by " + Findings.num(-2 * res.worstMinMm() + 0.4, 3)
                        + " mm or tighten the disc bores on the hub");
    }
}
