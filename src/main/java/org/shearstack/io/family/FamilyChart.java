package org.shearstack.io.family;

import org.shearstack.io.Html;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A small scatter-and-line chart as inline SVG for the family page: one figure against the varied key, one series
 * per combination of the other keys. Failed variants are drawn in red; variants without a value get a red cross
 * on the axis so that none disappears. Output is deterministic (fixed decimals, Locale.ROOT).
 */
public final class FamilyChart {

    static final int WIDTH = 600;
    static final int HEIGHT = 320;
    static final int LEFT = 72;
    static final int RIGHT = 170;
    static final int TOP = 30;
    static final int BOTTOM = 50;
    /** Above this many series the lines are left out (points only) and the legend is cut short. */
    static final int MAX_LINED_SERIES = 8;

    /** A point; {@code failed} marks it red. A NaN y means "no value": a cross on the x axis. */
    public record Point(double x, double y, boolean failed, String label) {
    }

    /** One series. */
    public record Series(String name, List<Point> points) {
        public Series {
            points = List.copyOf(points);
        }
    }

    /**
     * The chart's description.
     *
     * @param title       heading inside the picture
     * @param xLabel      x-axis label with unit
     * @param yLabel      y-axis label with unit
     * @param series      the series
     * @param referenceY  a dashed reference line (NaN for none), with {@code referenceLabel}
     * @param categories  names of the x positions 1..n when x is categorical (empty for a numeric axis)
     */
    public record Spec(String title, String xLabel, String yLabel, List<Series> series, double referenceY,
            String referenceLabel, List<String> categories) {
        public Spec {
            series = List.copyOf(series);
            categories = List.copyOf(categories);
        }
    }

    private FamilyChart() {
    }

    /** The SVG element. */
    public static String svg(Spec s) {
        double[] xr = range(s, true);
        double[] yr = range(s, false);
        Axis xa = Axis.of(xr[0], xr[1], false);
        Axis ya = Axis.of(Math.min(0, yr[0]), yr[1], true);
        StringBuilder b = new StringBuilder();
        b.append("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"chart\" width=\"").append(WIDTH)
                .append("\" height=\"").append(HEIGHT).append("\" viewBox=\"0 0 ").append(WIDTH).append(' ')
                .append(HEIGHT).append("\" role=\"img\" aria-label=\"").append(Html.escape(s.title())).append("\">\n");
        b.append("<title>").append(Html.escape(s.title())).append("</title>\n");
        b.append("<text class=\"title\" x=\"").append(LEFT).append("\" y=\"18\">").append(Html.escape(s.title()))
                .append("</text>\n");
        int x0 = LEFT;
        int x1 = WIDTH - RIGHT;
        int y0 = HEIGHT - BOTTOM;
        int y1 = TOP;
        b.append("<rect class=\"frame\" x=\"").append(x0).append("\" y=\"").append(y1).append("\" width=\"")
                .append(x1 - x0).append("\" height=\"").append(y0 - y1).append("\"/>\n");
        // y ticks
        for (double t : ya.ticks()) {
            String py = f(px(t, ya, y0, y1));
            b.append("<line class=\"grid\" x1=\"").append(x0).append("\" x2=\"").append(x1).append("\" y1=\"")
                    .append(py).append("\" y2=\"").append(py).append("\"/>");
            b.append("<text class=\"tick\" text-anchor=\"end\" x=\"").append(x0 - 6).append("\" y=\"").append(py)
                    .append("\" dy=\"4\">").append(Axis.label(t, ya.step)).append("</text>\n");
        }
        // x ticks
        if (s.categories().isEmpty()) {
            for (double t : xa.ticks()) {
                String ppx = f(px(t, xa, x0, x1));
                b.append("<line class=\"grid\" y1=\"").append(y0).append("\" y2=\"").append(y1).append("\" x1=\"")
                        .append(ppx).append("\" x2=\"").append(ppx).append("\"/>");
                b.append("<text class=\"tick\" text-anchor=\"middle\" y=\"").append(y0 + 16).append("\" x=\"")
                        .append(ppx).append("\">").append(Axis.label(t, xa.step)).append("</text>\n");
            }
        } else if (s.categories().size() <= 12) {
            for (int i = 0; i < s.categories().size(); i++) {
                String ppx = f(px(i + 1, xa, x0, x1));
                b.append("<text class=\"tick\" text-anchor=\"middle\" y=\"").append(y0 + 16).append("\" x=\"")
                        .append(ppx).append("\">").append(Html.escape(s.categories().get(i))).append("</text>\n");
            }
        }
        b.append("<text class=\"axis\" text-anchor=\"middle\" x=\"").append((x0 + x1) / 2).append("\" y=\"")
                .append(HEIGHT - 12).append("\">").append(Html.escape(s.xLabel())).append("</text>\n");
        b.append("<text class=\"axis\" text-anchor=\"middle\" transform=\"translate(16 ").append((y0 + y1) / 2)
                .append(") rotate(-90)\">").append(Html.escape(s.yLabel())).append("</text>\n");
        if (!Double.isNaN(s.referenceY()) && s.referenceY() >= ya.lo && s.referenceY() <= ya.hi) {
            String py = f(px(s.referenceY(), ya, y0, y1));
            b.append("<line class=\"ref\" x1=\"").append(x0).append("\" x2=\"").append(x1).append("\" y1=\"")
                    .append(py).append("\" y2=\"").append(py).append("\"/>");
            b.append("<text class=\"tick ref-label\" x=\"").append(x1 - 4).append("\" text-anchor=\"end\" y=\"")
                    .append(py).append("\" dy=\"-4\">").append(Html.escape(s.referenceLabel())).append("</text>\n");
        }
        boolean lines = s.series().size() <= MAX_LINED_SERIES;
        for (int si = 0; si < s.series().size(); si++) {
            Series ser = s.series().get(si);
            String cls = "s" + (si % MAX_LINED_SERIES);
            if (lines) {
                StringBuilder pts = new StringBuilder();
                for (Point p : ser.points()) {
                    if (Double.isFinite(p.y())) {
                        pts.append(pts.length() == 0 ? "" : " ").append(f(px(p.x(), xa, x0, x1))).append(',')
                                .append(f(px(p.y(), ya, y0, y1)));
                    }
                }
                if (pts.length() > 0) {
                    b.append("<polyline class=\"line ").append(cls).append("\" points=\"").append(pts)
                            .append("\"/>\n");
                }
            }
            for (Point p : ser.points()) {
                String ppx = f(px(p.x(), xa, x0, x1));
                if (Double.isFinite(p.y())) {
                    b.append("<circle class=\"pt ").append(cls).append(p.failed() ? " fail" : "").append("\" cx=\"").append(ppx)
                            .append("\" cy=\"").append(f(px(p.y(), ya, y0, y1))).append("\" r=\"3.5\"><title>")
                            .append(Html.escape(p.label())).append("</title></circle>\n");
                } else {
                    b.append("<text class=\"missing\" text-anchor=\"middle\" x=\"").append(ppx).append("\" y=\"")
                            .append(y0 - 3).append("\">\u00d7<title>").append(Html.escape(p.label()))
                            .append(" (no value)</title></text>\n");
                }
            }
            if (si < 12) {
                int ly = TOP + 8 + si * 16;
                b.append("<circle class=\"pt ").append(cls).append("\" cx=\"").append(x1 + 14).append("\" cy=\"")
                        .append(ly).append("\" r=\"3.5\"/><text class=\"tick\" x=\"").append(x1 + 22)
                        .append("\" y=\"").append(ly + 4).append("\">").append(Html.escape(shorten(ser.name(), 24)))
                        .append("</text>\n");
            } else if (si == 12) {
                b.append("<text class=\"tick\" x=\"").append(x1 + 8).append("\" y=\"").append(TOP + 8 + si * 16 + 4)
                        .append("\">and ").append(s.series().size() - 12).append(" more</text>\n");
            }
        }
        b.append("</svg>\n");
        return b.toString();
    }

    private static String shorten(String s, int n) {
        return s.length() <= n ? s : s.substring(0, n - 1) + "\u2026";
    }

    private static double[] range(Spec s, boolean x) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Series ser : s.series()) {
            for (Point p : ser.points()) {
                double v = x ? p.x() : p.y();
                if (Double.isFinite(v)) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        if (!x && !Double.isNaN(s.referenceY())) {
            lo = Math.min(lo, s.referenceY());
            hi = Math.max(hi, s.referenceY() * 1.1);
        }
        if (lo > hi) {
            return new double[] {0, 1};
        }
        if (x && !s.categories().isEmpty()) {
            return new double[] {0.5, s.categories().size() + 0.5};
        }
        return new double[] {lo, hi};
    }

    private static double px(double v, Axis a, int p0, int p1) {
        return p0 + (v - a.lo) / (a.hi - a.lo) * (p1 - p0);
    }

    static String f(double v) {
        String s = String.format(Locale.ROOT, "%.1f", v);
        return s.equals("-0.0") ? "0.0" : s;
    }

    /** A linear axis with round ticks (steps of 1, 2 or 5 times a power of ten). */
    record Axis(double lo, double hi, double step) {
        static Axis of(double lo, double hi, boolean fromData) {
            if (hi - lo <= 0) {
                double pad = lo == 0 ? 1 : Math.abs(lo) * 0.1;
                lo -= pad;
                hi += pad;
            }
            double raw = (hi - lo) / 5;
            double mag = Math.pow(10, Math.floor(Math.log10(raw)));
            double n = raw / mag;
            double step = (n <= 1 ? 1 : n <= 2 ? 2 : n <= 5 ? 5 : 10) * mag;
            double a = Math.floor(lo / step) * step;
            double b = Math.ceil(hi / step) * step;
            if (!fromData) {
                a = Math.min(a, lo - 0.02 * (hi - lo));
                b = Math.max(b, hi + 0.02 * (hi - lo));
            }
            return new Axis(a, b, step);
        }

        List<Double> ticks() {
            List<Double> t = new ArrayList<>();
            double first = Math.ceil(lo / step - 1e-9) * step;
            for (int i = 0; i < 50; i++) {
                double v = first + i * step;
                if (v > hi + step * 1e-9) {
                    break;
                }
                t.add(Math.abs(v) < step * 1e-9 ? 0.0 : v);
            }
            return t;
        }

        static String label(double v, double step) {
            int decimals = Math.max(0, (int) -Math.floor(Math.log10(step) + 1e-9));
            String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
            return s.matches("-0(\\.0*)?") ? s.substring(1) : s;
        }
    }
}
