package org.shearstack.geom;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Optional;

/**
 * A solid made of slabs stacked along Z (the print axis): ordered, non-overlapping, gaps allowed (a gap
 * separates shells). Empty slabs are dropped. Immutable.
 *
 * <p>{@link #toMesh(GeometryContext)} builds a closed, consistently oriented indexed mesh without 3D
 * booleans (see {@link StackMesher}).
 */
public final class LayeredSolid {

    private final GeometryContext ctx;
    private final List<Slab> slabs;

    private LayeredSolid(GeometryContext ctx, List<Slab> slabs) {
        this.ctx = ctx;
        this.slabs = slabs;
    }

    /**
     * A solid from slabs in any order.
     *
     * @throws IllegalArgumentException if two slabs overlap in Z or use different geometry contexts
     */
    public static LayeredSolid of(GeometryContext ctx, List<Slab> slabs) {
        List<Slab> sorted = new ArrayList<>();
        for (Slab s : slabs) {
            if (!s.region().context().equals(ctx)) {
                throw new IllegalArgumentException("slab at z " + s.z0Mm() + " mm: region from another context "
                        + s.region().context() + ", expected " + ctx);
            }
            if (!s.region().isEmpty()) {
                sorted.add(s);
            }
        }
        sorted.sort((a, b) -> Double.compare(a.z0Mm(), b.z0Mm()));
        for (int i = 1; i < sorted.size(); i++) {
            if (sorted.get(i).z0Mm() < sorted.get(i - 1).z1Mm()) {
                throw new IllegalArgumentException("slabs overlap: [" + sorted.get(i - 1).z0Mm() + ", "
                        + sorted.get(i - 1).z1Mm() + "] and [" + sorted.get(i).z0Mm() + ", " + sorted.get(i).z1Mm()
                        + "] mm");
            }
        }
        return new LayeredSolid(ctx, Collections.unmodifiableList(sorted));
    }

    /** A single extrusion of {@code region} from z0 to z1. */
    public static LayeredSolid extrusion(Region region, double z0Mm, double z1Mm) {
        return of(region.context(), List.of(new Slab(z0Mm, z1Mm, region)));
    }

    /** A builder that adds slabs one at a time. */
    public static Builder builder(GeometryContext ctx) {
        return new Builder(ctx);
    }

    public GeometryContext context() {
        return ctx;
    }

    /** The slabs, sorted by height. */
    public List<Slab> slabs() {
        return slabs;
    }

    public boolean isEmpty() {
        return slabs.isEmpty();
    }

    /** Σ slab area × slab height, in mm³. */
    public double volumeMm3() {
        double v = 0;
        for (Slab s : slabs) {
            v += s.volumeMm3();
        }
        return v;
    }

    /** The slab whose half-open band [z0, z1) contains {@code zMm}, if any. */
    public Optional<Slab> slabAt(double zMm) {
        for (Slab s : slabs) {
            if (zMm >= s.z0Mm() && zMm < s.z1Mm()) {
                return Optional.of(s);
            }
        }
        return Optional.empty();
    }

    public double minZMm() {
        return slabs.isEmpty() ? 0 : slabs.get(0).z0Mm();
    }

    public double maxZMm() {
        return slabs.isEmpty() ? 0 : slabs.get(slabs.size() - 1).z1Mm();
    }

    /** The same solid with all slabs moved up by {@code dzMm} (snapped to the grid). */
    public LayeredSolid translatedZ(double dzMm) {
        List<Slab> out = new ArrayList<>();
        for (Slab s : slabs) {
            out.add(new Slab(s.z0Mm() + dzMm, s.z1Mm() + dzMm, s.region()));
        }
        return of(ctx, out);
    }

    /**
     * The same solid with every slab's rings snap-rounded together (all slabs noded against each other on the
     * grid). Its slabs are exact prisms of the mesh, so its {@link #volumeMm3()} equals the mesh volume to
     * rounding. Areas move from this solid's by at most about perimeter × grid.
     */
    public LayeredSolid noded() {
        return StackNoder.node(this);
    }

    /**
     * A closed, outward-oriented indexed mesh of this solid.
     *
     * @throws IllegalArgumentException if {@code ctx} differs from the solid's context
     */
    public Mesh toMesh(GeometryContext ctx) {
        if (!this.ctx.equals(ctx)) {
            throw new IllegalArgumentException("toMesh: context " + ctx + " differs from the solid's " + this.ctx);
        }
        return StackMesher.meshNoded(noded());
    }

    @Override
    public String toString() {
        return "LayeredSolid[" + slabs.size() + " slabs, z " + minZMm() + ".." + maxZMm() + " mm]";
    }

    /** Collects slabs; {@link #build()} sorts and checks them. */
    public static final class Builder {
        private final GeometryContext ctx;
        private final List<Slab> slabs = new ArrayList<>();

        private Builder(GeometryContext ctx) {
            this.ctx = ctx;
        }

        public Builder slab(double z0Mm, double z1Mm, Region region) {
            slabs.add(new Slab(z0Mm, z1Mm, region));
            return this;
        }

        public LayeredSolid build() {
            return of(ctx, slabs);
        }
    }
}
