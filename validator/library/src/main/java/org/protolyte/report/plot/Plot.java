package org.protolyte.report.plot;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * A plot for the HTML report: lines over two linear axes, with shaded bands, labelled points and labelled
 * vertical rules. Immutable: each adding method returns a new plot. Non-finite values are no values: a gap in
 * a line, nothing drawn for a band or point, "—" in the table. {@link #svg} draws it; {@link #table} gives the
 * same numbers as text.
 */
public final class Plot {

    record Line(String name, double[] xs, double[] ys, Stroke stroke) {
    }

    /** A band across the plot: of x values when {@code vertical}, else of y values. */
    record Band(String label, boolean vertical, double from, double to) {
    }

    record Marker(String label, double x, double y) {
    }

    record Mark(String label, double x) {
    }

    /** The text alternative: a header and rows of cells, not yet escaped for HTML. */
    public record Table(List<String> header, List<List<String>> rows) {
    }

    final String title;
    final Axis x;
    final Axis y;
    final List<Line> lines;
    final List<Band> bands;
    final List<Marker> markers;
    final List<Mark> marks;

    private Plot(String title, Axis x, Axis y, List<Line> lines, List<Band> bands, List<Marker> markers,
            List<Mark> marks) {
        this.title = title;
        this.x = x;
        this.y = y;
        this.lines = List.copyOf(lines);
        this.bands = List.copyOf(bands);
        this.markers = List.copyOf(markers);
        this.marks = List.copyOf(marks);
    }

    public static Plot of(String title, Axis x, Axis y) {
        return new Plot(Objects.requireNonNull(title, "title"), Objects.requireNonNull(x, "x"),
                Objects.requireNonNull(y, "y"), List.of(), List.of(), List.of(), List.of());
    }

    /** The plot's title, as given: the SVG's accessible name; the page shows it in the figure's caption. */
    public String title() {
        return title;
    }

    /** A line through (xs[i], ys[i]) in the order given. */
    public Plot line(String name, double[] xs, double[] ys, Stroke stroke) {
        if (xs.length != ys.length) {
            throw new IllegalArgumentException(name + ": " + xs.length + " x values, " + ys.length + " y values");
        }
        Line l = new Line(Objects.requireNonNull(name, "name"), xs.clone(), ys.clone(),
                Objects.requireNonNull(stroke, "stroke"));
        return new Plot(title, x, y, plus(lines, l), bands, markers, marks);
    }

    /** A shaded band of y values, e.g. a pH target. */
    public Plot yBand(String label, double from, double to) {
        return new Plot(title, x, y, lines, plus(bands, band(label, false, from, to)), markers, marks);
    }

    /** A shaded band of x values, e.g. the temperatures the constants were measured at. */
    public Plot xBand(String label, double from, double to) {
        return new Plot(title, x, y, lines, plus(bands, band(label, true, from, to)), markers, marks);
    }

    /** A labelled point. */
    public Plot marker(String label, double atX, double atY) {
        Marker m = new Marker(Objects.requireNonNull(label, "label"), atX, atY);
        return new Plot(title, x, y, lines, bands, plus(markers, m), marks);
    }

    /** A labelled vertical rule, e.g. the temperature of a condition. */
    public Plot xMark(String label, double atX) {
        return new Plot(title, x, y, lines, bands, markers, plus(marks, new Mark(Objects.requireNonNull(label), atX)));
    }

    /**
     * The plot as an inline SVG element for an HTML5 page. {@code id} must be unique in the page; the title and
     * description get the ids {@code id-title} and {@code id-desc}.
     */
    public String svg(String id) {
        if (!id.matches("[A-Za-z][A-Za-z0-9_-]*")) {
            throw new IllegalArgumentException("not an id: " + id);
        }
        return new Svg(this).render(id);
    }

    /** One row per point of each line (in order), then one per band, marker and vertical rule. */
    public Table table() {
        List<List<String>> rows = new ArrayList<>();
        for (Line l : lines) {
            for (int i = 0; i < l.xs.length; i++) {
                rows.add(List.of(l.name, Format.number(l.xs[i]), Format.number(l.ys[i])));
            }
        }
        for (Band b : bands) {
            String range = Format.number(b.from) + " to " + Format.number(b.to);
            rows.add(b.vertical ? List.of(b.label, range, "") : List.of(b.label, "", range));
        }
        for (Marker m : markers) {
            rows.add(List.of(m.label, Format.number(m.x), Format.number(m.y)));
        }
        for (Mark m : marks) {
            rows.add(List.of(m.label, Format.number(m.x), ""));
        }
        return new Table(List.of("item", x.title(), y.title()), List.copyOf(rows));
    }

    /** The picture in words, for the SVG's description. */
    String summary() {
        StringBuilder b = new StringBuilder().append(y.title()).append(" against ").append(x.title())
                .append("; x from ").append(Format.number(x.lo())).append(" to ").append(Format.number(x.hi()))
                .append(", y from ").append(Format.number(y.lo())).append(" to ").append(Format.number(y.hi()))
                .append('.');
        list(b, "Lines", lines.stream().map(Line::name).toList());
        list(b, "Bands", bands.stream().map(Band::label).toList());
        list(b, "Points", markers.stream().map(Marker::label).toList());
        list(b, "Rules", marks.stream().map(Mark::label).toList());
        return b.toString();
    }

    private static void list(StringBuilder b, String what, List<String> names) {
        if (!names.isEmpty()) {
            b.append(' ').append(what).append(": ").append(String.join(", ", names)).append('.');
        }
    }

    private static Band band(String label, boolean vertical, double from, double to) {
        return new Band(Objects.requireNonNull(label, "label"), vertical, Math.min(from, to), Math.max(from, to));
    }

    private static <T> List<T> plus(List<T> list, T item) {
        List<T> more = new ArrayList<>(list);
        more.add(item);
        return more;
    }
}
