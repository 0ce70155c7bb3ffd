package org.shearstack.profile;

import static org.shearstack.spec.Dimension.*;

import java.util.List;
import java.util.Set;
import org.shearstack.spec.Problem;
import org.shearstack.spec.Range;

/**
 * A printer as the rules need it. Lengths in mm, angles in degrees, flow in mm³/s.
 *
 * @param holeCompensationMm     how much smaller a vertical hole prints than modelled, on diameter
 * @param outerCompensationMm    how much larger an outer dimension prints than modelled, on diameter/width
 * @param compensationScatterMm  the spread (one standard deviation) of those compensations between prints
 * @param minClearanceMm         smallest clearance (on diameter) between printed parts that still separate
 * @param maxOverhangDeg         largest overhang from vertical printed without support
 * @param maxBridgeMm            longest unsupported bridge
 * @param volumetricFlowMm3PerS  sustained extrusion rate, for print-time estimates
 */
public record PrinterProfile(String name, String source, String description, double nozzleDiameterMm,
                             double lineWidthMm, double layerHeightMm, double firstLayerHeightMm,
                             double bedXMm, double bedYMm, double bedZMm, double holeCompensationMm,
                             double outerCompensationMm, double compensationScatterMm, double minClearanceMm,
                             double minWallMm, double maxOverhangDeg, double maxBridgeMm,
                             double volumetricFlowMm3PerS) {

    static final Set<String> KEYS = Set.of("kind", "name", "description", "nozzle-diameter", "line-width",
            "layer-height", "first-layer-height", "bed-x", "bed-y", "bed-z", "hole-compensation",
            "outer-compensation", "compensation-scatter", "min-clearance", "min-wall", "max-overhang",
            "max-bridge", "volumetric-flow");

    static PrinterProfile read(YamlDoc d, String source, List<Problem> problems) {
        d.allowOnly(KEYS);
        Range small = Range.aboveUpTo(0, 3, "above 0 and at most 3 mm");
        Range bed = Range.aboveUpTo(0, 2000, "above 0 and at most 2000 mm");
        Range comp = Range.between(-1, 1, "between -1 and 1 mm");
        PrinterProfile p = new PrinterProfile(d.text("name"), source, d.optionalText("description").orElse(""),
                d.quantity("nozzle-diameter", LENGTH, small),
                d.quantity("line-width", LENGTH, small),
                d.quantity("layer-height", LENGTH, small),
                d.quantity("first-layer-height", LENGTH, small),
                d.quantity("bed-x", LENGTH, bed), d.quantity("bed-y", LENGTH, bed), d.quantity("bed-z", LENGTH, bed),
                d.quantity("hole-compensation", LENGTH, comp),
                d.quantity("outer-compensation", LENGTH, comp),
                d.quantity("compensation-scatter", LENGTH, Range.between(0, 1, "between 0 and 1 mm")),
                d.quantity("min-clearance", LENGTH, Range.between(0, 2, "between 0 and 2 mm")),
                d.quantity("min-wall", LENGTH, Range.aboveUpTo(0, 5, "above 0 and at most 5 mm")),
                d.quantity("max-overhang", ANGLE, Range.between(0, 90, "between 0 and 90 deg")),
                d.quantity("max-bridge", LENGTH, Range.between(0, 200, "between 0 and 200 mm")),
                d.quantity("volumetric-flow", VOLUME_FLOW, Range.aboveUpTo(0, 1e-6, "above 0 and at most 1000 mm3/s"))
                        * 1e9);
        if (p.layerHeightMm() > p.nozzleDiameterMm()) {
            d.problem("layer-height", "a layer height at most the nozzle diameter (" + p.nozzleDiameterMm() + " mm)",
                    p.layerHeightMm() + " mm");
        }
        if (p.lineWidthMm() < p.nozzleDiameterMm() * 0.6) {
            d.problem("line-width", "a line width of at least 60 % of the nozzle diameter", p.lineWidthMm() + " mm");
        }
        return p;
    }
}
