package org.protolyte.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.util.Optional;
import java.util.function.Consumer;

import org.protolyte.units.Quantity;

/**
 * Writes a run's report in one format as its documents come: the header, each document's part as soon as it is made,
 * then the footer with the summary. The command line and the library's API write every report through here, so the
 * same run gives the same bytes whichever way it was asked for.
 */
public final class RunWriter {

    /** The report formats. */
    public enum Format { TEXT, JSON, SARIF, HTML }

    /** Hands each document's report, in order, to the consumer it is given; the summary counts them. */
    public interface Reports {
        void each(Consumer<DocumentReport> report);
    }

    private final Format format;
    private final boolean allSpecies;
    private final Optional<Quantity> batchSize;

    /**
     * @param allSpecies in text, every form of every system (--species all)
     * @param batchSize  the batch the weigh sheets also give amounts for (--batch-size)
     */
    public RunWriter(Format format, boolean allSpecies, Optional<Quantity> batchSize) {
        this.format = format;
        this.allSpecies = allSpecies;
        this.batchSize = batchSize;
    }

    /** Writes the whole report; a write that fails comes out as the IOException it was. */
    public void write(Writer out, RunSummary summary, Reports reports) throws IOException {
        try {
            switch (format) {
                case JSON -> {
                    JsonRenderer.Stream json = new JsonRenderer(batchSize).begin(out, summary);
                    reports.each(r -> io(() -> json.document(r)));
                    json.end(summary);
                }
                case SARIF -> {
                    SarifRenderer.Log sarif = new SarifRenderer().begin(out);
                    reports.each(r -> io(() -> sarif.document(r)));
                    sarif.end(summary);
                }
                case HTML -> {
                    HtmlRenderer.Page page = new HtmlRenderer(batchSize).begin(out, summary);
                    reports.each(r -> io(() -> page.document(r)));
                    page.end(summary);
                }
                case TEXT -> {
                    TextRenderer text = new TextRenderer(allSpecies, batchSize);
                    out.write(text.header(summary.toolVersion(), summary.asOf(), summary.plugins()));
                    reports.each(r -> io(() -> out.write(text.document(r))));
                    out.write(text.footer(summary.skipped(), summary.documents(), summary::count));
                }
            }
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }

    /** A run held in memory: each report added to the summary as it is written. */
    public void write(Writer out, RunSummary summary, java.util.List<DocumentReport> documents) throws IOException {
        write(out, summary, each -> documents.forEach(r -> {
            summary.add(r);
            each.accept(r);
        }));
    }

    private interface IoAction {
        void run() throws IOException;
    }

    private static void io(IoAction a) {
        try {
            a.run();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
