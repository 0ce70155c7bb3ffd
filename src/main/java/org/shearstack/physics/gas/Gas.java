package org.shearstack.physics.gas;

/**
 * A calorically perfect gas with Sutherland's viscosity law.
 *
 * @param gamma                   ratio of specific heats
 * @param gasConstantJPerKgK      specific gas constant R
 * @param sutherlandMuRefPaS      reference viscosity of Sutherland's law
 * @param sutherlandTRefK         reference temperature of Sutherland's law
 * @param sutherlandConstantK     Sutherland constant S
 */
public record Gas(double gamma, double gasConstantJPerKgK, double sutherlandMuRefPaS, double sutherlandTRefK,
        double sutherlandConstantK) {

    /**
     * Dry air: γ = 1.4, R = 287.05 J/(kg K); Sutherland μ_ref = 1.716e-5 Pa s at 273.15 K, S = 110.4 K
     * (constants as given in F. M. White, Viscous Fluid Flow, from memory; physics.md §0).
     */
    public static final Gas AIR = new Gas(1.4, 287.05, 1.716e-5, 273.15, 110.4);

    public Gas {
        if (!(gamma > 1.0) || !(gasConstantJPerKgK > 0) || !(sutherlandMuRefPaS > 0) || !(sutherlandTRefK > 0)
                || !(sutherlandConstantK >= 0)) {
            throw new IllegalArgumentException("gas needs gamma > 1 and positive constants, found gamma " + gamma
                    + ", R " + gasConstantJPerKgK);
        }
    }

    /** Specific heat at constant pressure c_p = γR/(γ−1). */
    public double cpJPerKgK() {
        return gamma * gasConstantJPerKgK / (gamma - 1.0);
    }

    /** Dynamic viscosity by Sutherland's law μ = μ_ref (T/T_ref)^1.5 (T_ref + S)/(T + S). */
    public double viscosityPaS(double temperatureK) {
        requirePositive(temperatureK, "temperatureK");
        double x = temperatureK / sutherlandTRefK;
        return sutherlandMuRefPaS * x * Math.sqrt(x)
                * (sutherlandTRefK + sutherlandConstantK) / (temperatureK + sutherlandConstantK);
    }

    /** Density of the perfect gas ρ = p/(RT). */
    public double densityKgPerM3(double pressurePa, double temperatureK) {
        requirePositive(temperatureK, "temperatureK");
        return pressurePa / (gasConstantJPerKgK * temperatureK);
    }

    /** Speed of sound a = √(γRT). */
    public double speedOfSoundMPerS(double temperatureK) {
        requirePositive(temperatureK, "temperatureK");
        return Math.sqrt(gamma * gasConstantJPerKgK * temperatureK);
    }

    static void requirePositive(double value, String name) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be a positive finite number, found " + value);
        }
    }
}
