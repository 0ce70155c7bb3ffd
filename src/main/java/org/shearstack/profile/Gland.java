package org.shearstack.profile;

/** An O-ring face gland for one cross-section, in mm. */
public record Gland(double crossSectionMm, double depthMm, double widthMm) {

    /** Nominal squeeze (CS − depth) / CS. */
    public double squeeze() {
        return (crossSectionMm - depthMm) / crossSectionMm;
    }

    /** Nominal fill: O-ring section area over groove area. */
    public double fill() {
        return Math.PI / 4 * crossSectionMm * crossSectionMm / (depthMm * widthMm);
    }
}
