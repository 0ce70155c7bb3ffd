package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;

import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;
import org.shearstack.rules.geometry.FastenerCatalog.Fastener;

/**
 * GEO-BOLT-LENGTH: the housing screws pass the bracket flange (when there is a generator), the drive cover
 * and the housing ring and end in the free cover's anchor; the length is the longest standard ISO 4762
 * length that does not stand proud of the anchor.
 */
public final class BoltLengthRule extends GeoRule {

    public BoltLengthRule() {
        super("GEO-BOLT-LENGTH", List.of(COVER_THICKNESS, CHAMBER_DEPTH, BRACKET_PLATE, FASTENER_SIZE, FASTENER_ANCHOR,
                BOLT_ANCHOR_DEPTH), List.of(BOLT_LENGTH));
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
        Fastener f = FastenerRule.fastener(in);
        double cover = in.get(COVER_THICKNESS);
        double grip = in.get(BRACKET_PLATE) + cover + in.get(CHAMBER_DEPTH);
        double max;
        String how;
        switch (FastenerRule.anchor(in)) {
            case "nut" -> {
                max = grip + cover;
                how = "grip + free cover (flush with its outer face, through the nut)";
            }
            case "tapped" -> {
                max = grip + cover - 0.5;
                how = "grip + free cover − 0.5 mm";
            }
            default -> {
                max = grip + f.insertLengthMm();
                how = "grip + insert length";
            }
        }
        double length = FastenerCatalog.standardLengthAtMost(max).orElse(FastenerCatalog.STANDARD_LENGTHS_MM.get(0));
        out.put(BOLT_LENGTH, length, "longest standard length ≤ " + how
                        + "; grip = bracket flange + drive cover + housing ring",
                "ISO 4762 standard lengths (from memory)");
    }
}
