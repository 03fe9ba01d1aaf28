package org.protolyte.report.plot;

/** The dash pattern of a line, so that lines stay apart in grey-scale print. */
public enum Stroke {
    SOLID(""),
    DASHED("8 5"),
    DOTTED("1 4"),
    DASH_DOT("8 4 1 4");

    /** The SVG stroke-dasharray in user units; empty for a solid line. */
    final String dashes;

    Stroke(String dashes) {
        this.dashes = dashes;
    }
}
