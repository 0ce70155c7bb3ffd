package org.shearstack.check.design;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.check.DesignValues;
import org.shearstack.check.safety.SpinningPart;
import org.shearstack.physics.dynamics.RotorMass;
import org.shearstack.physics.stress.SpinningAnnulus;

/**
 * The rotor as the safety checks see it, read from a design (lengths mm in the design, SI here).
 * The hexagonal disc bore is taken as a round hole of its circumradius (across flats / √3); the exhaust
 * ports make the disc a holed disc out to the port ring's outer edge, with the port allowance
 * ({@link SpinningAnnulus#EXHAUST_PORT_ALLOWANCE}).
 */
record RotorReading(double outerRadiusM, double boreRadiusM, double portOuterRadiusM, double discThicknessM,
        int discs, double spacerOuterRadiusM, double spacerThicknessM, double densityKgPerM3) {

    static RotorReading read(DesignValues v) {
        double outer = v.need("rotor.diameter") / 2000;
        double af = v.optional("disc.bore-across-flats");
        double bore = Double.isNaN(af) ? v.optional("shaft.journal-diameter") / 2000 : af / Math.sqrt(3) / 1000;
        double portCircle = v.optional("disc.port-circle-diameter");
        double portDia = v.optional("disc.port-diameter");
        double portOuter = Double.isNaN(portCircle) || Double.isNaN(portDia)
                ? v.optional("rotor.exhaust-diameter") / 2000 : (portCircle + portDia) / 2000;
        double t = v.optional("disc.thickness");
        if (Double.isNaN(t)) {
            t = v.optional("rotor.disc-thickness");
        }
        double discs = v.optional("rotor.discs");
        double spacerOd = v.optional("spacer.outside-diameter");
        double spacerT = v.optional("spacer.thickness");
        double rho = v.need("filament.density");
        return new RotorReading(outer, Double.isNaN(bore) ? 0 : bore, portOuter, t / 1000,
                Double.isNaN(discs) ? 0 : (int) Math.round(discs), spacerOd / 2000, spacerT / 1000, rho);
    }

    List<SpinningPart> spinningParts() {
        List<SpinningPart> parts = new ArrayList<>();
        if (!Double.isNaN(portOuterRadiusM) && portOuterRadiusM > boreRadiusM && portOuterRadiusM < outerRadiusM) {
            parts.add(new SpinningPart("rotor-disc", SpinningAnnulus.withExhaustPorts(outerRadiusM, portOuterRadiusM), true));
        } else {
            parts.add(new SpinningPart("rotor-disc", boreRadiusM > 0 ? SpinningAnnulus.plainBore(outerRadiusM, boreRadiusM)
                    : new SpinningAnnulus(outerRadiusM, 0, 1), true));
        }
        if (!Double.isNaN(spacerOuterRadiusM) && spacerOuterRadiusM > boreRadiusM && boreRadiusM > 0) {
            parts.add(new SpinningPart("spacer", SpinningAnnulus.plainBore(spacerOuterRadiusM, boreRadiusM), false));
        }
        return parts;
    }

    /** Mass of discs (ports ignored: conservative for critical speed) and spacers, kg. */
    double packMassKg() {
        if (discs < 1 || Double.isNaN(discThicknessM) || !(outerRadiusM > boreRadiusM)) {
            return Double.NaN;
        }
        double m = discs * RotorMass.annulusMassKg(densityKgPerM3, discThicknessM, outerRadiusM, boreRadiusM);
        if (!Double.isNaN(spacerOuterRadiusM) && !Double.isNaN(spacerThicknessM) && spacerOuterRadiusM > boreRadiusM) {
            m += (discs - 1) * RotorMass.annulusMassKg(densityKgPerM3, spacerThicknessM, spacerOuterRadiusM,
                    boreRadiusM);
        }
        return m;
    }
}
