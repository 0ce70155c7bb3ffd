package org.shearstack.check.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.shearstack.check.Finding;
import org.shearstack.check.Severity;
import org.shearstack.physics.stress.PrintedStrength;
import org.shearstack.physics.stress.SafetyFactor;
import org.shearstack.physics.stress.SpinningAnnulus;

/**
 * Burst at runaway. The PLA data (1240 kg/m³, ν 0.36, 50 MPa printed flat) are the physics.md §4.3 values;
 * the runaway models are the derived locked-flow bound (physics.md §12.8) and, to test the remedy search,
 * an invented model with a known inverse.
 */
class BurstCheckTest {

    static final double AMBIENT = 101_325;
    static final double BAR = 1e5;

    static List<SpinningPart> plaPack(double discDiameterMm) {
        double b = discDiameterMm / 2000;
        return List.of(new SpinningPart("disc", SpinningAnnulus.withExhaustPorts(b, 0.3 * b), true),
                new SpinningPart("spacer", SpinningAnnulus.plainBore(0.012, 0.004), false));
    }

    static BurstInputs pla(double discDiameterMm, double supplyBarG, RunawayModel model) {
        return new BurstInputs(plaPack(discDiameterMm), 1240, 0.36, 50e6, SafetyFactor.standard(),
                AMBIENT + supplyBarG * BAR, AMBIENT, Double.NaN, model);
    }

    @Test
    void largePlaDiscsOnShopAirFail() {
        // 100 mm PLA discs on 6 bar(g): must FAIL whatever the losses (physics.md §12.7, "held under every variant")
        LockedFlowBound bound = new LockedFlowBound(0.05, 0.015, 293.15, AMBIENT);
        BurstCheck.Result r = BurstCheck.run(pla(100, 6, bound));
        Finding disc = r.findings().stream().filter(f -> f.part().equals("disc")).findFirst().orElseThrow();
        assertEquals(Severity.FAIL, disc.severity());
        assertTrue(disc.measured() > disc.limit());
        assertTrue(disc.remedy().contains("limit the supply to"), disc.remedy());
        assertTrue(disc.remedy().contains("filament of at least"), disc.remedy());
        assertTrue(disc.remedy().contains("does not respond to throat area"), disc.remedy());
        assertEquals("disc", r.summary().governingPart());
        // The bound's runaway at the maximum safe pressure equals the allowable speed
        double atMax = bound.runawayRadPerS(RunawayModel.Variant.atPressure(r.summary().maxSafeSupplyPressurePa()));
        assertEquals(r.summary().allowableSpeedRadPerS(), atMax, 1e-3 * atMax);
        assertTrue(r.summary().maxSafeSupplyPressureBarG() < 6);
    }

    @Test
    void boundInvertsInClosedForm() {
        // Derived (physics.md §12.8): p₀ = p_e / (1 − Ω²(r₂² − r₁²)/(2 c_p T₀))^(γ/(γ−1))
        LockedFlowBound bound = new LockedFlowBound(0.05, 0.015, 293.15, AMBIENT);
        BurstCheck.Result r = BurstCheck.run(pla(100, 6, bound));
        double w = r.summary().allowableSpeedRadPerS();
        double cp = 1.4 * 287.05 / 0.4;
        double p0 = AMBIENT / Math.pow(1 - w * w * (0.05 * 0.05 - 0.015 * 0.015) / (2 * cp * 293.15), 3.5);
        assertEquals(p0, r.summary().maxSafeSupplyPressurePa(), 60);
        // allowable from the disc's closed form: S = 0.7·50 MPa, factor 3, ports allowance 1.5
        double unit = 1.5 * (3.36 / 4) * 1240 * (0.05 * 0.05 + 0.64 / 3.36 * 0.015 * 0.015);
        assertEquals(Math.sqrt(PrivateAccess.strength() / 3 / unit), w, 1e-9 * w);
    }

    @Test
    void lossyModelPassesAndRemediesAreExact() {
        // Invented model (for the test only): runaway = 1000 rad/s per √bar of gauge pressure, cut by throat
        // scale and load torque; its inverse is known exactly.
        RunawayModel model = v -> {
            double g = Math.max(0, (v.supplyPressurePa() - AMBIENT) / BAR);
            return 1000 * Math.sqrt(g) * Math.sqrt(v.throatScale()) / v.diameterScale()
                    * Math.max(0, 1 - v.extraLoadTorqueNm() / 0.05);
        };
        BurstCheck.Result ok = BurstCheck.run(pla(60, 2, model));
        assertTrue(ok.findings().stream().allMatch(f -> f.severity() == Severity.OK), ok.findings().toString());
        double w = ok.summary().allowableSpeedRadPerS();
        assertEquals(Math.pow(w / 1000, 2), ok.summary().maxSafeSupplyPressureBarG(), 1e-3);

        BurstCheck.Result bad = BurstCheck.run(pla(60, 12, model));
        Finding f = bad.findings().get(0);
        assertEquals(Severity.FAIL, f.severity());
        double run = 1000 * Math.sqrt(12);
        double throat = Math.pow(w / run, 2) * 100;
        assertTrue(f.remedy().contains("throat area of at most"), f.remedy());
        String pct = f.remedy().replaceAll(".*throat area of at most ([0-9.]+) %.*", "$1");
        assertEquals(throat, Double.parseDouble(pct), 0.05);
        String mnm = f.remedy().replaceAll(".*permanent load of at least ([0-9.]+) mN m.*", "$1");
        assertEquals(50 * (1 - w / run), Double.parseDouble(mnm), 0.05);
        assertFalse(bad.summary().ceilingReached());
    }

    @Test
    void strongerFactorLowersAllowableBySquareRoot() {
        LockedFlowBound bound = new LockedFlowBound(0.05, 0.015, 293.15, AMBIENT);
        BurstInputs base = pla(100, 6, bound);
        BurstInputs strict = new BurstInputs(base.parts(), 1240, 0.36, 50e6, new SafetyFactor(12), base.supplyPressurePa(),
                AMBIENT, Double.NaN, bound);
        double ratio = BurstCheck.run(base).summary().allowableSpeedRadPerS()
                / BurstCheck.run(strict).summary().allowableSpeedRadPerS();
        assertEquals(2.0, ratio, 1e-12);
    }

    /** The design strength used in these tests (PLA 50 MPa printed flat, derated). */
    static final class PrivateAccess {
        static double strength() {
            return PrintedStrength.inPlanePa(50e6);
        }
    }
}
