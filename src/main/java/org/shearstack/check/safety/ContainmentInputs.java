package org.shearstack.check.safety;

/**
 * What the containment checks need; lengths in mm, pressures absolute in Pa. The housing is checked at the full
 * supply pressure: a blocked exhaust exposes it to that (physics.md §5).
 *
 * @param supplyPressurePa        supply pressure, absolute
 * @param ambientPressurePa       ambient pressure, absolute
 * @param chamberDiameterMm       housing bore
 * @param housingWallMm           radial wall of the housing ring
 * @param coverThicknessMm        thickness of each cover plate
 * @param coverSpanDiameterMm     unsupported diameter of a cover (the seal or screw circle)
 * @param sealDiameterMm          effective seal (O-ring or gasket) diameter
 * @param screwCount              screws holding one cover
 * @param screwDiameterMm         nominal screw diameter
 * @param screwPitchMm            thread pitch
 * @param anchorOuterDiameterMm   outer diameter of the insert, nut or thread in the printed boss
 * @param anchorLengthMm          engaged length in the boss
 * @param seatingLoadPerScrewN    extra load per screw to seat the seal (0 when none)
 * @param modulusPa               filament elastic modulus
 * @param poisson                 filament Poisson ratio
 * @param tensileXyPa             filament strength printed flat
 * @param tensileZPa              filament strength across layers (NaN when unknown)
 * @param endPlayMinMm            smallest axial end play of the pack (NaN when unknown)
 * @param factor                  safety factor on stress
 */
public record ContainmentInputs(double supplyPressurePa, double ambientPressurePa, double chamberDiameterMm,
        double housingWallMm, double coverThicknessMm, double coverSpanDiameterMm, double sealDiameterMm,
        int screwCount, double screwDiameterMm, double screwPitchMm, double anchorOuterDiameterMm,
        double anchorLengthMm, double seatingLoadPerScrewN, double modulusPa, double poisson, double tensileXyPa,
        double tensileZPa, double endPlayMinMm, double factor) {

    public double gaugePressurePa() {
        return supplyPressurePa - ambientPressurePa;
    }
}
