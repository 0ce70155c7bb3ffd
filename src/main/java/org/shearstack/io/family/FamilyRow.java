package org.shearstack.io.family;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

/**
 * One variant's line of the comparison table.
 *
 * @param index         position in the family (0-based; the table is sorted by it)
 * @param name          the variant's name ("rotor.diameter=60mm"), also its folder name
 * @param values        its value of each varied key, in the family's key order
 * @param status        what became of it
 * @param firstFailure  the first failing finding ("BURST-RUNAWAY: ...") or the first problem; "" when none
 * @param dimensions    each of {@link FamilyColumns#DIMENSIONS}: the number (NaN when absent or a word)
 * @param dimensionTexts each of {@link FamilyColumns#DIMENSIONS}: the report's display text ("" when absent)
 * @param figures       each of {@link FamilyColumns#FIGURES} (NaN when not computed)
 */
public record FamilyRow(int index, String name, List<VariedValue> values, Status status, String firstFailure,
        double[] dimensions, List<String> dimensionTexts, double[] figures) {

    public FamilyRow {
        Objects.requireNonNull(name, "name");
        values = List.copyOf(values);
        Objects.requireNonNull(status, "status");
        Objects.requireNonNull(firstFailure, "firstFailure");
        dimensions = dimensions.clone();
        dimensionTexts = List.copyOf(dimensionTexts);
        figures = figures.clone();
        if (dimensions.length != FamilyColumns.DIMENSIONS.size() || dimensionTexts.size() != dimensions.length
                || figures.length != FamilyColumns.FIGURES.size()) {
            throw new IllegalArgumentException("a row needs one value per column");
        }
    }

    /** The row of a variant that ran, read from its report.json tree. */
    public static FamilyRow fromReport(int index, String name, List<VariedValue> values, JsonNode report) {
        Status status = Status.ofVerdict(report.path("verdict").asText());
        double[] dims = new double[FamilyColumns.DIMENSIONS.size()];
        List<String> texts = new ArrayList<>();
        for (int i = 0; i < dims.length; i++) {
            FamilyColumns.Dimension d = FamilyColumns.DIMENSIONS.get(i);
            JsonNode kd = dimension(report, d.key());
            dims[i] = kd != null && kd.path("value").isNumber() ? kd.path("value").doubleValue() : Double.NaN;
            texts.add(kd == null ? "" : kd.path("display").asText(""));
        }
        double[] figs = new double[FamilyColumns.FIGURES.size()];
        for (int i = 0; i < figs.length; i++) {
            double v = FamilyColumns.FIGURES.get(i).read().applyAsDouble(report);
            figs[i] = Double.isFinite(v) ? v : Double.NaN;
        }
        return new FamilyRow(index, name, values, status, firstFailure(report), dims, texts, figs);
    }

    /** A row for a variant that did not produce a report: bad input, an error, or not run. */
    public static FamilyRow without(int index, String name, List<VariedValue> values, Status status, String reason) {
        double[] dims = new double[FamilyColumns.DIMENSIONS.size()];
        Arrays.fill(dims, Double.NaN);
        double[] figs = new double[FamilyColumns.FIGURES.size()];
        Arrays.fill(figs, Double.NaN);
        return new FamilyRow(index, name, values, status, reason, dims,
                java.util.Collections.nCopies(dims.length, ""), figs);
    }

    /** The figure with this id. */
    public double figure(String id) {
        return figures[FamilyColumns.indexOf(id)];
    }

    /** The figures (a copy). */
    @Override
    public double[] figures() {
        return figures.clone();
    }

    /** The dimensions (a copy). */
    @Override
    public double[] dimensions() {
        return dimensions.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof FamilyRow r && index == r.index && name.equals(r.name) && values.equals(r.values)
                && status == r.status && firstFailure.equals(r.firstFailure) && Arrays.equals(dimensions, r.dimensions)
                && dimensionTexts.equals(r.dimensionTexts) && Arrays.equals(figures, r.figures);
    }

    @Override
    public int hashCode() {
        return Objects.hash(index, name, values, status, firstFailure, dimensionTexts)
                + 31 * Arrays.hashCode(dimensions) + 17 * Arrays.hashCode(figures);
    }

    @Override
    public String toString() {
        return "FamilyRow[" + index + " " + name + " " + status.word() + "]";
    }

    private static JsonNode dimension(JsonNode report, String key) {
        for (JsonNode kd : report.path("keyDimensions")) {
            if (kd.path("key").asText().equals(key)) {
                return kd;
            }
        }
        return null;
    }

    /** The report's first FAIL finding (findings are sorted FAIL first) as "CODE (part): message". */
    static String firstFailure(JsonNode report) {
        for (JsonNode f : report.path("findings")) {
            if (f.path("severity").asText().equals("fail")) {
                String part = f.path("part").asText("");
                return f.path("code").asText() + (part.isEmpty() ? "" : " (" + part + ")") + ": "
                        + f.path("message").asText("");
            }
        }
        return "";
    }
}
