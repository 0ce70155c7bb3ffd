package org.shearstack.io.family;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import java.util.function.ToDoubleFunction;
import org.shearstack.physics.supply.ReferenceAtmosphere;

/**
 * The columns of the comparison table after the variant's name and values: key dimensions, then figures. Each
 * comes from the variant's report.json (the path is given), or is derived from report.json values in one stated
 * way, so that the table and the variant reports can never disagree.
 */
public final class FamilyColumns {

    /**
     * A key dimension: the report's keyDimensions entry with this key.
     *
     * @param key     design key
     * @param header  column header without unit
     * @param unit    canonical unit ("" for a count or a designation)
     * @param text    true when the value is a word (a bearing designation): the report's display text
     */
    public record Dimension(String key, String header, String unit, boolean text) {
    }

    /**
     * A figure.
     *
     * @param id          short stable column name for the CSV header ("shaft_power_W" style headers derive from it)
     * @param header      column header for people
     * @param unit        unit ("1" for a ratio)
     * @param reportPath  the report.json path it is read from, or "" when derived
     * @param derivation  how a derived figure is computed from report.json values, or ""
     * @param digits      decimals shown in the HTML, or significant digits when negative
     * @param roundDown   shown truncated downward (a safe limit is never shown above its value)
     * @param read        the value from a report.json tree (NaN when absent)
     */
    public record Figure(String id, String header, String unit, String reportPath, String derivation, int digits,
            boolean roundDown, ToDoubleFunction<JsonNode> read) {
    }

    public static final List<Dimension> DIMENSIONS = List.of(
            new Dimension("rotor.diameter", "disc diameter", "mm", false),
            new Dimension("rotor.discs", "discs", "", false),
            new Dimension("rotor.disc-thickness", "disc thickness", "mm", false),
            new Dimension("rotor.gap", "gap", "mm", false),
            new Dimension("rotor.exhaust-diameter", "exhaust diameter", "mm", false),
            new Dimension("nozzle.throat-area", "throat area", "mm2", false),
            new Dimension("housing.chamber-diameter", "chamber diameter", "mm", false),
            new Dimension("housing.outside-diameter", "housing outside diameter", "mm", false),
            new Dimension("bearing.designation", "bearings", "", true));

    public static final String POWER = "shaft-power";
    public static final String ELECTRICAL = "electrical-power";
    public static final String EFFICIENCY = "efficiency";
    public static final String SPEED_MARGIN = "speed-margin";
    public static final String MAX_SAFE_PRESSURE = "max-safe-pressure";
    public static final String SUPPLY_PRESSURE = "supply-pressure";

    public static final List<Figure> FIGURES = List.of(
            path(SUPPLY_PRESSURE, "supply pressure", "bar(g)", "supply.pressureBarG", 2, false),
            path("operating-speed", "operating speed", "rpm", "performance.operatingPoint.speedRpm", 0, false),
            path(POWER, "shaft power", "W", "performance.operatingPoint.powerW", -3, false),
            path(ELECTRICAL, "electrical power", "W", "performance.generator.electricalPowerW", -3, false),
            path(EFFICIENCY, "efficiency", "1", "performance.operatingPoint.efficiency", -3, false),
            path("air-mass-flow", "air mass flow", "kg/s", "performance.operatingPoint.massFlowKgPerS", -3, false),
            new Figure("air-consumption", "air consumption (free air, ANR)", "L/min", "",
                    "performance.operatingPoint.massFlowKgPerS / 1.185 kg/m3 (ISO 8778 reference density) * 60000",
                    -3, false, r -> num(r, "performance.operatingPoint.massFlowKgPerS")
                            / ReferenceAtmosphere.DENSITY_KG_PER_M3 * 60_000),
            path("runaway-speed", "runaway speed (upper band)", "rpm", "safety.runawaySpeedRpm", 0, false),
            path("allowable-speed", "allowable speed", "rpm", "safety.allowableSpeedRpm", 0, false),
            new Figure(SPEED_MARGIN, "speed margin (allowable / runaway)", "1", "",
                    "safety.allowableSpeedRpm / safety.runawaySpeedRpm", 2, true,
                    r -> num(r, "safety.allowableSpeedRpm") / num(r, "safety.runawaySpeedRpm")),
            path(MAX_SAFE_PRESSURE, "maximum safe supply pressure", "bar(g)", "safety.maxSafeSupplyPressureBarG", 2,
                    true),
            new Figure("printed-mass", "printed mass", "g", "", "sum over parts of massG * count", -3, false,
                    FamilyColumns::printedMassG),
            new Figure("print-time", "print time", "min", "", "sum over bom of printTimeMin", 0, false,
                    FamilyColumns::printTimeMin));

    private FamilyColumns() {
    }

    /** The figure with this id. */
    public static Figure figure(String id) {
        return FIGURES.stream().filter(f -> f.id().equals(id)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no figure " + id));
    }

    /** The position of a figure in {@link #FIGURES}. */
    public static int indexOf(String id) {
        return FIGURES.indexOf(figure(id));
    }

    private static Figure path(String id, String header, String unit, String path, int digits, boolean down) {
        return new Figure(id, header, unit, path, "", digits, down, r -> num(r, path));
    }

    /** The number at a dotted report.json path; NaN when absent or null. */
    public static double num(JsonNode report, String dottedPath) {
        JsonNode n = report.at("/" + dottedPath.replace('.', '/'));
        return n.isNumber() ? n.doubleValue() : Double.NaN;
    }

    private static double printedMassG(JsonNode r) {
        JsonNode parts = r.path("parts");
        if (!parts.isArray() || parts.isEmpty()) {
            return Double.NaN;
        }
        double sum = 0;
        for (JsonNode p : parts) {
            if (!p.path("massG").isNumber()) {
                return Double.NaN;
            }
            sum += p.path("massG").doubleValue() * p.path("count").asInt(1);
        }
        return sum;
    }

    private static double printTimeMin(JsonNode r) {
        JsonNode bom = r.path("bom");
        double sum = 0;
        boolean any = false;
        if (bom.isArray()) {
            for (JsonNode b : bom) {
                if (b.path("printTimeMin").isNumber()) {
                    sum += b.path("printTimeMin").doubleValue();
                    any = true;
                }
            }
        }
        return any ? sum : Double.NaN;
    }
}
