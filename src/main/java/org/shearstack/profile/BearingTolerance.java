package org.shearstack.profile;

/**
 * Normal-class (ISO 492) deviations of a bearing's mean bore and mean outside diameter for diameters in
 * (overMm, upToMm], in mm (negative below nominal).
 */
public record BearingTolerance(double overMm, double upToMm, double boreUpperMm, double boreLowerMm,
                               double outerUpperMm, double outerLowerMm) {

    public boolean covers(double diameterMm) {
        return diameterMm > overMm && diameterMm <= upToMm;
    }
}
