package org.shearstack.assembly;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.geom.Bounds2;
import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Mesh;
import org.shearstack.geom.MeshCheck;
import org.shearstack.geom.MeshReport;
import org.shearstack.geom.Region;
import org.shearstack.part.DesignValues;
import org.shearstack.part.Dims;
import org.shearstack.part.HubShaft;
import org.shearstack.rules.Key;
import org.shearstack.rules.ProfileKeys;

/**
 * The whole kit of a design, immutable: every distinct part with its mesh and copies, the hardware shown in
 * the assembly, print plates, the bill of materials and the findings of the assembly checks (interference,
 * clearances, plates, mesh validity). {@link #build} is a pure function of the design and the geometry
 * context; parts are meshed in parallel, results are kept in a fixed order.
 */
public record Kit(String name, Dims dims, List<KitPart> parts, List<PrintPlates.Plate> plates, List<BomRow> bom,
        List<Finding> findings, double bedXMm, double bedYMm) {

    /** Spacing between parts on a plate and to the bed's edge (common practice). */
    public static final double PLATE_SPACING_MM = 5;
    /** Used when a design carries no bed size: a common 220 mm bed (stated in a finding). */
    static final double DEFAULT_BED_MM = 220;

    public Kit {
        parts = List.copyOf(parts);
        plates = List.copyOf(plates);
        bom = List.copyOf(bom);
        findings = List.copyOf(findings);
    }

    public static Kit build(ResolvedDesign design, GeometryContext ctx) {
        return build(design.name(), DesignValues.of(design::get, design::text, design::has), ctx);
    }

    public static Kit build(String name, DesignValues v, GeometryContext ctx) {
        Dims d = Dims.of(v);
        List<Layout.Instance> instances = Layout.instances(d);
        List<PartDef> defs = new ArrayList<>(Layout.parts(d));
        List<KitPart> printed = defs.parallelStream().map(p -> {
            LayeredSolid s = p.recipe().build(d, ctx);
            List<Placement> where = instances.stream().filter(i -> i.part().equals(p.name())).map(Layout.Instance::placement)
                    .toList();
            return part(p.name(), p.family(), true, p.rotating(), p.expectedGenus(), s, ctx, where);
        }).toList();
        List<KitPart> parts = new ArrayList<>(printed);
        parts.addAll(hardware(d, ctx));
        List<Finding> findings = new ArrayList<>();
        for (KitPart p : parts) {
            MeshReport r = p.report();
            boolean ok = r.isValidSolid() && r.shellCount() == 1 && r.genusPerShell().equals(List.of(p.expectedGenus()));
            if (!ok) {
                findings.add(Findings.of("MESH-INVALID", Severity.FAIL, p.name() + ": " + r.summary()
                        + ", expected genus " + p.expectedGenus(), Double.NaN, Double.NaN, "", Double.NaN, p.name(),
                        "mesh", "report this design: the part recipe made a bad solid"));
            }
        }
        List<Body> bodies = new ArrayList<>();
        for (KitPart p : parts) {
            for (int k = 0; k < p.count(); k++) {
                bodies.add(new Body(p.name() + " #" + (k + 1), p.family(), p.rotating(), p.family().equals("bearing"),
                        p.placements().get(k).apply(p.solid())));
            }
        }
        findings.addAll(Interference.check(bodies, d, ctx));
        findings.add(ExhaustPath.check(bodies, d, ctx));
        double bedX = v.has(ProfileKeys.BED_X) ? v.get(ProfileKeys.BED_X) : DEFAULT_BED_MM;
        double bedY = v.has(ProfileKeys.BED_Y) ? v.get(ProfileKeys.BED_Y) : DEFAULT_BED_MM;
        List<PrintPlates.Footprint> feet = printed.stream()
                .map(p -> new PrintPlates.Footprint(p.name(), p.count(), footprint(p.solid(), ctx))).toList();
        PrintPlates.Result plates = PrintPlates.pack(feet, bedX, bedY, PLATE_SPACING_MM);
        findings.addAll(plates.findings());
        List<BomRow> bom = Bom.rows(d, printed, v);
        return new Kit(name, d, parts, plates.plates(), bom, findings, bedX, bedY);
    }

    private static KitPart part(String name, String family, boolean printed, boolean rotating, int genus,
            LayeredSolid s, GeometryContext ctx, List<Placement> where) {
        Mesh m = s.toMesh(ctx);
        return new KitPart(name, family, printed, rotating, genus, s, m, MeshCheck.validate(m), where);
    }

    /** Bearings (and the metal shaft) as plain solids, so the assembly shows them and the check sees them. */
    private static List<KitPart> hardware(Dims d, GeometryContext ctx) {
        List<KitPart> out = new ArrayList<>();
        LayeredSolid bearing = LayeredSolid.extrusion(
                Region.annulus(ctx, 0, 0, d.bearingOutside(), d.bearingBore()), 0, d.bearingWidth());
        out.add(part("bearing-" + d.bearing(), "bearing", false, false, 1, bearing, ctx,
                List.of(Placement.at(d.freeBearingZ0()), Placement.at(d.driveBearingZ0()))));
        if (d.metalShaft()) {
            LayeredSolid shaft = HubShaft.metalShaftModel(d, ctx);
            out.add(part("metal-shaft", "shaft", false, true, 0, shaft, ctx, List.of(Placement.at(d.shaftZ0()))));
        }
        return out;
    }

    /** The union of a part's slab regions' bounds: its footprint on the bed. */
    static Bounds2 footprint(LayeredSolid s, GeometryContext ctx) {
        double x0 = Double.POSITIVE_INFINITY;
        double y0 = Double.POSITIVE_INFINITY;
        double x1 = Double.NEGATIVE_INFINITY;
        double y1 = Double.NEGATIVE_INFINITY;
        for (var slab : s.slabs()) {
            Bounds2 b = slab.region().bounds();
            x0 = Math.min(x0, b.minXMm());
            y0 = Math.min(y0, b.minYMm());
            x1 = Math.max(x1, b.maxXMm());
            y1 = Math.max(y1, b.maxYMm());
        }
        return new Bounds2(x0, y0, x1, y1);
    }

    /** Printed parts only. */
    public List<KitPart> printedParts() {
        return parts.stream().filter(KitPart::printed).toList();
    }

    /** True when no finding failed. */
    public boolean passes() {
        return findings.stream().noneMatch(f -> f.severity() == Severity.FAIL);
    }

    /** Exploded placement: each copy moved along Z by its own height above the chamber's mid-plane. */
    public Placement exploded(KitPart p, int copy) {
        Placement pl = p.placements().get(copy);
        LayeredSolid placed = pl.apply(p.solid());
        double mid = dims.chamberDepth() / 2;
        double centre = (placed.minZMm() + placed.maxZMm()) / 2;
        return pl.raised(1.5 * (centre - mid));
    }

    /** Colours per family (sRGB hex), for the assembly. */
    public static String colour(String family) {
        Map<String, String> c = new LinkedHashMap<>();
        c.put("rotor", "#D9822BFF");
        c.put("spacer", "#F2C14EFF");
        c.put("shaft", "#5B8E7DFF");
        c.put("housing", "#4A6FA5FF");
        c.put("nozzle", "#C0392BFF");
        c.put("cover", "#8FB8DEFF");
        c.put("target", "#333333FF");
        c.put("coupling", "#8E44ADFF");
        c.put("bracket", "#7F8C8DFF");
        c.put("bearing", "#B0B0B0FF");
        return c.getOrDefault(family, "#999999FF");
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%.3f", v);
    }

    static Key bedKey() {
        return ProfileKeys.BED_X;
    }
}
