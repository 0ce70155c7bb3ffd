package org.shearstack.job;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.io.report.Omission;
import org.shearstack.io.report.SupplyData;
import org.shearstack.physics.gas.Nozzle;
import org.shearstack.physics.gas.NozzleKind;
import org.shearstack.physics.rotor.Calibration;
import org.shearstack.physics.rotor.LossModel;
import org.shearstack.physics.rotor.TurbineGeometry;
import org.shearstack.physics.rotor.TurbineModel;
import org.shearstack.physics.supply.FlowCharacteristic;
import org.shearstack.physics.supply.SupplyPath;

/**
 * Builds the coupled turbine model from a resolved design's keys (the sizing and geometry rules write them; a
 * spec may pin them). Missing keys are reported as omissions, never guessed; the few coefficients the design
 * does not carry yet are stated as assumptions in the report.
 */
final class ModelSetup {

    /** The nozzle velocity coefficient used when the design has none (the flow model's demo value). */
    static final double DEFAULT_VELOCITY_COEFFICIENT = 0.95;
    /** Radial load per bearing when the design has none: 2 N, the flow model's default for small rotors. */
    static final double DEFAULT_BEARING_LOAD_N = 2.0;

    /** The model (when the design has what it needs), the supply, and what was missing or assumed. */
    record Setup(Optional<TurbineModel> model, Optional<SupplyData> supply, List<Omission> notes) {
    }

    private ModelSetup() {
    }

    static Setup of(ResolvedDesign design) {
        List<Omission> notes = new ArrayList<>();
        Values v = new Values(design);
        double p0 = v.need("supply.pressure");
        double t0 = v.need("supply.temperature");
        double pa = v.need("supply.ambient");
        double c = v.need("supply.conductance");
        double b = v.need("supply.critical-ratio");
        Optional<SupplyData> supply = v.complete()
                ? Optional.of(new SupplyData(p0, pa, new FlowCharacteristic(c, b, 0.5).conductanceDm3PerSBar(), b))
                : Optional.empty();
        double d = v.need("rotor.diameter");
        double exhaust = v.optional("rotor.exhaust-diameter");
        if (Double.isNaN(exhaust)) {
            exhaust = v.optional("disc.port-circle-diameter") + v.optional("disc.port-diameter");
        }
        if (Double.isNaN(exhaust)) {
            v.need("rotor.exhaust-diameter");
        }
        double gap = v.need("rotor.gap");
        double thickness = v.need("rotor.disc-thickness");
        double discs = v.need("rotor.discs");
        double endPlay = v.need("housing.end-play");
        double radial = v.need("housing.radial-clearance");
        double exhaustArea = v.need("disc.exhaust-area");
        double jet = v.need("nozzle.jet-angle");
        double throat = v.need("nozzle.throat-area");
        double cd = v.need("nozzle.discharge-coefficient");
        String kind = v.text("nozzle.kind");
        double bore = v.need("bearing.bore");
        double od = v.need("bearing.outside-diameter");
        if (!v.complete()) {
            notes.add(new Omission("performance", "the design has no value for " + String.join(", ", v.missing())
                    + " (the sizing rules, or a pin in the spec, provide them)."));
            return new Setup(Optional.empty(), supply, notes);
        }
        double cv = v.optional("nozzle.velocity-coefficient");
        if (Double.isNaN(cv)) {
            cv = DEFAULT_VELOCITY_COEFFICIENT;
            notes.add(new Omission("performance", "assumed a nozzle velocity coefficient of 0.95: the design has no"
                    + " nozzle.velocity-coefficient."));
        }
        notes.add(new Omission("performance", "assumed 2 N radial load per bearing and grease of 40 cSt for the"
                + " bearing drag: the design does not carry them yet."));
        double throatM2 = throat * 1e-6;
        double exitArea = v.optional("nozzle.exit-area");
        Nozzle nozzle = kind.equals("converging-diverging") && exitArea > throat
                ? new Nozzle(NozzleKind.CONVERGING_DIVERGING, throatM2, exitArea * 1e-6, cd, cv)
                : Nozzle.converging(throatM2, cd, cv);
        SupplyPath path = new SupplyPath(p0, t0, pa, new FlowCharacteristic(c, b, 0.5));
        TurbineGeometry g = new TurbineGeometry(d / 2000, exhaust / 2000, gap / 1000, thickness / 1000,
                (int) Math.round(discs), endPlay / 1000, radial / 1000, exhaustArea * 1e-6, jet);
        LossModel losses = new LossModel(2, bore / 1000, (bore + od) / 2000, DEFAULT_BEARING_LOAD_N, 0, 40.0, 1.5);
        return new Setup(Optional.of(TurbineModel.of(path, nozzle, g, losses, Calibration.nominal())), supply, notes);
    }
}
