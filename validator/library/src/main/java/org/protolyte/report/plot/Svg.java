package org.protolyte.report.plot;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;

/**
 * Draws a {@link Plot}. The plot area is fixed, {@value #LEFT} to {@value #WIDTH} − {@value #RIGHT} across and
 * {@value #TOP} to {@value #HEIGHT} − {@value #BOTTOM} down, so plots of one report line up; the legend goes
 * below, one row per {@value #COLUMNS} entries, and makes the picture taller. Styles are attributes, classes
 * only name the parts.
 */
final class Svg {

    static final int WIDTH = 640;
    static final int HEIGHT = 400;
    static final int LEFT = 72;
    static final int RIGHT = 16;
    static final int TOP = 16;
    static final int BOTTOM = 56;
    static final int PLOT_W = WIDTH - LEFT - RIGHT;
    static final int PLOT_H = HEIGHT - TOP - BOTTOM;
    static final int ROW = 18;
    static final int COLUMNS = 2;
    /** Dark colours of distinct luminance, so that lines stay apart in grey; the dash pattern comes on top. */
    static final String[] PALETTE = {"#1f2a44", "#b2452a", "#5b3a8c", "#3f8a6b"};
    private static final String INK = "#222222";
    private static final String GRID = "#dddddd";
    /** Light grey at low opacity: overlapping bands stay readable, no pattern needed. */
    private static final String BAND = "fill=\"#808080\" fill-opacity=\"0.2\"";
    private static final String RULE = "#555555";
    /** Characters of a label inside the plot or in a legend column, and of an axis label; the table keeps all. */
    private static final int LABEL_CHARS = 40;
    private static final int AXIS_CHARS = 80;

    private final Plot p;
    private final StringBuilder out = new StringBuilder(4096);

    Svg(Plot p) {
        this.p = p;
    }

    String render(String id) {
        int entries = p.lines.size() + p.bands.size() + p.markers.size() + p.marks.size();
        int rows = (entries + COLUMNS - 1) / COLUMNS;
        int height = HEIGHT + rows * ROW + (rows > 0 ? 8 : 0);
        out.append("<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 ").append(WIDTH).append(' ')
                .append(height).append("\" width=\"100%\" role=\"img\" aria-labelledby=\"").append(id)
                .append("-title ").append(id).append("-desc\" font-family=\"sans-serif\" font-size=\"12\" fill=\"")
                .append(INK).append("\">");
        out.append("<title id=\"").append(id).append("-title\">").append(Format.text(p.title)).append("</title>");
        out.append("<desc id=\"").append(id).append("-desc\">").append(Format.text(p.summary())).append("</desc>");
        grid();
        bands();
        axes();
        marks();
        boolean drawn = false;
        for (int i = 0; i < p.lines.size(); i++) {
            drawn |= line(i);
        }
        markers();
        legend();
        if (!drawn) {
            text("no-data", LEFT + PLOT_W / 2.0, TOP + PLOT_H / 2.0, "middle", "no data");
        }
        return out.append("</svg>").toString();
    }

    private double px(double u) {
        return LEFT + u * PLOT_W;
    }

    private double py(double v) {
        return TOP + PLOT_H - v * PLOT_H;
    }

    private String xy(double u, double v) {
        return Format.coordinate(px(u)) + " " + Format.coordinate(py(v));
    }

    private void grid() {
        StringBuilder d = new StringBuilder();
        for (BigDecimal t : p.x.ticks()) {
            d.append('M').append(xy(p.x.fraction(t.doubleValue()), 0)).append('V').append(TOP);
        }
        for (BigDecimal t : p.y.ticks()) {
            d.append('M').append(xy(0, p.y.fraction(t.doubleValue()))).append('H').append(LEFT + PLOT_W);
        }
        out.append("<path class=\"grid\" fill=\"none\" stroke=\"").append(GRID).append("\" d=\"").append(d)
                .append("\"/>");
    }

    private void axes() {
        out.append("<rect class=\"frame\" x=\"").append(LEFT).append("\" y=\"").append(TOP).append("\" width=\"")
                .append(PLOT_W).append("\" height=\"").append(PLOT_H).append("\" fill=\"none\" stroke=\"")
                .append(INK).append("\"/>");
        out.append("<g class=\"x-axis\">");
        StringBuilder d = new StringBuilder();
        for (BigDecimal t : p.x.ticks()) {
            double u = p.x.fraction(t.doubleValue());
            d.append('M').append(xy(u, 0)).append("v5");
            text("tick-label", px(u), TOP + PLOT_H + 18, "middle", Format.decimal(t));
        }
        ticks(d);
        text("axis-label", LEFT + PLOT_W / 2.0, TOP + PLOT_H + 44, "middle", p.x.title(), AXIS_CHARS);
        out.append("</g><g class=\"y-axis\">");
        d.setLength(0);
        for (BigDecimal t : p.y.ticks()) {
            double v = p.y.fraction(t.doubleValue());
            d.append('M').append(xy(0, v)).append("h-5");
            text("tick-label", LEFT - 8, py(v) + 4, "end", Format.decimal(t));
        }
        ticks(d);
        out.append("<text class=\"axis-label\" text-anchor=\"middle\" transform=\"translate(20 ")
                .append(Format.coordinate(TOP + PLOT_H / 2.0)).append(") rotate(-90)\">")
                .append(Format.text(Format.fit(p.y.title(), AXIS_CHARS * PLOT_H / PLOT_W))).append("</text></g>");
    }

    private void ticks(StringBuilder d) {
        out.append("<path class=\"ticks\" stroke=\"").append(INK).append("\" d=\"").append(d).append("\"/>");
    }

    private void bands() {
        for (Plot.Band b : p.bands) {
            Axis a = b.vertical() ? p.x : p.y;
            double from = Math.max(0, a.fraction(b.from()));
            double to = Math.min(1, a.fraction(b.to()));
            if (!(from < to)) {
                continue;                   // outside the axis, or a bound is not a number
            }
            double x = b.vertical() ? px(from) : LEFT;
            double y = b.vertical() ? TOP : py(to);
            double w = b.vertical() ? px(to) - px(from) : PLOT_W;
            double h = b.vertical() ? PLOT_H : py(from) - py(to);
            out.append("<g class=\"band\"><rect x=\"").append(Format.coordinate(x)).append("\" y=\"")
                    .append(Format.coordinate(y)).append("\" width=\"").append(Format.coordinate(w))
                    .append("\" height=\"").append(Format.coordinate(h)).append("\" ").append(BAND).append("/>");
            boolean above = !b.vertical() && y - 4 >= TOP + 12;       // a thin pH band reads best labelled above
            text("band-label", x + 4, above ? y - 4 : y + 13, "start", b.label());
            out.append("</g>");
        }
    }

    private void marks() {
        for (Plot.Mark m : p.marks) {
            double u = p.x.fraction(m.x());
            if (u >= 0 && u <= 1) {
                out.append("<g class=\"x-mark\"><path stroke=\"").append(RULE).append("\" d=\"M")
                        .append(xy(u, 0)).append('V').append(TOP).append("\"/>");
                boolean right = u > 0.5;
                text("mark-label", px(u) + (right ? -4 : 4), TOP + PLOT_H - 6, right ? "end" : "start", m.label());
                out.append("</g>");
            }
        }
    }

    /** Draws line {@code i}, one path per unbroken run; true if any of it is in the plot. */
    private boolean line(int i) {
        Plot.Line l = p.lines.get(i);
        List<String> runs = runs(l);
        out.append("<g class=\"series\" data-series=\"").append(i).append('"');
        stroke(i, l.stroke());
        out.append('>');
        for (String d : runs) {
            out.append("<path d=\"").append(d).append("\"/>");
        }
        out.append("</g>");
        return !runs.isEmpty();
    }

    private void stroke(int i, Stroke s) {
        out.append(" fill=\"none\" stroke=\"").append(PALETTE[i % PALETTE.length])
                .append("\" stroke-width=\"2\" stroke-linecap=\"round\" stroke-linejoin=\"round\"");
        if (!s.dashes.isEmpty()) {
            out.append(" stroke-dasharray=\"").append(s.dashes).append('"');
        }
    }

    /**
     * The path data of each unbroken run of a line, clipped to the plot area. A run ends at a missing value
     * and where the line leaves the area; a lone point between gaps is a dot.
     */
    private List<String> runs(Plot.Line l) {
        List<String> runs = new ArrayList<>();
        StringBuilder run = null;
        for (int i = 0; i < l.xs().length; i++) {
            double[] b = at(l, i);
            double[] a = i > 0 ? at(l, i - 1) : null;
            double[] s = a != null && b != null ? Clip.segment(a[0], a[1], b[0], b[1]) : null;
            if (s == null) {
                end(runs, run);
                run = null;
                boolean alone = a == null && (i + 1 == l.xs().length || at(l, i + 1) == null);
                if (alone && Clip.inside(b)) {
                    runs.add("M" + xy(b[0], b[1]) + "h0");
                }
                continue;
            }
            if (run == null) {                  // an open run ends inside at a, so this segment starts there
                run = new StringBuilder("M").append(xy(s[0], s[1]));
            }
            run.append('L').append(xy(s[2], s[3]));
            if (s[5] < 1) {
                end(runs, run);
                run = null;
            }
        }
        end(runs, run);
        return runs;
    }

    private static void end(List<String> runs, StringBuilder run) {
        if (run != null) {
            runs.add(run.toString());
        }
    }

    /** Point {@code i} as fractions of the axes, or null where it has no usable value. */
    private double[] at(Plot.Line l, int i) {
        double u = p.x.fraction(l.xs()[i]);
        double v = p.y.fraction(l.ys()[i]);
        return Clip.usable(u) && Clip.usable(v) ? new double[] {u, v} : null;
    }

    private void markers() {
        for (int i = 0; i < p.markers.size(); i++) {
            Plot.Marker m = p.markers.get(i);
            double[] uv = {p.x.fraction(m.x()), p.y.fraction(m.y())};
            if (Clip.inside(uv)) {
                out.append("<g class=\"marker\">");
                shape(i, px(uv[0]), py(uv[1]));
                boolean right = uv[0] > 0.5;
                text("marker-label", px(uv[0]) + (right ? -8 : 8), py(uv[1]) - 8, right ? "end" : "start",
                        m.label());
                out.append("</g>");
            }
        }
    }

    /** Marker {@code i}'s shape at (x, y): circle, square, triangle, diamond, then again. */
    private void shape(int i, double x, double y) {
        String c = Format.coordinate(x) + " " + Format.coordinate(y);
        String d = switch (i % 4) {
            case 0 -> "m-4.5 0a4.5 4.5 0 1 0 9 0a4.5 4.5 0 1 0 -9 0z";
            case 1 -> "m-4 -4h8v8h-8z";
            case 2 -> "m0 -5.5l5 9h-10z";
            default -> "m0 -5.5l5.5 5.5l-5.5 5.5l-5.5 -5.5z";
        };
        out.append("<path fill=\"").append(PALETTE[i % PALETTE.length]).append("\" stroke=\"#ffffff\" d=\"M")
                .append(c).append(d).append("\"/>");
    }

    private void legend() {
        out.append("<g class=\"legend\">");
        int k = 0;
        for (int i = 0; i < p.lines.size(); i++, k++) {
            out.append("<path");
            stroke(i, p.lines.get(i).stroke());
            out.append(" d=\"M").append(slot(k, 0, 0)).append("h24\"/>");
            legendText(k, p.lines.get(i).name());
        }
        for (Plot.Band b : p.bands) {
            out.append("<path ").append(BAND).append(" d=\"M").append(slot(k, 0, -5)).append("h24v10h-24z\"/>");
            legendText(k++, b.label());
        }
        for (int i = 0; i < p.markers.size(); i++, k++) {
            shape(i, slotX(k) + 12, slotY(k));
            legendText(k, p.markers.get(i).label());
        }
        for (Plot.Mark m : p.marks) {
            out.append("<path stroke=\"").append(RULE).append("\" d=\"M").append(slot(k, 12, -7))
                    .append("v14\"/>");
            legendText(k++, m.label());
        }
        out.append("</g>");
    }

    /** Where legend entry {@code k} starts, on its centre line. */
    private static double slotX(int k) {
        return LEFT + (double) (k % COLUMNS) * PLOT_W / COLUMNS;
    }

    private static double slotY(int k) {
        return HEIGHT + 9 + (k / COLUMNS) * ROW;
    }

    /** The point (dx, dy) from the start of legend entry {@code k}. */
    private static String slot(int k, double dx, double dy) {
        return Format.coordinate(slotX(k) + dx) + " " + Format.coordinate(slotY(k) + dy);
    }

    private void legendText(int k, String label) {
        text("legend-label", slotX(k) + 30, slotY(k) + 4, "start", label);
    }

    private void text(String cls, double x, double y, String anchor, String s) {
        text(cls, x, y, anchor, s, LABEL_CHARS);
    }

    private void text(String cls, double x, double y, String anchor, String s, int chars) {
        out.append("<text class=\"").append(cls).append("\" x=\"").append(Format.coordinate(x)).append("\" y=\"")
                .append(Format.coordinate(y)).append("\" text-anchor=\"").append(anchor).append("\">")
                .append(Format.text(Format.fit(s, chars))).append("</text>");
    }
}
