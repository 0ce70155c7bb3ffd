package org.shearstack.check.print;

import java.util.ArrayList;
import java.util.List;
import java.util.NoSuchElementException;
import org.shearstack.assembly.Layout;
import org.shearstack.assembly.PartDef;
import org.shearstack.check.DesignValues;
import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.part.Dims;

/**
 * Printability of every printed part of a design, each in its print orientation, without meshing. When the
 * design lacks what the parts need, one finding says so.
 */
public final class PartPrintability {

    private PartPrintability() {
    }

    public static List<Finding> run(ResolvedDesign design, GeometryContext ctx) {
        return run(design, ctx, name -> true);
    }

    /** Only the parts whose names pass {@code parts} (for focused runs and tests). */
    public static List<Finding> run(ResolvedDesign design, GeometryContext ctx,
            java.util.function.Predicate<String> parts) {
        PrintLimits limits = PrintLimits.of(new DesignValues(design));
        Dims d;
        try {
            d = Dims.of(org.shearstack.part.DesignValues.of(design::get, design::text, design::has));
        } catch (NoSuchElementException | IllegalArgumentException e) {
            return List.of(Findings.of("PRINTABILITY", Severity.CAUTION,
                    "Printability not checked: the parts cannot be built from this design (" + e.getMessage() + ").",
                    Double.NaN, Double.NaN, "", Double.NaN, "", "printed parts",
                    "complete the design (or pin the missing values)"));
        }
        List<Finding> out = new ArrayList<>();
        for (PartDef p : Layout.parts(d)) {
            if (!parts.test(p.name())) {
                continue;
            }
            LayeredSolid s = p.recipe().build(d, ctx);
            out.addAll(Printability.check(p.name(), s, limits));
        }
        return out;
    }
}
