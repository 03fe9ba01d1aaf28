package org.protolyte.report;

/**
 * The HTML report's style sheet: system fonts only, status by word and by a colour of the project's own, and a print
 * style for A4 and Letter (each document from a new page, the caution at the foot of every printed page).
 */
final class HtmlStyle {

    private HtmlStyle() {
    }

    /** The style sheet, the caution in the foot margin of every printed page (a CSS page-margin box). */
    static String css() {
        return CSS + "@page { margin: 16mm 14mm 22mm; @bottom-center { content: \"" + RunReport.CAUTION.replace("\\", "\\\\")
                .replace("\"", "\\\"") + "\"; font-size: 8pt; font-family: sans-serif; border-top: 1px solid #1d232a; } }\n";
    }

    private static final String CSS = """
            :root { --ink: #1d232a; --muted: #58616b; --rule: #c9ced4; --band: #eef1f4;
              --pass: #1f6b45; --fail: #a1262b; --indeterminate: #8a5300; --invalid: #5b3a8e; --fault: #3f3f3f; }
            * { box-sizing: border-box; }
            body { font-family: system-ui, -apple-system, "Segoe UI", Roboto, "Noto Sans", "Liberation Sans", sans-serif;
              color: var(--ink); margin: 0 auto; max-width: 64rem; padding: 1rem 1.5rem; line-height: 1.4; }
            h1 { font-size: 1.4rem; margin: 0.2rem 0; }
            h2 { font-size: 1.15rem; margin: 0; word-break: break-all; }
            h3 { font-size: 1rem; margin: 1.2rem 0 0.4rem; border-bottom: 1px solid var(--rule); }
            h4 { font-size: 0.95rem; margin: 0.3rem 0; font-weight: 600; }
            code { font-family: ui-monospace, "DejaVu Sans Mono", "Liberation Mono", monospace; font-size: 0.9em; }
            header.run, footer.run { border-bottom: 2px solid var(--ink); padding-bottom: 0.5rem; }
            footer.run { border-top: 2px solid var(--ink); border-bottom: none; margin-top: 2rem; }
            .caution { font-weight: 600; border-left: 4px solid var(--ink); padding: 0.2rem 0.6rem; background: var(--band); }
            section.document { margin-top: 2rem; }
            section.document > header { display: flex; justify-content: space-between; align-items: center; gap: 1rem; }
            .status { font-weight: 700; letter-spacing: 0.05em; padding: 0.15rem 0.6rem; border: 2px solid; margin: 0;
              border-radius: 0.2rem; }
            .status[data-status="pass"] { color: var(--pass); }
            .status[data-status="fail"] { color: var(--fail); }
            .status[data-status="indeterminate"] { color: var(--indeterminate); }
            .status[data-status="invalid"] { color: var(--invalid); }
            .status[data-status="fault"] { color: var(--fault); }
            dl.identity { display: grid; grid-template-columns: max-content 1fr; gap: 0.1rem 1rem; margin: 0.6rem 0; }
            dl.identity dt { color: var(--muted); }
            dl.identity dd { margin: 0; overflow-wrap: anywhere; }
            table { border-collapse: collapse; width: 100%; margin: 0.4rem 0; font-size: 0.9rem; }
            caption { text-align: left; color: var(--muted); padding-bottom: 0.2rem; }
            th, td { border-bottom: 1px solid var(--rule); padding: 0.2rem 0.4rem; text-align: left; vertical-align: top; }
            th { background: var(--band); font-weight: 600; }
            td.number { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
            .setpoint { font-size: 1.05rem; border: 1px solid var(--ink); padding: 0.3rem 0.6rem; }
            figure.plot { margin: 1rem 0; break-inside: avoid; page-break-inside: avoid; }
            figure.plot svg { width: 100%; height: auto; max-width: 40rem; display: block; }
            figcaption { color: var(--muted); font-size: 0.85rem; }
            details.plot-data summary { cursor: pointer; font-size: 0.85rem; color: var(--muted); }
            article.finding { border-left: 4px solid var(--rule); padding: 0.1rem 0.7rem; margin: 0.6rem 0; }
            article.finding[data-severity="error"] { border-left-color: var(--fail); }
            article.finding[data-severity="warning"] { border-left-color: var(--indeterminate); }
            .severity { text-transform: uppercase; font-size: 0.8rem; letter-spacing: 0.05em; }
            .place { color: var(--muted); font-weight: 400; font-size: 0.85rem; }
            .safety { border: 1px dashed var(--ink); padding: 0.2rem 0.5rem; }
            .references { font-size: 0.85rem; color: var(--muted); }
            @media print {
              body { max-width: none; padding: 0; font-size: 10pt; }
              section.document ~ section.document { break-before: page; page-break-before: always; margin-top: 0; }
              h3, h4 { break-after: avoid; page-break-after: avoid; }
              tr { break-inside: avoid; page-break-inside: avoid; }
              figure.plot svg { max-width: 15cm; }

              details.plot-data { display: none; }
              a { color: inherit; text-decoration: none; }
              th { background: none; }
              .caution, .status { background: none; }
            }
            """;
}
