package org.shearstack.assembly;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.MassProperties;
import org.shearstack.part.Dims;
import org.shearstack.part.HubShaft;

/**
 * Moment of inertia about the spin axis of everything the kit puts on the shaft: every rotating printed part
 * (from its mesh, {@link MassProperties}) times its number of copies, plus a metal shaft when the design uses
 * one (the kit's shaft model in steel, 7850 kg/m³, common practice). The
 * generator's own rotor is not in the kit and must be added by the user.
 */
public final class RotatingInertia {
    /** Density of the steel shaft (common practice for carbon steel). */
    public static final double STEEL_DENSITY_KG_PER_M3 = 7850;

    private RotatingInertia() {
    }

    /**
     * One rotating part's share.
     *
     * @param part       part name
     * @param copies     copies on the shaft
     * @param eachKgM2   inertia of one copy about the axis
     */
    public record Share(String part, int copies, double eachKgM2) {
        public double totalKgM2() {
            return copies * eachKgM2;
        }
    }

    /**
     * The total and its shares.
     *
     * @param totalKgM2      sum of the shares and the metal shaft
     * @param shares         rotating printed parts
     * @param metalShaftKgM2 steel shaft (0 for a printed shaft)
     */
    public record Result(double totalKgM2, List<Share> shares, double metalShaftKgM2) {
        public Result {
            shares = List.copyOf(shares);
        }
    }

    /** Inertia of the rotating parts of a design printed in a filament of the given density. */
    public static Result of(Dims d, GeometryContext ctx, double filamentDensityKgPerM3) {
        Map<String, Integer> copies = new LinkedHashMap<>();
        for (Layout.Instance i : Layout.instances(d)) {
            copies.merge(i.part(), 1, Integer::sum);
        }
        List<Share> shares = new ArrayList<>();
        double total = 0;
        for (PartDef p : Layout.parts(d)) {
            int n = copies.getOrDefault(p.name(), 0);
            if (!p.rotating() || n == 0) {
                continue;
            }
            MassProperties mp = MassProperties.of(p.recipe().build(d, ctx).toMesh(ctx), filamentDensityKgPerM3);
            Share s = new Share(p.name(), n, mp.inertiaZAxisKgM2());
            shares.add(s);
            total += s.totalKgM2();
        }
        double shaft = 0;
        if (d.metalShaft()) {
            shaft = MassProperties.of(HubShaft.metalShaftModel(d, ctx).toMesh(ctx), STEEL_DENSITY_KG_PER_M3)
                    .inertiaZAxisKgM2();
            total += shaft;
        }
        return new Result(total, shares, shaft);
    }

    /** The same from a built kit: its rotating printed parts at the filament density, a metal shaft as steel. */
    public static Result of(Kit kit, double filamentDensityKgPerM3) {
        List<Share> shares = new ArrayList<>();
        double total = 0;
        double shaft = 0;
        for (KitPart p : kit.parts()) {
            if (!p.rotating() || p.count() == 0) {
                continue;
            }
            double rho = p.printed() ? filamentDensityKgPerM3 : STEEL_DENSITY_KG_PER_M3;
            double each = MassProperties.of(p.mesh(), rho).inertiaZAxisKgM2();
            if (p.printed()) {
                shares.add(new Share(p.name(), p.count(), each));
            } else {
                shaft += p.count() * each;
            }
            total += p.count() * each;
        }
        return new Result(total, shares, shaft);
    }
}
