package org.shearstack.check.design;

import java.util.List;
import org.shearstack.check.Check;
import org.shearstack.check.DesignValues;
import org.shearstack.check.Finding;
import org.shearstack.check.fit.StackUpCheck;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.physics.containment.CircularPlate;

/**
 * STACK-AXIAL and STACK-RADIAL on a resolved design. Each printed thickness and diameter scatters by the
 * printer's compensation scatter; the pack length not made of discs and spacers (end spacers, lands) is what
 * remains of the chamber depth after the nominal end play. Rim runout is taken as twice the scatter, side play
 * as the disc-bore clearance on the hub plus one scatter (engineering judgement).
 */
public final class StackUps implements Check {

    @Override
    public String code() {
        return "STACK-AXIAL";
    }

    @Override
    public List<String> codes() {
        return List.of("STACK-AXIAL", "STACK-RADIAL");
    }

    @Override
    public List<Finding> run(ResolvedDesign design) {
        DesignValues v = new DesignValues(design);
        double depth = v.need("housing.chamber-depth");
        int discs = (int) Math.round(v.need("rotor.discs"));
        double t = v.need("disc.thickness");
        double s = v.need("spacer.thickness");
        double endPlay = v.need("housing.end-play");
        double scatter = v.need("printer.compensation-scatter");
        double chamber = v.need("housing.chamber-diameter");
        double rotor = v.need("rotor.diameter");
        double cover = v.optional("cover.thickness");
        double span = v.optional("housing.bolt-circle-diameter");
        double gauge = v.optional("supply.pressure") - v.optional("supply.ambient");
        double e = v.optional("filament.elastic-modulus");
        double nu = v.optional("filament.poisson-ratio");
        if (!v.complete()) {
            return List.of(v.notChecked(code(), "stack-ups"));
        }
        double other = Math.max(0, depth - discs * t - (discs - 1) * s - 2 * endPlay);
        double w = Double.isNaN(cover + span + gauge + e + nu) ? 0
                : CircularPlate.simplySupportedCentreDeflectionM(gauge, span / 2000, cover / 1000, e, nu) * 1000;
        Finding axial = StackUpCheck.axial(new StackUpCheck.Axial(depth, scatter, discs, t, scatter, discs - 1, s,
                scatter, other, other > 0 ? scatter : 0, w));
        double hub = v.optional("hub.hex-across-flats");
        double bore = v.optional("disc.bore-across-flats");
        double boreClearance = Double.isNaN(hub + bore) ? 0.2 : Math.max(0, bore - hub);
        Finding radial = StackUpCheck.radial(new StackUpCheck.Radial(chamber, 2 * scatter, rotor, 2 * scatter,
                2 * scatter, boreClearance / 2 + scatter));
        return List.of(axial, radial);
    }
}
