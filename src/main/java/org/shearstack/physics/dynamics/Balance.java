package org.shearstack.physics.dynamics;

/**
 * Permissible residual unbalance of a rigid rotor after ISO 21940-11:2016 (formerly ISO 1940-1): the balance
 * quality grade G is e_per·Ω in mm/s, so e_per = G/Ω and U_per = e_per · m. Applies below the first critical
 * speed.
 */
public final class Balance {

    private Balance() {
    }

    /** Permissible specific unbalance (mass-centre offset) e_per in µm (≡ g·mm/kg) at grade G (mm/s). */
    public static double permissibleEccentricityMicrometres(double gradeMmPerS, double speedRadPerS) {
        if (!(gradeMmPerS > 0 && speedRadPerS > 0)) {
            throw new IllegalArgumentException("grade and speed must be positive");
        }
        return gradeMmPerS / speedRadPerS * 1000;
    }

    /** Permissible residual unbalance U_per in g·mm for a rotor of mass m (kg). */
    public static double permissibleUnbalanceGramMm(double gradeMmPerS, double speedRadPerS, double rotorMassKg) {
        return permissibleEccentricityMicrometres(gradeMmPerS, speedRadPerS) * rotorMassKg;
    }

    /** The grade (mm/s) that a mass-centre offset e (µm) amounts to at a speed: G = e·Ω. */
    public static double equivalentGradeMmPerS(double eccentricityMicrometres, double speedRadPerS) {
        return eccentricityMicrometres / 1000 * speedRadPerS;
    }

    /**
     * Mass-centre offset of a printed, stacked pack implied by the printer and the fit, in µm: each part's mass
     * centre sits off its bore by up to the printer's positional tolerance, and the pack may shift sideways by
     * half the bore clearance on the hub. Worst case adds the positional tolerance and half the clearance;
     * the statistical (RSS) case divides the positional part by √n for n independent parts.
     *
     * @param worstCase true for the worst-case stack, false for the RSS estimate
     */
    public static double printedEccentricityMicrometres(double positionalToleranceMm, double boreClearanceMm,
            int partCount, boolean worstCase) {
        if (partCount < 1 || positionalToleranceMm < 0 || boreClearanceMm < 0) {
            throw new IllegalArgumentException("need at least one part and non-negative tolerances");
        }
        double positional = worstCase ? positionalToleranceMm : positionalToleranceMm / Math.sqrt(partCount);
        return (positional + boreClearanceMm / 2) * 1000;
    }

    /** Converts rpm to rad/s. */
    public static double radPerS(double rpm) {
        return rpm * 2 * Math.PI / 60;
    }

    /** Parses a grade such as "G6.3" or "6.3" to mm/s. */
    public static double parseGradeMmPerS(String grade) {
        String s = grade.strip();
        if (s.startsWith("G") || s.startsWith("g")) {
            s = s.substring(1).strip();
        }
        double g;
        try {
            g = Double.parseDouble(s);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("balance grade: expected G followed by mm/s (e.g. G6.3), found '"
                    + grade + "'");
        }
        if (!(g > 0)) {
            throw new IllegalArgumentException("balance grade must be positive, found '" + grade + "'");
        }
        return g;
    }
}
