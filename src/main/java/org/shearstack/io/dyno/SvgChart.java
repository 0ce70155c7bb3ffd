package org.shearstack.io.dyno;

import org.shearstack.io.Html;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A small x–y chart drawn as inline SVG: axes with ticks and labelled units, lines, point clouds,
 * shaded x-bands and a legend. A mutable builder used once; {@link #toSvg()} renders it.
 */
public final class SvgChart {
    private static final int W = 720;
    private static final int H = 360;
    private static final int LEFT = 78;
    private static final int RIGHT = 16;
    private static final int TOP = 30;
    private static final int BOTTOM = 50;

    private final String title;
    private final String xLabel;
    private final String yLabel;
    private final List<Series> series = new ArrayList<>();
    private final List<Band> bands = new ArrayList<>();

    private record Series(String label, double[] x, double[] y, String colour, boolean dashed, boolean points) {
    }

    private record Band(double x0, double x1, String label, String colour) {
    }

    public SvgChart(String title, String xLabel, String yLabel) {
        this.title = title;
        this.xLabel = xLabel;
        this.yLabel = yLabel;
    }

    /** Adds a polyline; NaN values break nothing, they are skipped. */
    public SvgChart line(String label, double[] x, double[] y, String colour, boolean dashed) {
        series.add(new Series(label, x.clone(), y.clone(), colour, dashed, false));
        return this;
    }

    /** Adds a cloud of small dots. */
    public SvgChart points(String label, double[] x, double[] y, String colour) {
        series.add(new Series(label, x.clone(), y.clone(), colour, false, true));
        return this;
    }

    /** Shades the x interval [x0, x1] and labels it at the top. */
    public SvgChart band(double x0, double x1, String label, String colour) {
        bands.add(new Band(x0, x1, label, colour));
        return this;
    }

    /** The chart as an SVG element. */
    public String toSvg() {
        double[] xr = range(true);
        double[] yr = range(false);
        double xs = nice((xr[1] - xr[0]) / 6);
        double ys = nice((yr[1] - yr[0]) / 5);
        double x0 = Math.floor(xr[0] / xs) * xs;
        double x1 = Math.ceil(xr[1] / xs) * xs;
        double y0 = Math.floor(yr[0] / ys) * ys;
        double y1 = Math.ceil(yr[1] / ys) * ys;
        Mapper m = new Mapper(x0, x1, y0, y1);
        StringBuilder s = new StringBuilder();
        s.append(String.format(Locale.ROOT, "<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 %d %d\" width=\"%d\""
                + " height=\"%d\" role=\"img\" aria-label=\"%s\" font-family=\"sans-serif\" font-size=\"12\">\n",
                W, H, W, H, Html.escape(title)));
        s.append(String.format(Locale.ROOT, "<text x=\"%d\" y=\"18\" font-weight=\"bold\">%s</text>\n", LEFT,
                Html.escape(title)));
        for (Band b : bands) {
            double a = m.x(Math.max(x0, b.x0));
            double c = m.x(Math.min(x1, b.x1));
            s.append(String.format(Locale.ROOT, "<rect x=\"%.1f\" y=\"%d\" width=\"%.1f\" height=\"%d\" fill=\"%s\""
                    + " fill-opacity=\"0.15\"/>\n<text x=\"%.1f\" y=\"%d\" font-size=\"11\" fill=\"%s\">%s</text>\n",
                    a, TOP, Math.max(0, c - a), H - TOP - BOTTOM, b.colour, a + 3, TOP + 13, b.colour,
                    Html.escape(b.label)));
        }
        // grid and ticks
        for (double v = x0; v <= x1 + xs / 2; v += xs) {
            double px = m.x(v);
            s.append(String.format(Locale.ROOT, "<line x1=\"%.1f\" y1=\"%d\" x2=\"%.1f\" y2=\"%d\" stroke=\"#ddd\"/>"
                    + "<text x=\"%.1f\" y=\"%d\" text-anchor=\"middle\">%s</text>\n", px, TOP, px, H - BOTTOM, px,
                    H - BOTTOM + 16, tick(v, xs)));
        }
        for (double v = y0; v <= y1 + ys / 2; v += ys) {
            double py = m.y(v);
            s.append(String.format(Locale.ROOT, "<line x1=\"%d\" y1=\"%.1f\" x2=\"%d\" y2=\"%.1f\" stroke=\"#ddd\"/>"
                    + "<text x=\"%d\" y=\"%.1f\" text-anchor=\"end\">%s</text>\n", LEFT, py, W - RIGHT, py, LEFT - 6,
                    py + 4, tick(v, ys)));
        }
        s.append(String.format(Locale.ROOT, "<rect x=\"%d\" y=\"%d\" width=\"%d\" height=\"%d\" fill=\"none\""
                + " stroke=\"#333\"/>\n", LEFT, TOP, W - LEFT - RIGHT, H - TOP - BOTTOM));
        s.append(String.format(Locale.ROOT, "<text x=\"%d\" y=\"%d\" text-anchor=\"middle\">%s</text>\n",
                (LEFT + W - RIGHT) / 2, H - 12, Html.escape(xLabel)));
        s.append(String.format(Locale.ROOT, "<text transform=\"translate(16 %d) rotate(-90)\" text-anchor=\"middle\">"
                + "%s</text>\n", (TOP + H - BOTTOM) / 2, Html.escape(yLabel)));
        for (Series se : series) {
            if (se.points) {
                s.append("<g fill=\"").append(se.colour).append("\" fill-opacity=\"0.35\">");
                for (int i = 0; i < se.x.length; i++) {
                    if (finite(se.x[i], se.y[i]) && m.inside(se.x[i], se.y[i])) {
                        s.append(String.format(Locale.ROOT, "<circle cx=\"%.1f\" cy=\"%.1f\" r=\"1.6\"/>",
                                m.x(se.x[i]), m.y(se.y[i])));
                    }
                }
                s.append("</g>\n");
            } else {
                s.append("<polyline fill=\"none\" stroke=\"").append(se.colour).append("\" stroke-width=\"1.8\"")
                        .append(se.dashed ? " stroke-dasharray=\"6 4\"" : "").append(" points=\"");
                for (int i = 0; i < se.x.length; i++) {
                    if (finite(se.x[i], se.y[i])) {
                        s.append(String.format(Locale.ROOT, "%.1f,%.1f ", m.x(se.x[i]), m.yClamped(se.y[i])));
                    }
                }
                s.append("\"/>\n");
            }
        }
        int ly = TOP + 14;
        for (Series se : series) {
            if (se.label.isEmpty()) {
                continue;
            }
            int lx = W - RIGHT - 210;
            s.append(String.format(Locale.ROOT, "<line x1=\"%d\" y1=\"%d\" x2=\"%d\" y2=\"%d\" stroke=\"%s\""
                    + " stroke-width=\"%s\"%s/><text x=\"%d\" y=\"%d\">%s</text>\n", lx, ly - 4, lx + 22, ly - 4,
                    se.colour, se.points ? "4" : "1.8", se.dashed ? " stroke-dasharray=\"6 4\"" : "", lx + 28, ly,
                    Html.escape(se.label)));
            ly += 16;
        }
        return s.append("</svg>\n").toString();
    }

    private double[] range(boolean xAxis) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        boolean anyLine = series.stream().anyMatch(se -> !se.points);
        for (Series se : series) {
            if (!xAxis && se.points && anyLine) {
                continue; // scattered samples do not stretch the scale; those outside are left out
            }
            double[] v = xAxis ? se.x : se.y;
            for (int i = 0; i < v.length; i++) {
                if (finite(se.x[i], se.y[i])) {
                    lo = Math.min(lo, v[i]);
                    hi = Math.max(hi, v[i]);
                }
            }
        }
        if (xAxis) {
            for (Band b : bands) {
                lo = Math.min(lo, b.x0);
                hi = Math.max(hi, b.x1);
            }
        }
        if (!Double.isFinite(lo)) {
            return new double[] {0, 1};
        }
        lo = Math.min(lo, 0);
        if (hi <= lo) {
            hi = lo + 1;
        }
        return new double[] {lo, hi};
    }

    private static boolean finite(double x, double y) {
        return Double.isFinite(x) && Double.isFinite(y);
    }

    static double nice(double raw) {
        double p = Math.pow(10, Math.floor(Math.log10(raw)));
        double f = raw / p;
        return (f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10) * p;
    }

    private static String tick(double v, double step) {
        int decimals = Math.max(0, (int) -Math.floor(Math.log10(step) + 1e-9));
        String t = String.format(Locale.ROOT, "%." + decimals + "f", Math.abs(v) < step * 1e-9 ? 0 : v);
        return t;
    }

    private static final class Mapper {
        final double x0;
        final double x1;
        final double y0;
        final double y1;

        Mapper(double x0, double x1, double y0, double y1) {
            this.x0 = x0;
            this.x1 = x1;
            this.y0 = y0;
            this.y1 = y1;
        }

        double x(double v) {
            return LEFT + (v - x0) / (x1 - x0) * (W - LEFT - RIGHT);
        }

        double y(double v) {
            return H - BOTTOM - (v - y0) / (y1 - y0) * (H - TOP - BOTTOM);
        }

        double yClamped(double v) {
            return y(Math.max(y0, Math.min(y1, v)));
        }

        boolean inside(double x, double y) {
            return x >= x0 && x <= x1 && y >= y0 && y <= y1;
        }
    }
}
