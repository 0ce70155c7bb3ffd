package org.shearstack.rules.sizing;

import static org.shearstack.rules.SpecKeys.NOZZLE_JET_ANGLE;
import static org.shearstack.rules.SpecKeys.ROTOR_DIAMETER;
import static org.shearstack.rules.SpecKeys.ROTOR_DISCS;
import static org.shearstack.rules.SpecKeys.ROTOR_DISC_THICKNESS;
import static org.shearstack.rules.SpecKeys.ROTOR_EXHAUST_DIAMETER;
import static org.shearstack.rules.SpecKeys.ROTOR_GAP;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.physics.rotor.Calibration;
import org.shearstack.physics.rotor.LossModel;
import org.shearstack.physics.rotor.TurbineGeometry;
import org.shearstack.physics.rotor.TurbineModel;
import org.shearstack.rules.Key;
import org.shearstack.rules.ProfileKeys;
import org.shearstack.rules.geometry.GeoKeys;

/**
 * The performance model of a resolved design, as built (printed disc and spacer thicknesses, the housing's end
 * play and radial clearance, the disc ports, the chosen bearings). Report and safety code call
 * {@link #turbineModel(ResolvedDesign)} and then {@code map(60)} for the full map with its band.
 */
public final class DesignModels {

    /** Every key {@link #turbineModel} may read. */
    static final List<Key> READS;

    static {
        List<Key> keys = new ArrayList<>(FlowParts.SUPPLY_READS);
        keys.addAll(FlowParts.NOZZLE_READS);
        keys.addAll(List.of(NOZZLE_JET_ANGLE, ROTOR_DIAMETER, ROTOR_EXHAUST_DIAMETER, ROTOR_GAP, ROTOR_DISC_THICKNESS,
                ROTOR_DISCS, GeoKeys.DISC_PRINTED_THICKNESS, GeoKeys.SPACER_THICKNESS, GeoKeys.END_PLAY,
                GeoKeys.RADIAL_CLEARANCE, GeoKeys.DISC_EXHAUST_AREA, GeoKeys.BEARING_BORE, GeoKeys.BEARING_OUTSIDE,
                GeoKeys.BEARING_DESIGNATION, ProfileKeys.DENSITY, ProfileKeys.NOZZLE_DIAMETER,
                ProfileKeys.LINE_WIDTH));
        keys.addAll(SpecCalibration.KEYS);
        READS = List.copyOf(keys);
    }

    /** Unbalance and preload allowance per bearing on top of the rotor weight (engineering judgment). */
    static final double EXTRA_BEARING_LOAD_N = 1.0;
    /** Base-oil viscosity of bearing grease at running temperature, cSt (engineering judgment). */
    static final double GREASE_VISCOSITY_CST = 40.0;

    private DesignModels() {
    }

    /**
     * The model of a resolved design with its calibration: the one fitted to bench runs when the spec names a
     * calibration file ({@code calibration: FILE.yaml}), else the nominal one.
     */
    public static TurbineModel turbineModel(ResolvedDesign design) {
        Values v = Values.of(design);
        return turbineModel(v, SpecCalibration.calibration(v));
    }

    /** The model of a resolved design with a given calibration (for example one fitted from bench data). */
    public static TurbineModel turbineModel(ResolvedDesign design, Calibration calibration) {
        return turbineModel(Values.of(design), calibration);
    }

    static TurbineModel turbineModel(Values v, Calibration calibration) {
        double d = v.get(ROTOR_DIAMETER);
        double t = v.has(GeoKeys.DISC_PRINTED_THICKNESS) ? v.get(GeoKeys.DISC_PRINTED_THICKNESS)
                : v.get(ROTOR_DISC_THICKNESS);
        double g = v.has(GeoKeys.SPACER_THICKNESS) ? v.get(GeoKeys.SPACER_THICKNESS) : v.get(ROTOR_GAP);
        int n = (int) Math.round(v.get(ROTOR_DISCS));
        double exhaustD = v.get(ROTOR_EXHAUST_DIAMETER);
        double end = v.has(GeoKeys.END_PLAY) ? v.get(GeoKeys.END_PLAY)
                : SizingModel.endClearanceMm(g, v.get(ProfileKeys.NOZZLE_DIAMETER));
        double radial = v.has(GeoKeys.RADIAL_CLEARANCE) ? v.get(GeoKeys.RADIAL_CLEARANCE)
                : SizingModel.radialClearanceMm(d, v.get(ProfileKeys.LINE_WIDTH));
        double ports = v.has(GeoKeys.DISC_EXHAUST_AREA) ? v.get(GeoKeys.DISC_EXHAUST_AREA)
                : SizingModel.portAreaMm2(exhaustD);
        TurbineGeometry geometry = new TurbineGeometry(d / 2000, exhaustD / 2000, g / 1000, t / 1000, n, end / 1000,
                radial / 1000, ports * 1e-6, v.get(NOZZLE_JET_ANGLE));
        return TurbineModel.of(FlowParts.supply(v), FlowParts.nozzle(v), geometry, losses(v, d, t, n), calibration);
    }

    private static LossModel losses(Values v, double diameterMm, double thicknessMm, int discs) {
        if (!v.has(GeoKeys.BEARING_BORE) || !v.has(GeoKeys.BEARING_OUTSIDE)) {
            return LossModel.twoShielded608();
        }
        double bore = v.get(GeoKeys.BEARING_BORE) / 1000;
        double outside = v.get(GeoKeys.BEARING_OUTSIDE) / 1000;
        double r = diameterMm / 2000;
        double packMass = v.get(ProfileKeys.DENSITY) * discs * Math.PI * r * r * thicknessMm / 1000;
        double load = packMass * 9.81 / 2 + EXTRA_BEARING_LOAD_N;
        boolean sealed = v.has(GeoKeys.BEARING_DESIGNATION)
                && v.text(GeoKeys.BEARING_DESIGNATION).toUpperCase(Locale.ROOT).contains("RS");
        return new LossModel(2, bore, (bore + outside) / 2, load, sealed ? 2 : 0, GREASE_VISCOSITY_CST, 1.5);
    }
}
