package org.shearstack.physics.rotor;

/**
 * Drag torques outside the gaps as functions of speed. Sources:
 * <ul>
 * <li>End faces: Daily &amp; Nece (1960, J. Basic Eng. 82:217) enclosed rotating disc, four regimes with
 * G = s/a and Re = Ωa²/ν: I 2π/(G·Re), II 3.70 G^0.1 Re^−0.5, III 0.080 G^−1/6 Re^−1/4, IV 0.102 G^0.1 Re^−0.2
 * (coefficients from memory, physics.md §3.7). Their C_M covers both faces of one disc, so the pack's two outer
 * faces together take M = ½ C_M ρ Ω² a⁵ once (physics.md §12.1). The regime with the largest C_M is taken,
 * which picks merged layers at small G·Re and turbulence at high Re.</li>
 * <li>Rim: Couette shear μΩr₂/c below, Blasius-type turbulent law on 2c above (engineering closure).</li>
 * <li>Bearings: load term μ·P·d/2 (RoyMech; Koyo catalogue table 4-1) and the Palmgren speed term
 * 10⁻⁷ f₀ (νn)^(2/3) d_m³ N·mm, 160·10⁻⁷ f₀ d_m³ below νn = 2000 (from memory).</li>
 * <li>Seals: a constant drag per sealed bearing.</li>
 * </ul>
 */
public final class ParasiticLosses {

    private ParasiticLosses() {
    }

    /**
     * @param densityKgPerM3 density of the air around the pack (housing pressure)
     * @param viscosityPaS   its viscosity
     */
    public static ParasiticTorques at(double speedRadPerS, TurbineGeometry geometry, LossModel losses,
            Calibration calibration, double densityKgPerM3, double viscosityPaS) {
        double omega = Math.abs(speedRadPerS);
        double end = calibration.endFaceScale()
                * endFaceMomentNm(omega, geometry.outerRadiusM(), geometry.endClearanceM(), densityKgPerM3,
                        viscosityPaS);
        double rim = calibration.rimScale() * rimMomentNm(omega, geometry.outerRadiusM(), geometry.rimClearanceM(),
                geometry.packHeightM(), densityKgPerM3, viscosityPaS);
        double load = losses.bearingCount() * calibration.bearingFrictionCoefficient() * losses.bearingLoadN()
                * losses.bearingBoreM() / 2.0;
        double speed = losses.bearingCount()
                * palmgrenSpeedTermNm(omega, calibration.bearingSpeedFactor(), losses.lubricantViscosityCSt(),
                        losses.bearingMeanDiameterM());
        double seals = losses.sealedBearings() * calibration.sealTorquePerBearingNm();
        return new ParasiticTorques(end, rim, load, speed, seals);
    }

    /** Daily &amp; Nece moment on a disc of radius a wetted on both faces, clearance s: M = ½ C_M ρ Ω² a⁵. */
    public static double endFaceMomentNm(double speedRadPerS, double radiusM, double clearanceM,
            double densityKgPerM3, double viscosityPaS) {
        if (speedRadPerS == 0.0) {
            return 0.0;
        }
        double g = clearanceM / radiusM;
        double re = densityKgPerM3 * speedRadPerS * radiusM * radiusM / viscosityPaS;
        double cm = dailyNeceMomentCoefficient(g, re);
        return 0.5 * cm * densityKgPerM3 * speedRadPerS * speedRadPerS * Math.pow(radiusM, 5);
    }

    /** Largest of the four Daily &amp; Nece regime coefficients at G and Re. */
    public static double dailyNeceMomentCoefficient(double clearanceRatio, double reynolds) {
        double g = clearanceRatio;
        double c1 = 2.0 * Math.PI / (g * reynolds);
        double c2 = 3.70 * Math.pow(g, 0.1) / Math.sqrt(reynolds);
        double c3 = 0.080 * Math.pow(g, -1.0 / 6.0) * Math.pow(reynolds, -0.25);
        double c4 = 0.102 * Math.pow(g, 0.1) * Math.pow(reynolds, -0.2);
        return Math.max(Math.max(c1, c2), Math.max(c3, c4));
    }

    /** Rim drag τ·2πr₂H·r₂ with τ from a Couette/Blasius blend on the hydraulic diameter 2c. */
    public static double rimMomentNm(double speedRadPerS, double radiusM, double clearanceM, double heightM,
            double densityKgPerM3, double viscosityPaS) {
        if (speedRadPerS == 0.0) {
            return 0.0;
        }
        double v = speedRadPerS * radiusM;
        double laminar = viscosityPaS * v / clearanceM;
        double re = densityKgPerM3 * v * 2.0 * clearanceM / viscosityPaS;
        double turbulent = 0.0791 * Math.pow(re, -0.25) * 0.5 * densityKgPerM3 * v * v;
        double tau = Math.pow(Math.pow(laminar, 8) + Math.pow(turbulent, 8), 1.0 / 8.0);
        return tau * 2.0 * Math.PI * radiusM * heightM * radiusM;
    }

    /** Palmgren's load-independent bearing moment, N·m, per bearing. */
    public static double palmgrenSpeedTermNm(double speedRadPerS, double f0, double viscosityCSt,
            double meanDiameterM) {
        if (speedRadPerS == 0.0 || f0 == 0.0 || meanDiameterM == 0.0) {
            return 0.0;
        }
        double rpm = speedRadPerS * 60.0 / (2.0 * Math.PI);
        double dm = meanDiameterM * 1000.0;
        double nu = viscosityCSt * rpm;
        double nmm = nu >= 2000.0 ? 1e-7 * f0 * Math.pow(nu, 2.0 / 3.0) * dm * dm * dm
                : 160e-7 * f0 * dm * dm * dm;
        return nmm / 1000.0;
    }
}
