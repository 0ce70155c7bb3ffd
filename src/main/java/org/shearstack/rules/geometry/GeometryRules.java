package org.shearstack.rules.geometry;

import java.util.List;

import org.shearstack.rules.Rule;

/** The geometric (GEO-) rules: from sized rotor, printer and hardware to every dimension the parts need. */
public final class GeometryRules {

    private GeometryRules() {
    }

    /**
     * The same rules; the hardware tables they use are built in ({@link BearingCatalog}, {@link FastenerCatalog},
     * {@link GlandCatalog}, {@link PortCatalog}) while the profile hardware tables are empty.
     */
    public static List<Rule> rules(org.shearstack.profile.Profiles profiles) {
        return rules();
    }

    public static List<Rule> rules() {
        return List.of(new DiscLimitsRule(), new AxialStackRule(), new ChamberRule(), new BearingRule(),
                new BearingSeatRule(), new HubKeyRule(), new ExhaustPortRule(), new SpacerRule(),
                new CoverExhaustRule(), new FastenerRule(), new InletPortRule(), new HousingLayoutRule(),
                new CoverRule(), new NozzleSlotRule(), new DriveTrainRule(), new BoltLengthRule());
    }
}
