package org.shearstack.check.flow;

import java.util.List;
import org.shearstack.check.Check;
import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.rules.SpecKeys;
import org.shearstack.rules.sizing.SizingKeys;

/**
 * SIZE-GAP-BOUND: a CAUTION when the sizing's best gap is the upper end of its search range, so the bound (the
 * printer's preferred gap or four Ekman thicknesses) and not the flow model chose it. Nothing when the gap was
 * pinned or found inside the range.
 */
public final class GapSearchBound implements Check {

    public static final String CODE = "SIZE-GAP-BOUND";

    @Override
    public String code() {
        return CODE;
    }

    @Override
    public List<String> codes() {
        return List.of(CODE);
    }

    @Override
    public List<Finding> run(ResolvedDesign design) {
        if (!design.has(SizingKeys.GAP_AT_SEARCH_BOUND) || design.get(SizingKeys.GAP_AT_SEARCH_BOUND) < 0.5
                || !design.has(SpecKeys.ROTOR_GAP)) {
            return List.of();
        }
        double gap = design.get(SpecKeys.ROTOR_GAP);
        return List.of(Findings.of(CODE, Severity.CAUTION, "The sized gap " + Findings.num(gap, 3) + " mm is at the"
                + " upper end of the optimiser's search range: the model's score still rises with wider gaps because"
                + " more of the jet faces gaps instead of disc rims (admission fraction), so the bound, not the model,"
                + " set the gap. Wider gaps than a few boundary-layer thicknesses couple the flow poorly to the discs,"
                + " and the model is least certain there.", gap, gap, "mm", 1.0, "rotor-disc", "gap",
                "keep the sized gap, or pin rotor.gap from your own trials (about 0.75 mm gaps with 0.75 mm discs on a"
                        + " 0.4 mm nozzle are common practice) and compare with a bench run"));
    }
}
