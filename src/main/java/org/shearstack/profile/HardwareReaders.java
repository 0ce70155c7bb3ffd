package org.shearstack.profile;

import static org.shearstack.spec.Dimension.*;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.shearstack.spec.Problem;
import org.shearstack.spec.Range;

/** Reads the hardware table files (bearings, fasteners, seals, ports) from located YAML. */
final class HardwareReaders {

    private static final Range MM = Range.aboveUpTo(0, 500, "above 0 and at most 500 mm");
    private static final Range MM0 = Range.between(0, 500, "between 0 and 500 mm");
    private static final Range DEVIATION = Range.between(-0.1, 0.1, "between -100 and 100 um");
    private static final Range FRACTION = Range.between(0, 1, "between 0 and 100 %");

    private HardwareReaders() {
    }

    static BearingTable bearings(YamlDoc d, String source, List<Problem> problems) {
        d.allowOnly(Set.of("kind", "name", "standard", "speed-factor-limit", "speed-factor-limit-source", "bearings",
                "tolerances"));
        List<Bearing> rows = new ArrayList<>();
        for (YamlDoc r : d.table("bearings")) {
            r.allowOnly(Set.of("designation", "bore", "outer", "width", "shielded-width", "chamfer"));
            Bearing b = new Bearing(r.text("designation"), r.quantity("bore", LENGTH, MM), r.quantity("outer", LENGTH, MM),
                    r.quantity("width", LENGTH, MM), r.optionalQuantity("shielded-width", LENGTH, MM).orElse(Double.NaN),
                    r.quantity("chamfer", LENGTH, MM0));
            if (b.outerMm() <= b.boreMm()) {
                r.problem("outer", "an outer diameter larger than the bore (" + b.boreMm() + " mm)", b.outerMm() + " mm");
            }
            rows.add(b);
        }
        List<BearingTolerance> tol = new ArrayList<>();
        for (YamlDoc r : d.table("tolerances")) {
            r.allowOnly(Set.of("over", "up-to", "bore-upper", "bore-lower", "outer-upper", "outer-lower"));
            tol.add(new BearingTolerance(r.quantity("over", LENGTH, MM0), r.quantity("up-to", LENGTH, MM),
                    r.quantity("bore-upper", LENGTH, DEVIATION), r.quantity("bore-lower", LENGTH, DEVIATION),
                    r.quantity("outer-upper", LENGTH, DEVIATION), r.quantity("outer-lower", LENGTH, DEVIATION)));
        }
        // the speed factor n·dm is a plain number in rpm × mm, as the trade writes it
        double ndm = d.quantity("speed-factor-limit", DIMENSIONLESS,
                Range.aboveUpTo(0, 1e7, "above 0 and at most 10 000 000 (rpm × mm)"));
        return new BearingTable(d.text("name"), source, d.text("standard"), rows, tol, ndm,
                d.text("speed-factor-limit-source"));
    }

    static FastenerTable fasteners(YamlDoc d, String source, List<Problem> problems) {
        d.allowOnly(Set.of("kind", "name", "standard", "lengths", "lengths-source", "sizes"));
        List<Fastener> rows = new ArrayList<>();
        for (YamlDoc r : d.table("sizes")) {
            r.allowOnly(Set.of("size", "pitch", "clearance-fine", "clearance-medium", "clearance-coarse",
                    "head-diameter", "head-height", "key", "nut-flats", "nut-corners", "nut-thickness", "insert-pilot",
                    "insert-depth", "tap-drill"));
            String size = r.text("size");
            if (!size.matches("M\\d+(\\.\\d+)?")) {
                r.problem("size", "a metric size such as M3", "\"" + size + "\"");
                size = "M0";
            }
            Fastener f = new Fastener(size, r.quantity("pitch", LENGTH, MM), r.quantity("clearance-fine", LENGTH, MM),
                    r.quantity("clearance-medium", LENGTH, MM), r.quantity("clearance-coarse", LENGTH, MM),
                    r.quantity("head-diameter", LENGTH, MM), r.quantity("head-height", LENGTH, MM),
                    r.quantity("key", LENGTH, MM), r.quantity("nut-flats", LENGTH, MM),
                    r.quantity("nut-corners", LENGTH, MM), r.quantity("nut-thickness", LENGTH, MM),
                    r.quantity("insert-pilot", LENGTH, MM), r.quantity("insert-depth", LENGTH, MM),
                    r.quantity("tap-drill", LENGTH, MM));
            if (f.clearanceFineMm() <= f.nominalMm()) {
                r.problem("clearance-fine", "a clearance hole larger than the screw (" + f.nominalMm() + " mm)",
                        f.clearanceFineMm() + " mm");
            }
            rows.add(f);
        }
        return new FastenerTable(d.text("name"), source, d.text("standard"), rows,
                d.quantities("lengths", LENGTH, MM), d.text("lengths-source"));
    }

    static SealTable seals(YamlDoc d, String source, List<Problem> problems) {
        d.allowOnly(Set.of("kind", "name", "standard", "squeeze-min", "squeeze-max", "fill-max", "glands"));
        List<Gland> rows = new ArrayList<>();
        for (YamlDoc r : d.table("glands")) {
            r.allowOnly(Set.of("cross-section", "depth", "width"));
            Gland g = new Gland(r.quantity("cross-section", LENGTH, MM), r.quantity("depth", LENGTH, MM),
                    r.quantity("width", LENGTH, MM));
            if (g.depthMm() >= g.crossSectionMm()) {
                r.problem("depth", "a groove shallower than the cross-section (" + g.crossSectionMm() + " mm)",
                        g.depthMm() + " mm");
            }
            rows.add(g);
        }
        return new SealTable(d.text("name"), source, d.text("standard"), rows,
                d.quantity("squeeze-min", DIMENSIONLESS, FRACTION), d.quantity("squeeze-max", DIMENSIONLESS, FRACTION),
                d.quantity("fill-max", DIMENSIONLESS, FRACTION));
    }

    static PortTable ports(YamlDoc d, String source, List<Problem> problems) {
        d.allowOnly(Set.of("kind", "name", "standard", "ports", "push-in-clearance", "push-in-depth-factor"));
        List<Port> rows = new ArrayList<>();
        for (YamlDoc r : d.table("ports")) {
            r.allowOnly(Set.of("port", "thread-major", "pitch", "pilot", "spot-face", "depth", "source"));
            rows.add(new Port(r.text("port"), r.quantity("thread-major", LENGTH, MM), r.quantity("pitch", LENGTH, MM),
                    r.quantity("pilot", LENGTH, MM), r.quantity("spot-face", LENGTH, MM), r.quantity("depth", LENGTH, MM),
                    r.text("source")));
        }
        return new PortTable(d.text("name"), source, d.text("standard"), rows,
                d.quantity("push-in-clearance", LENGTH, MM0),
                d.quantity("push-in-depth-factor", DIMENSIONLESS, Range.aboveUpTo(0, 10, "above 0 and at most 10")));
    }
}
