package org.shearstack.physics.supply;

/**
 * How the gas left in a tank behaves while it blows down: a polytropic index n with
 * p/ρⁿ constant; n = 1 is isothermal, n = γ adiabatic (isentropic).
 *
 * @param index polytropic index n, 1 ≤ n ≤ γ in practice
 */
public record TankProcess(double index) {

    public static final TankProcess ISOTHERMAL = new TankProcess(1.0);

    public TankProcess {
        if (!(index >= 1.0) || Double.isInfinite(index)) {
            throw new IllegalArgumentException("polytropic index must be >= 1, found " + index);
        }
    }

    public static TankProcess adiabatic(double gamma) {
        return new TankProcess(gamma);
    }

    public static TankProcess polytropic(double index) {
        return new TankProcess(index);
    }

    public boolean isothermal() {
        return index == 1.0;
    }
}
