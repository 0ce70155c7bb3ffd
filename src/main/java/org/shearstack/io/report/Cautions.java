package org.shearstack.io.report;

import java.util.List;
import java.util.Optional;
import org.shearstack.check.safety.SafetySummary;

/** The cautions every report carries, with this design's safe pressure where it is known. */
public final class Cautions {

    private Cautions() {
    }

    /** The cautions in the order the report shows them. */
    public static List<String> lines(Optional<SafetySummary> safety) {
        String pressure = safety.map(s -> "Set the regulator, and a relief valve, at or below "
                + new Headline.Figure("", "", s.maxSafeSupplyPressureBarG(), "", 2, true).text()
                + " bar(g), the maximum safe supply pressure of this build, never above it. Use a regulator that"
                + " cannot be bypassed.")
                .orElse("The maximum safe supply pressure of this build could not be computed: do not run it"
                        + " under pressure until it has been checked.");
        return List.of(
                "A spinning printed rotor can burst, and a pressurised printed housing can split. Either throws"
                        + " fragments at high speed.",
                "Wear eye protection. Everyone nearby wears it too.",
                "Run the turbine behind a guard or inside a containment box; never look along the plane of the discs"
                        + " while it runs.",
                pressure,
                "Keep hands, hair and loose clothing clear until the rotor has stopped. Shut the air off and let the"
                        + " rotor coast down before touching it.",
                "Check the printed parts for cracks and delamination before every run; print again when in doubt.",
                "Local codes and licensed practice for compressed air and rotating machinery prevail over this"
                        + " report.");
    }
}
