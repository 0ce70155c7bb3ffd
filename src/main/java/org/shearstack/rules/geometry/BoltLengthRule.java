package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.List;

import org.shearstack.profile.FastenerTable;
import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;

/**
 * GEO-BOLT-LENGTH: the housing screws pass the bracket flange (when there is a generator), the drive cover
 * and the housing ring and end in the free cover's anchor; the length is the longest standard ISO 4762
 * length that does not stand proud of the anchor.
 */
public final class BoltLengthRule extends GeoRule {

    private final FastenerTable table;

    public BoltLengthRule(FastenerTable table) {
        super("GEO-BOLT-LENGTH", List.of(COVER_THICKNESS, CHAMBER_DEPTH, BRACKET_PLATE, FASTENER_SIZE, FASTENER_ANCHOR,
                BOLT_ANCHOR_DEPTH, INSERT_LENGTH), List.of(BOLT_LENGTH));
        this.table = table;
    }

    @Override
    public void apply(RuleInputs in, RuleOutputs out) {
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
                max = grip + in.get(INSERT_LENGTH);
                how = "grip + insert length";
            }
        }
        double length = FastenerRule.standardLengthAtMost(table, max);
        out.put(BOLT_LENGTH, length, "longest standard length ≤ " + how
                        + "; grip = bracket flange + drive cover + housing ring", table.lengthsSource());
    }
}
