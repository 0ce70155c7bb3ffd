package org.shearstack.check.design;

import java.util.List;
import java.util.Locale;
import org.shearstack.check.Check;
import org.shearstack.check.DesignValues;
import org.shearstack.check.Finding;
import org.shearstack.check.safety.BearingCheck;
import org.shearstack.check.safety.RunawayModel;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.physics.bearing.BearingSpeed;

/**
 * BEARING-DN and SEAT-TEMP on a resolved design. A designation ending in RS (2RS, -2RS1, LLU) counts as
 * contact-sealed, anything else as shielded.
 */
public final class Bearings implements Check {

    private final RunawaySource source;

    public Bearings(RunawaySource source) {
        this.source = source;
    }

    @Override
    public String code() {
        return "BEARING-DN";
    }

    @Override
    public List<String> codes() {
        return List.of("BEARING-DN", "SEAT-TEMP");
    }

    static BearingSpeed.Closure closure(String designation) {
        String d = designation.toUpperCase(Locale.ROOT);
        return d.contains("RS") || d.contains("LLU") ? BearingSpeed.Closure.CONTACT_SEALED : BearingSpeed.Closure.SHIELDED;
    }

    @Override
    public List<Finding> run(ResolvedDesign design) {
        DesignValues v = new DesignValues(design);
        String name = v.needText("bearing.designation");
        double d = v.need("bearing.bore");
        double od = v.need("bearing.outside-diameter");
        double tg = v.need("filament.softening-temperature");
        double supply = v.need("supply.pressure");
        RunawayModel model = source.forDesign(v);
        if (!v.complete() || model == null) {
            return List.of(v.notChecked(code(), "bearings"));
        }
        double runaway = model.runawayRadPerS(RunawayModel.Variant.atPressure(supply));
        return BearingCheck.run(new BearingCheck.Inputs(name, d, od, closure(name), v.optional("targets.speed"),
                runaway, tg - 273.15));
    }
}
