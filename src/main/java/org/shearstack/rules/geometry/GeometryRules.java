package org.shearstack.rules.geometry;

import java.util.List;

import org.shearstack.profile.Hardware;
import org.shearstack.profile.Profiles;
import org.shearstack.rules.Rule;

/**
 * The geometric (GEO-) rules: from sized rotor, printer and hardware to every dimension the parts need. The
 * hardware (bearings, screws, O-ring glands, ports) comes from the profile tables ({@link Profiles#hardware()}).
 */
public final class GeometryRules {

    private GeometryRules() {
    }

    public static List<Rule> rules(Profiles profiles) {
        Hardware h = profiles.hardware();
        return List.of(new DiscLimitsRule(), new AxialStackRule(), new ChamberRule(), new BearingRule(h.bearings()),
                new BearingSeatRule(), new HubKeyRule(), new ExhaustPortRule(), new SpacerRule(),
                new CoverExhaustRule(), new FastenerRule(h.fasteners()), new InletPortRule(h.ports()),
                new HousingLayoutRule(h.fasteners(), h.seals()), new CoverRule(), new NozzleSlotRule(),
                new DriveTrainRule(h.fasteners()), new BoltLengthRule(h.fasteners()));
    }
}
