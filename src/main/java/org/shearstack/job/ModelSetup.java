package org.shearstack.job;

import java.util.ArrayList;
import java.util.List;
import java.util.NoSuchElementException;
import java.util.Optional;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.io.report.Omission;
import org.shearstack.io.report.SupplyData;
import org.shearstack.physics.rotor.TurbineModel;
import org.shearstack.physics.supply.SupplyPath;
import org.shearstack.rules.sizing.DesignModels;

/**
 * The coupled turbine model of a resolved design, as the sizing rules define it ({@link DesignModels}), and the
 * supply it sees. A design without the values the model needs gets an omission saying which, never a guess.
 */
final class ModelSetup {

    /** The model and supply when the design has what they need, and what was missing. */
    record Setup(Optional<TurbineModel> model, Optional<SupplyData> supply, List<Omission> notes) {
    }

    private ModelSetup() {
    }

    static Setup of(ResolvedDesign design) {
        List<Omission> notes = new ArrayList<>();
        TurbineModel model;
        try {
            model = DesignModels.turbineModel(design);
        } catch (NoSuchElementException e) {
            notes.add(new Omission("performance", "the performance model could not be set up: " + e.getMessage()
                    + " (the sizing rules, or a pin in the spec, provide it)."));
            return new Setup(Optional.empty(), Optional.empty(), notes);
        }
        SupplyPath s = model.supply();
        SupplyData supply = new SupplyData(s.supplyPressurePa(), s.ambientPressurePa(),
                s.path().conductanceDm3PerSBar(), s.path().criticalRatio());
        return new Setup(Optional.of(model), Optional.of(supply), notes);
    }
}
