package org.shearstack.io.report;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.rules.Key;
import org.shearstack.spec.Dimension;

/**
 * The headline figures, computed once so that the HTML page, report.json and summary.md show the same
 * numbers. Each figure has the JSON path it appears under, its value and the decimals shown.
 */
public final class Headline {

    /**
     * One headline figure.
     *
     * @param jsonPath  where report.json holds the same value ("safety.maxSafeSupplyPressureBarG")
     * @param label     what it is, for people
     * @param value     the value in {@code unit}
     * @param unit      the unit shown
     * @param digits    decimals shown, or significant digits when negative (-3: three significant digits)
     * @param roundDown true to truncate toward minus infinity instead of rounding (a safe limit is never shown
     *                  above its computed value)
     */
    public record Figure(String jsonPath, String label, double value, String unit, int digits, boolean roundDown) {
        Figure(String jsonPath, String label, double value, String unit, int digits) {
            this(jsonPath, label, value, unit, digits, false);
        }

        public String text() {
            if (roundDown && digits >= 0 && Double.isFinite(value)) {
                double scale = Math.pow(10, digits);
                return Num.fixed(Math.floor(value * scale) / scale, digits);
            }
            return digits >= 0 ? Num.fixed(value, digits) : Num.sig(value, -digits);
        }
    }

    /** Key dimensions shown in the headline, in this order, when the design has them. */
    static final List<String[]> KEY_DIMENSIONS = List.of(
            new String[] {"rotor.diameter", "disc diameter"},
            new String[] {"rotor.discs", "discs"},
            new String[] {"rotor.disc-thickness", "disc thickness"},
            new String[] {"rotor.gap", "gap"},
            new String[] {"rotor.exhaust-diameter", "exhaust diameter"},
            new String[] {"nozzle.throat-area", "nozzle throat area"},
            new String[] {"housing.chamber-diameter", "chamber diameter"},
            new String[] {"housing.outside-diameter", "housing outside diameter"},
            new String[] {"bearing.designation", "bearings"});

    private Headline() {
    }

    /**
     * The safety and performance figures, maximum safe supply pressure first. Figures whose inputs are missing
     * are left out (the report says why in its omissions).
     */
    public static List<Figure> figures(ReportData r) {
        List<Figure> f = new ArrayList<>();
        r.safety().ifPresent(s -> {
            f.add(new Figure("safety.maxSafeSupplyPressureBarG", "maximum safe supply pressure",
                    s.maxSafeSupplyPressureBarG(), "bar(g)", 2, true));
            f.add(new Figure("safety.runawaySpeedRpm", "runaway speed (no load, upper band)", s.runawaySpeedRpm(),
                    "rpm", 0));
            f.add(new Figure("safety.allowableSpeedRpm", "allowable speed (" + s.governingPart() + ")",
                    s.allowableSpeedRpm(), "rpm", 0));
        });
        r.supply().ifPresent(s -> f.add(new Figure("supply.pressureBarG", "supply pressure (regulator)",
                s.supplyPressureBarG(), "bar(g)", 2)));
        r.performance().ifPresent(p -> {
            var op = p.operatingPoint();
            f.add(new Figure("performance.operatingPoint.speedRpm", "operating speed", op.speedRpm(), "rpm", 0));
            f.add(new Figure("performance.operatingPoint.powerW", "shaft power at the operating point",
                    op.shaftPowerW(), "W", -3));
            f.add(new Figure("performance.operatingPoint.torqueNm", "shaft torque at the operating point",
                    op.shaftTorqueNm(), "N*m", -3));
            f.add(new Figure("performance.operatingPoint.massFlowKgPerS", "air mass flow at the operating point",
                    op.massFlowKgPerS(), "kg/s", -3));
            f.add(new Figure("performance.runawaySpeedRpm", "runaway speed (estimate)", Num.rpm(
                    p.map().runawaySpeedRadPerS()), "rpm", 0));
            p.generator().ifPresent(g -> f.add(new Figure("performance.generator.electricalPowerW",
                    "electrical power into the load", g.electricalPowerW(), "W", -3)));
        });
        return List.copyOf(f);
    }

    /** The key dimensions the design has, formatted by its own display rules. */
    public static List<KeyDimension> keyDimensions(ResolvedDesign d) {
        List<KeyDimension> out = new ArrayList<>();
        for (String[] kd : KEY_DIMENSIONS) {
            d.key(kd[0]).ifPresent(k -> out.add(dimension(d, k, kd[1])));
        }
        return List.copyOf(out);
    }

    static KeyDimension dimension(ResolvedDesign d, Key k, String label) {
        if (k.dimension() == Dimension.TEXT || d.findText(k).isPresent()) {
            return new KeyDimension(k.name(), label, Double.NaN, "", d.display(k));
        }
        return new KeyDimension(k.name(), label, d.get(k), k.dimension().canonicalUnit(), d.display(k));
    }
}
