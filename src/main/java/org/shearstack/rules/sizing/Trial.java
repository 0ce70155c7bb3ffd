package org.shearstack.rules.sizing;

/**
 * A candidate disc pack in the rules' units.
 *
 * @param diameterMm         disc outer diameter
 * @param exhaustDiameterMm  diameter of the exhaust radius r₁ (outer edge of the port ring)
 * @param gapMm              face-to-face gap
 * @param thicknessMm        disc thickness
 * @param discs              number of discs
 */
record Trial(double diameterMm, double exhaustDiameterMm, double gapMm, double thicknessMm, int discs) {

    Trial withDiameter(double d, double exhaustRatio) {
        return new Trial(d, d * exhaustRatio, gapMm, thicknessMm, discs);
    }

    Trial withGap(double g) {
        return new Trial(diameterMm, exhaustDiameterMm, g, thicknessMm, discs);
    }

    Trial withDiscs(int n) {
        return new Trial(diameterMm, exhaustDiameterMm, gapMm, thicknessMm, n);
    }

    Trial withExhaustDiameter(double d) {
        return new Trial(diameterMm, d, gapMm, thicknessMm, discs);
    }
}
