package org.shearstack.physics.generator;

import org.shearstack.physics.rotor.OperatingPoint;
import org.shearstack.physics.rotor.TurbineModel;

/** Couples a turbine model with a DC generator on a resistive load. */
public final class GeneratorCoupling {

    private static final double GOLDEN = (Math.sqrt(5.0) - 1.0) / 2.0;

    private GeneratorCoupling() {
    }

    /** Speed where turbine shaft torque equals generator torque, and the electrical figures there. */
    public static GeneratorPoint run(TurbineModel turbine, DcGenerator generator, double loadResistanceOhm) {
        OperatingPoint p = turbine.operatingPoint(w -> generator.torqueNm(w, loadResistanceOhm));
        double w = p.speedRadPerS();
        double i = generator.currentA(w, loadResistanceOhm);
        return new GeneratorPoint(loadResistanceOhm, w, i, i * loadResistanceOhm,
                generator.loadPowerW(w, loadResistanceOhm), p.shaftPowerW());
    }

    /**
     * The load resistance giving the most electrical power with the turbine attached (golden-section search on
     * log R_L between the given bounds). Unlike the fixed-speed rule R_L = R_a, it accounts for the speed dropping
     * as the load grows.
     */
    public static GeneratorPoint bestLoad(TurbineModel turbine, DcGenerator generator, double minOhm, double maxOhm,
            double relativeTolerance) {
        double a = Math.log(minOhm);
        double b = Math.log(maxOhm);
        double c = b - GOLDEN * (b - a);
        double d = a + GOLDEN * (b - a);
        GeneratorPoint pc = run(turbine, generator, Math.exp(c));
        GeneratorPoint pd = run(turbine, generator, Math.exp(d));
        while (b - a > relativeTolerance) {
            if (pc.electricalPowerW() > pd.electricalPowerW()) {
                b = d;
                d = c;
                pd = pc;
                c = b - GOLDEN * (b - a);
                pc = run(turbine, generator, Math.exp(c));
            } else {
                a = c;
                c = d;
                pc = pd;
                d = a + GOLDEN * (b - a);
                pd = run(turbine, generator, Math.exp(d));
            }
        }
        return pc.electricalPowerW() > pd.electricalPowerW() ? pc : pd;
    }
}
