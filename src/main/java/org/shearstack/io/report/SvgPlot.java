package org.shearstack.io.report;

import java.util.ArrayList;
import java.util.List;

/**
 * A line chart as inline SVG: linear axes with ticks, labels with units, line series, a shaded band and marked
 * points. The pixel mapping is public ({@link #xPx}, {@link #yPx}) so tests can check where marks are drawn.
 * Output is deterministic (fixed decimals, Locale.ROOT).
 */
public final class SvgPlot {

    public static final int WIDTH = 560;
    public static final int HEIGHT = 300;
    static final int LEFT = 70;
    static final int RIGHT = 18;
    static final int TOP = 44;
    static final int BOTTOM = 48;

    /** A polyline. {@code style} is a CSS class: "est", "alt", "gen". */
    public record Series(String name, String style, double[] x, double[] y) {
    }

    /** A shaded area between two curves (each from its own x values). */
    public record Band(String name, double[] xLower, double[] yLower, double[] xUpper, double[] yUpper) {
    }

    /** A marked point with a label. */
    public record Mark(String name, double x, double y) {
    }

    private final String title;
    private final String xLabel;
    private final String yLabel;
    private final List<Series> series;
    private final List<Band> bands;
    private final List<Mark> marks;
    private final Axis xAxis;
    private final Axis yAxis;

    private SvgPlot(String title, String xLabel, String yLabel, List<Series> series, List<Band> bands,
            List<Mark> marks) {
        this.title = title;
        this.xLabel = xLabel;
        this.yLabel = yLabel;
        this.series = List.copyOf(series);
        this.bands = List.copyOf(bands);
        this.marks = List.copyOf(marks);
        double[] xs = range(true);
        double[] ys = range(false);
        this.xAxis = Axis.of(Math.min(0, xs[0]), xs[1]);
        this.yAxis = Axis.of(Math.min(0, ys[0]), ys[1]);
    }

    /**
     * A plot. Axis labels carry their unit, e.g. "speed (rpm)". Both axes start at zero or below the data.
     */
    public static SvgPlot of(String title, String xLabelWithUnit, String yLabelWithUnit, List<Series> series,
            List<Band> bands, List<Mark> marks) {
        return new SvgPlot(title, xLabelWithUnit, yLabelWithUnit, series, bands, marks);
    }

    /** Lower and upper end of the x axis. */
    public double[] xRange() {
        return new double[] {xAxis.lo, xAxis.hi};
    }

    /** Lower and upper end of the y axis. */
    public double[] yRange() {
        return new double[] {yAxis.lo, yAxis.hi};
    }

    /** Horizontal pixel of a data x. */
    public double xPx(double x) {
        return LEFT + (x - xAxis.lo) / (xAxis.hi - xAxis.lo) * (WIDTH - LEFT - RIGHT);
    }

    /** Vertical pixel of a data y (SVG y grows downward). */
    public double yPx(double y) {
        return HEIGHT - BOTTOM - (y - yAxis.lo) / (yAxis.hi - yAxis.lo) * (HEIGHT - TOP - BOTTOM);
    }

    /** The SVG element. */
    public String svg() {
        StringBuilder b = new StringBuilder(8192);
        b.append("<svg class=\"plot\" width=\"").append(WIDTH)
                .append("\" height=\"").append(HEIGHT).append("\" viewBox=\"0 0 ").append(WIDTH).append(' ')
                .append(HEIGHT).append("\" role=\"img\" aria-label=\"").append(Xml.esc(title))
                .append("\" data-x-min=\"").append(Num.sig(xAxis.lo, 12)).append("\" data-x-max=\"")
                .append(Num.sig(xAxis.hi, 12)).append("\" data-y-min=\"").append(Num.sig(yAxis.lo, 12))
                .append("\" data-y-max=\"").append(Num.sig(yAxis.hi, 12)).append("\">\n");
        b.append("<title>").append(Xml.esc(title)).append("</title>\n");
        b.append("<text class=\"ptitle\" x=\"").append(LEFT).append("\" y=\"18\">").append(Xml.esc(title))
                .append("</text>\n");
        grid(b);
        for (Band band : bands) {
            b.append("<polygon class=\"band\" data-name=\"").append(Xml.esc(band.name())).append("\" points=\"");
            points(b, band.xUpper(), band.yUpper(), false);
            points(b, band.xLower(), band.yLower(), true);
            b.append("\"/>\n");
        }
        for (Series s : series) {
            b.append("<polyline class=\"line ").append(s.style()).append("\" data-name=\"").append(Xml.esc(s.name()))
                    .append("\" points=\"");
            points(b, s.x(), s.y(), false);
            b.append("\"/>\n");
        }
        for (int i = 0; i < marks.size(); i++) {
            Mark m = marks.get(i);
            double cx = xPx(m.x());
            double cy = yPx(m.y());
            // later marks put their label below the point when there is room, so neighbouring labels do not collide
            boolean below = i % 2 == 1 && cy + 18 < HEIGHT - BOTTOM;
            double ty = below ? cy + 16 : Math.max(cy - 7, TOP + 12);
            b.append("<g class=\"mark\" data-name=\"").append(Xml.esc(m.name())).append("\" data-x=\"")
                    .append(Num.sig(m.x(), 6)).append("\" data-y=\"").append(Num.sig(m.y(), 6)).append("\">")
                    .append("<line class=\"markline\" x1=\"").append(px(cx)).append("\" y1=\"").append(px(cy))
                    .append("\" x2=\"").append(px(cx)).append("\" y2=\"").append(HEIGHT - BOTTOM).append("\"/>")
                    .append("<circle cx=\"").append(px(cx)).append("\" cy=\"").append(px(cy)).append("\" r=\"4.5\"/>")
                    .append("<text x=\"").append(px(Math.min(cx + 7, WIDTH - RIGHT - 4))).append("\" y=\"")
                    .append(px(ty)).append("\"")
                    .append(cx > WIDTH * 0.7 ? " text-anchor=\"end\"" : "").append('>')
                    .append(Xml.esc(m.name())).append("</text></g>\n");
        }
        legend(b);
        b.append("</svg>");
        return b.toString();
    }

    private void grid(StringBuilder b) {
        int x0 = LEFT;
        int x1 = WIDTH - RIGHT;
        int y0 = HEIGHT - BOTTOM;
        int y1 = TOP;
        b.append("<g class=\"axes\">\n");
        for (double t : xAxis.ticks()) {
            String x = px(xPx(t));
            b.append("<line class=\"grid\" x1=\"").append(x).append("\" y1=\"").append(y1).append("\" x2=\"").append(x)
                    .append("\" y2=\"").append(y0).append("\"/>");
            b.append("<text class=\"tick\" x=\"").append(x).append("\" y=\"").append(y0 + 15)
                    .append("\" text-anchor=\"middle\">").append(xAxis.label(t)).append("</text>\n");
        }
        for (double t : yAxis.ticks()) {
            String y = px(yPx(t));
            b.append("<line class=\"grid\" x1=\"").append(x0).append("\" y1=\"").append(y).append("\" x2=\"").append(x1)
                    .append("\" y2=\"").append(y).append("\"/>");
            b.append("<text class=\"tick\" x=\"").append(x0 - 6).append("\" y=\"").append(px(yPx(t) + 4))
                    .append("\" text-anchor=\"end\">").append(yAxis.label(t)).append("</text>\n");
        }
        b.append("<line class=\"axis\" x1=\"").append(x0).append("\" y1=\"").append(y0).append("\" x2=\"").append(x1)
                .append("\" y2=\"").append(y0).append("\"/>");
        b.append("<line class=\"axis\" x1=\"").append(x0).append("\" y1=\"").append(y0).append("\" x2=\"").append(x0)
                .append("\" y2=\"").append(y1).append("\"/>\n");
        b.append("<text class=\"xlabel\" x=\"").append((x0 + x1) / 2).append("\" y=\"").append(HEIGHT - 10)
                .append("\" text-anchor=\"middle\">").append(Xml.esc(xLabel)).append("</text>\n");
        b.append("<text class=\"ylabel\" transform=\"translate(16,").append((y0 + y1) / 2)
                .append(") rotate(-90)\" text-anchor=\"middle\">").append(Xml.esc(yLabel)).append("</text>\n");
        b.append("</g>\n");
    }

    /** One row of legend entries between the title and the plot area. */
    private void legend(StringBuilder b) {
        List<String[]> entries = new ArrayList<>();
        for (Series s : series) {
            entries.add(new String[] {"line " + s.style(), s.name()});
        }
        for (Band band : bands) {
            entries.add(new String[] {"band", band.name()});
        }
        if (entries.size() < 2) {
            return;
        }
        double x = LEFT;
        int y = 34;
        b.append("<g class=\"legend\">");
        for (String[] e : entries) {
            if (e[0].equals("band")) {
                b.append("<rect class=\"band\" x=\"").append(px(x)).append("\" y=\"").append(y - 8)
                        .append("\" width=\"18\" height=\"9\"/>");
            } else {
                b.append("<line class=\"").append(e[0]).append("\" x1=\"").append(px(x)).append("\" y1=\"").append(y - 4)
                        .append("\" x2=\"").append(px(x + 18)).append("\" y2=\"").append(y - 4).append("\"/>");
            }
            b.append("<text x=\"").append(px(x + 23)).append("\" y=\"").append(y).append("\">").append(Xml.esc(e[1]))
                    .append("</text>");
            x += 23 + 6.4 * e[1].length() + 16;
        }
        b.append("</g>\n");
    }

    private void points(StringBuilder b, double[] xs, double[] ys, boolean reverse) {
        int n = Math.min(xs.length, ys.length);
        for (int k = 0; k < n; k++) {
            int i = reverse ? n - 1 - k : k;
            if (!Double.isFinite(xs[i]) || !Double.isFinite(ys[i])) {
                continue;
            }
            b.append(px(xPx(xs[i]))).append(',').append(px(yPx(ys[i]))).append(' ');
        }
    }

    private double[] range(boolean x) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        List<double[]> arrays = new ArrayList<>();
        for (Series s : series) {
            arrays.add(x ? s.x() : s.y());
        }
        for (Band band : bands) {
            arrays.add(x ? band.xLower() : band.yLower());
            arrays.add(x ? band.xUpper() : band.yUpper());
        }
        arrays.add(marks.stream().mapToDouble(m -> x ? m.x() : m.y()).toArray());
        for (double[] a : arrays) {
            for (double v : a) {
                if (Double.isFinite(v)) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        if (!(hi > lo)) {
            return new double[] {0, Double.isFinite(hi) && hi > 0 ? hi : 1};
        }
        return new double[] {lo, hi};
    }

    static String px(double v) {
        return Num.fixed(v, 1);
    }

    /** A linear axis with "nice" ticks (1, 2, 2.5 or 5 times a power of ten). */
    static final class Axis {
        final double lo;
        final double hi;
        final double step;

        private Axis(double lo, double hi, double step) {
            this.lo = lo;
            this.hi = hi;
            this.step = step;
        }

        static Axis of(double min, double max) {
            double step = nice((max - min) / 5);
            double lo = Math.floor(min / step + 1e-9) * step;
            double hi = Math.ceil(max / step - 1e-9) * step;
            if (hi <= lo) {
                hi = lo + step;
            }
            return new Axis(lo, hi, step);
        }

        static double nice(double raw) {
            double p = Math.pow(10, Math.floor(Math.log10(raw)));
            double m = raw / p;
            double n = m <= 1 ? 1 : m <= 2 ? 2 : m <= 2.5 ? 2.5 : m <= 5 ? 5 : 10;
            return n * p;
        }

        List<Double> ticks() {
            List<Double> t = new ArrayList<>();
            long n = Math.round((hi - lo) / step);
            for (long i = 0; i <= n; i++) {
                t.add(lo + i * step);
            }
            return t;
        }

        String label(double v) {
            if (Math.abs(v) < step * 1e-6) {
                return "0";
            }
            int decimals = 0;
            if (step < 1) {
                double e = Math.floor(Math.log10(step));
                double scaled = step / Math.pow(10, e);
                decimals = (int) -e + (Math.abs(scaled - Math.rint(scaled)) > 1e-9 ? 1 : 0);
            } else if (Math.abs(step - Math.rint(step)) > 1e-9) {
                decimals = 1;
            }
            return Num.fixed(v, decimals);
        }
    }
}
