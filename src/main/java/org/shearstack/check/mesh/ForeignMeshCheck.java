package org.shearstack.check.mesh;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.check.print.PrintLimits;
import org.shearstack.check.print.Printability;
import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Mesh;
import org.shearstack.geom.MeshCheck;
import org.shearstack.geom.MeshReport;
import org.shearstack.geom.Region;
import org.shearstack.geom.Slab;

/**
 * Checks meshes made elsewhere (an STL, or the objects of a 3MF placed by their build): validity of each
 * ({@link MeshValidity}), printability of each valid one on its slices ({@link Printability}, the same checks as
 * for our own parts, sliced per {@link SlicePlan} in the file's frame so locations can be found in the file), and
 * interference between the objects ({@link ObjectInterference}). A mesh that is not a closed solid is not sliced:
 * its sections would be guesses.
 */
public final class ForeignMeshCheck {

    /**
     * Slices differing by less than this area are the same section (mm²; the contact tolerance of
     * {@link org.shearstack.assembly.Interference#AREA_TOLERANCE_MM2}, far below a printed feature).
     */
    public static final double ALIKE_AREA_MM2 = org.shearstack.assembly.Interference.AREA_TOLERANCE_MM2;

    private ForeignMeshCheck() {
    }

    /** One object as placed in the file's frame (mm, Z up = print direction). */
    public record MeshObject(String name, Mesh mesh) {
        public MeshObject {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(mesh, "mesh");
        }
    }

    /**
     * How to slice and what the printer can make.
     *
     * @param limits         the printer's limits (their layer height is the layer above the first)
     * @param firstLayerMm   the printer's first-layer height
     * @param layersPerSlab  layers per slab, 0 to let {@link SlicePlan} choose
     * @param maxSlabs       the slab budget per object when choosing
     */
    public record Settings(PrintLimits limits, double firstLayerMm, int layersPerSlab, int maxSlabs,
            GeometryContext ctx) {
        public static Settings of(PrintLimits limits, double firstLayerMm, GeometryContext ctx) {
            return new Settings(limits, firstLayerMm, 0, SlicePlan.DEFAULT_MAX_SLABS, ctx);
        }

        public Settings withLayersPerSlab(int n) {
            return new Settings(limits, firstLayerMm, n, maxSlabs, ctx);
        }
    }

    /**
     * What was found for one object.
     *
     * @param plan     how it was sliced; empty when it was not (not a closed solid)
     * @param solid    its slices; empty when it was not sliced
     * @param findings validity and printability findings
     */
    public record ObjectResult(String name, MeshReport report, Optional<SlicePlan> plan, Optional<LayeredSolid> solid,
            List<Finding> findings) {
        public ObjectResult {
            findings = List.copyOf(findings);
        }
    }

    /** Per-object results and the interference findings between objects. */
    public record Result(List<ObjectResult> objects, List<Finding> interference) {
        public Result {
            objects = List.copyOf(objects);
            interference = List.copyOf(interference);
        }

        /** Every finding: each object's in order, then interference. */
        public List<Finding> findings() {
            List<Finding> out = new ArrayList<>();
            objects.forEach(o -> out.addAll(o.findings()));
            out.addAll(interference);
            return out;
        }

        public boolean anyFail() {
            return findings().stream().anyMatch(f -> f.severity() == Severity.FAIL);
        }
    }

    public static Result run(List<MeshObject> objects, Settings s) {
        List<ObjectResult> results = new ArrayList<>();
        List<ObjectInterference.Placed> placed = new ArrayList<>();
        for (MeshObject o : objects) {
            ObjectResult r = checkOne(o, s);
            results.add(r);
            r.solid().ifPresent(solid -> placed.add(new ObjectInterference.Placed(o.name(), solid)));
        }
        List<Finding> interference = objects.size() > 1 ? new ArrayList<>(ObjectInterference.check(placed))
                : new ArrayList<>();
        if (objects.size() > 1 && placed.size() < objects.size()) {
            interference.add(Findings.of("MESH-INTERFERENCE", Severity.CAUTION, (objects.size() - placed.size())
                    + " of " + objects.size() + " objects are not closed solids and were left out of the"
                    + " interference check.", Double.NaN, Double.NaN, "", Double.NaN, "", "assembly",
                    "repair those meshes and check again"));
        }
        return new Result(results, interference);
    }

    /** Validity, slicing and printability of one object. */
    public static ObjectResult checkOne(MeshObject o, Settings s) {
        MeshReport report = MeshCheck.validate(o.mesh());
        List<Finding> findings = new ArrayList<>(MeshValidity.findings(o.name(), report));
        if (!MeshValidity.sliceable(report)) {
            findings.add(Findings.of("PRINTABILITY", Severity.CAUTION, "Printability not checked: the mesh is not a"
                    + " closed, outward-facing solid, so its slices would be guesses.", Double.NaN, Double.NaN, "",
                    Double.NaN, o.name(), "mesh", "repair the mesh first"));
            return new ObjectResult(o.name(), report, Optional.empty(), Optional.empty(), findings);
        }
        double[] zRange = zRange(o.mesh());
        SlicePlan plan = SlicePlan.of(zRange[0], zRange[1], s.firstLayerMm(), s.limits().layerHeightMm(),
                s.layersPerSlab(), s.maxSlabs());
        LayeredSolid solid = mergeAlike(org.shearstack.geom.Slicer.slabs(o.mesh(), s.ctx(), plan.boundariesMm()));
        findings.addAll(Printability.check(o.name(), solid, forSlabs(s.limits(), plan.slabHeightMm())));
        return new ObjectResult(o.name(), report, Optional.of(plan), Optional.of(solid), findings);
    }

    /**
     * Joins touching slabs whose regions differ by less than {@link #ALIKE_AREA_MM2} (slices of a vertical wall at
     * two heights differ only by rounding), keeping the lower region: a prism becomes one slab, so each feature is
     * checked and reported once, not once per layer.
     */
    static LayeredSolid mergeAlike(LayeredSolid solid) {
        List<Slab> out = new ArrayList<>();
        for (Slab s : solid.slabs()) {
            int last = out.size() - 1;
            if (last >= 0 && out.get(last).z1Mm() == s.z0Mm() && alike(out.get(last).region(), s.region())) {
                Slab prev = out.get(last);
                out.set(last, new Slab(prev.z0Mm(), s.z1Mm(), prev.region()));
            } else {
                out.add(s);
            }
        }
        return LayeredSolid.of(solid.context(), out);
    }

    private static boolean alike(Region a, Region b) {
        if (a.equals(b)) {
            return true;
        }
        if (Math.abs(a.areaMm2() - b.areaMm2()) > ALIKE_AREA_MM2) {
            return false;
        }
        return a.minus(b).areaMm2() + b.minus(a).areaMm2() <= ALIKE_AREA_MM2;
    }

    /** The limits with the slab height as the layer, so the overhang step matches the slicing. */
    static PrintLimits forSlabs(PrintLimits l, double slabHeightMm) {
        return new PrintLimits(l.nozzleMm(), l.lineWidthMm(), slabHeightMm, l.minGapMm(), l.maxOverhangDeg(),
                l.maxBridgeMm(), l.minFirstLayerAreaMm2());
    }

    private static double[] zRange(Mesh m) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int t = 0; t < m.triangleCount(); t++) {
            for (int c = 0; c < 3; c++) {
                double z = m.z(m.corner(t, c));
                lo = Math.min(lo, z);
                hi = Math.max(hi, z);
            }
        }
        return new double[] {lo, hi};
    }
}
