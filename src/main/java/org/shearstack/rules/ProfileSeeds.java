package org.shearstack.rules;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.profile.FilamentProfile;
import org.shearstack.profile.PrinterProfile;

/** Turns the chosen printer and filament profiles into PROFILE seeds under {@link ProfileKeys}. */
final class ProfileSeeds {

    private ProfileSeeds() {
    }

    static List<Seed> printer(PrinterProfile p) {
        List<Seed> s = new ArrayList<>();
        String label = "printer " + p.name();
        s.add(Seed.text(ProfileKeys.PRINTER_NAME, p.name(), Derivation.Origin.PROFILE, label, "profile name", p.source()));
        num(s, ProfileKeys.NOZZLE_DIAMETER, p.nozzleDiameterMm(), label, p.source());
        num(s, ProfileKeys.LINE_WIDTH, p.lineWidthMm(), label, p.source());
        num(s, ProfileKeys.LAYER_HEIGHT, p.layerHeightMm(), label, p.source());
        num(s, ProfileKeys.FIRST_LAYER_HEIGHT, p.firstLayerHeightMm(), label, p.source());
        num(s, ProfileKeys.BED_X, p.bedXMm(), label, p.source());
        num(s, ProfileKeys.BED_Y, p.bedYMm(), label, p.source());
        num(s, ProfileKeys.BED_Z, p.bedZMm(), label, p.source());
        num(s, ProfileKeys.HOLE_COMPENSATION, p.holeCompensationMm(), label, p.source());
        num(s, ProfileKeys.OUTER_COMPENSATION, p.outerCompensationMm(), label, p.source());
        num(s, ProfileKeys.COMPENSATION_SCATTER, p.compensationScatterMm(), label, p.source());
        num(s, ProfileKeys.MIN_CLEARANCE, p.minClearanceMm(), label, p.source());
        num(s, ProfileKeys.MIN_WALL, p.minWallMm(), label, p.source());
        num(s, ProfileKeys.MAX_OVERHANG, p.maxOverhangDeg(), label, p.source());
        num(s, ProfileKeys.MAX_BRIDGE, p.maxBridgeMm(), label, p.source());
        num(s, ProfileKeys.VOLUMETRIC_FLOW, p.volumetricFlowMm3PerS() * 1e-9, label, p.source());
        return s;
    }

    static List<Seed> filament(FilamentProfile f) {
        List<Seed> s = new ArrayList<>();
        String label = "filament " + f.name();
        String source = f.source() + " (" + f.sources() + ")";
        s.add(Seed.text(ProfileKeys.FILAMENT_NAME, f.name(), Derivation.Origin.PROFILE, label, "profile name", f.source()));
        num(s, ProfileKeys.DENSITY, f.densityKgPerM3(), label, source);
        num(s, ProfileKeys.ELASTIC_MODULUS, f.elasticModulusPa(), label, source);
        num(s, ProfileKeys.POISSON_RATIO, f.poissonRatio(), label, source);
        num(s, ProfileKeys.TENSILE_STRENGTH_XY, f.tensileStrengthXyPa(), label, source);
        num(s, ProfileKeys.TENSILE_STRENGTH_Z, f.tensileStrengthZPa(), label, source);
        num(s, ProfileKeys.SOFTENING_TEMPERATURE, f.softeningK(), label, source);
        return s;
    }

    private static void num(List<Seed> s, Key k, double v, String label, String source) {
        s.add(Seed.number(k, v, Derivation.Origin.PROFILE, label, "from the profile", source));
    }
}
