package org.shearstack.io.family;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The family page's charts: shaft (and electrical) power, efficiency and the speed margin against the varied key.
 * The x axis is the first varied key with numbers (one series per combination of the other keys); when no varied
 * key has numbers, the variants stand side by side in family order.
 */
public final class FamilyPlots {

    private FamilyPlots() {
    }

    /** The three charts for a table. */
    public static List<FamilyChart.Spec> of(FamilyTable t) {
        int xKey = -1;
        for (int i = 0; i < t.keys().size(); i++) {
            if (t.keys().get(i).numeric()) {
                xKey = i;
                break;
            }
        }
        String xLabel = xKey >= 0 ? t.keys().get(xKey).axisLabel() : "variant (position in the family)";
        List<String> categories = new ArrayList<>();
        if (xKey < 0) {
            t.rows().forEach(r -> categories.add(r.name()));
        }
        List<FamilyChart.Spec> charts = new ArrayList<>();
        boolean electrical = t.rows().stream().anyMatch(r -> Double.isFinite(r.figure(FamilyColumns.ELECTRICAL)));
        List<FamilyChart.Series> power = new ArrayList<>(series(t, xKey, FamilyColumns.POWER, 1,
                electrical ? "shaft: " : ""));
        if (electrical) {
            power.addAll(series(t, xKey, FamilyColumns.ELECTRICAL, 1, "electrical: "));
        }
        charts.add(new FamilyChart.Spec("Power at the operating point", xLabel,
                electrical ? "shaft and electrical power (W)" : "shaft power (W)", power, Double.NaN, "", categories));
        charts.add(new FamilyChart.Spec("Efficiency at the operating point", xLabel, "efficiency (%)",
                series(t, xKey, FamilyColumns.EFFICIENCY, 100, ""), Double.NaN, "", categories));
        charts.add(new FamilyChart.Spec("Safety margin: allowable speed / runaway speed", xLabel,
                "speed margin (1)", series(t, xKey, FamilyColumns.SPEED_MARGIN, 1, ""), 1.0,
                "1 = runaway reaches the allowable speed", categories));
        return charts;
    }

    private static List<FamilyChart.Series> series(FamilyTable t, int xKey, String figure, double scale,
            String prefix) {
        Map<String, List<FamilyChart.Point>> groups = new LinkedHashMap<>();
        for (int i = 0; i < t.rows().size(); i++) {
            FamilyRow r = t.rows().get(i);
            double x = xKey >= 0 ? r.values().get(xKey).number() : i + 1;
            if (!Double.isFinite(x)) {
                continue; // "auto" on a numeric axis: the table still lists it
            }
            String group = prefix + others(t, r, xKey);
            double y = r.figure(figure) * scale;
            boolean failed = r.status().failed();
            groups.computeIfAbsent(group, g -> new ArrayList<>())
                    .add(new FamilyChart.Point(x, y, failed, r.name() + ": " + r.status().word()));
        }
        List<FamilyChart.Series> out = new ArrayList<>();
        groups.forEach((name, points) -> out.add(new FamilyChart.Series(name, points)));
        return out;
    }

    /** The series a row belongs to: its values of the keys not on the x axis ("all variants" when none). */
    private static String others(FamilyTable t, FamilyRow r, int xKey) {
        if (xKey < 0) {
            return "all variants";
        }
        StringBuilder b = new StringBuilder();
        for (int k = 0; k < t.keys().size(); k++) {
            if (k != xKey) {
                b.append(b.length() == 0 ? "" : ", ").append(t.keys().get(k).key()).append('=')
                        .append(r.values().get(k).written());
            }
        }
        return b.length() == 0 ? "all variants" : b.toString();
    }
}
