package org.protolyte.api;

/** The report formats a {@link Result} renders to. */
public enum Format {
    /** For a terminal 100 columns wide. */
    TEXT,
    /** Machine-readable, per {@code schemas/report.schema.json}. */
    JSON,
    /** SARIF 2.1.0, for code-review platforms. */
    SARIF,
    /** One self-contained HTML file with the weigh sheet and, from a validator built with plots, the plots. */
    HTML
}
