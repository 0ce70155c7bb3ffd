package org.shearstack.check.design;

import java.util.List;
import org.shearstack.check.Check;
import org.shearstack.check.DesignValues;
import org.shearstack.check.Finding;
import org.shearstack.check.safety.ContainmentCheck;
import org.shearstack.check.safety.ContainmentInputs;
import org.shearstack.design.ResolvedDesign;

/**
 * HOUSING-HOOP, COVER-PLATE, COVER-DEFLECTION, BOLT-LOAD on a resolved design at the full supply pressure.
 * The seal's effective diameter is the groove's outer edge (pressure reaches the O-ring's outside); the cover
 * spans the bolt circle; the anchor is taken as the anchor hole over its depth; the hoop section is the ring
 * less the plenum channel and the anchor hole ({@link #hoopWall}).
 */
public final class Containment implements Check {

    @Override
    public String code() {
        return "HOUSING-HOOP";
    }

    @Override
    public List<String> codes() {
        return List.of("HOUSING-HOOP", "COVER-PLATE", "COVER-DEFLECTION", "BOLT-LOAD");
    }

    static ContainmentInputs read(DesignValues v) {
        double chamber = v.need("housing.chamber-diameter");
        double grooveInner = v.optional("seal.groove-inner-diameter");
        double grooveWidth = v.optional("seal.groove-width");
        double boltCircle = v.need("housing.bolt-circle-diameter");
        // no groove (a gasket or no seal: groove keys absent or 0): the pressure reaches the bolt circle
        double seal = !(grooveInner > 0) || Double.isNaN(grooveWidth) ? boltCircle : grooveInner + 2 * grooveWidth;
        String size = v.needText("fasteners.size");
        double endPlay = v.optional("housing.end-play");
        double factor = v.optional("targets.safety-factor");
        return new ContainmentInputs(v.need("supply.pressure"), v.need("supply.ambient"), chamber,
                hoopWall(v, chamber), v.need("cover.thickness"), boltCircle, seal,
                (int) Math.round(v.need("housing.bolt-count")), Screws.diameterMm(size), Screws.pitchMm(size),
                v.need("bolt.anchor-hole-diameter"), v.need("bolt.anchor-depth"), 0,
                v.need("filament.elastic-modulus"), v.need("filament.poisson-ratio"),
                v.need("filament.tensile-strength-xy"), v.optional("filament.tensile-strength-z"), endPlay,
                Double.isNaN(factor) ? 3 : factor);
    }

    /**
     * The radial section that carries the hoop load: from the outside diameter, the ring's material less the
     * plenum channel and the anchor hole, which cut through it (at supply pressure the plenum's inner wall is
     * loaded on both sides and carries nothing); {@code housing.wall} when the outside diameter is unknown.
     */
    static double hoopWall(DesignValues v, double chamber) {
        double od = v.optional("housing.outside-diameter");
        if (Double.isNaN(od)) {
            return v.need("housing.wall");
        }
        double plenum = v.optional("housing.plenum-diameter");
        double anchor = Math.max(zeroIfNaN(v.optional("bolt.anchor-hole-diameter")),
                zeroIfNaN(v.optional("bolt.clearance-diameter")));
        double wall = (od - chamber) / 2 - zeroIfNaN(plenum) - anchor;
        return wall > 0 ? wall : v.need("housing.wall");
    }

    private static double zeroIfNaN(double x) {
        return Double.isNaN(x) ? 0 : x;
    }

    @Override
    public List<Finding> run(ResolvedDesign design) {
        DesignValues v = new DesignValues(design);
        ContainmentInputs in = read(v);
        if (!v.complete() || Double.isNaN(in.screwPitchMm())) {
            return List.of(v.notChecked(code(), "pressure containment"));
        }
        return ContainmentCheck.run(in);
    }
}
