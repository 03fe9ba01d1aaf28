package org.protolyte.api;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.util.List;
import java.util.Map;

import org.protolyte.report.RunSummary;
import org.protolyte.report.RunWriter;
import org.protolyte.report.Skipped;

/**
 * A check of files and folders, as {@code protolyte check FILE_OR_FOLDER...} makes it: one result per document in
 * order of relative path, the files a folder's ignore file or an exclusion left out (each with the rule that did it),
 * and the report of the whole run with the command line's bytes.
 */
public final class Run {

    /** A file found in a folder and not checked, with the rule that passed it over. */
    public record Skip(String source, String reason) {
    }

    private final List<Result> results;
    private final List<Skipped> skipped;
    private final RunSummary summary;

    Run(List<Result> results, List<Skipped> skipped, RunSummary summary) {
        this.results = List.copyOf(results);
        this.skipped = List.copyOf(skipped);
        this.summary = summary;
    }

    public List<Result> results() {
        return results;
    }

    public List<Skip> skipped() {
        return skipped.stream().map(s -> new Skip(s.source(), s.reason())).toList();
    }

    /** The command line's exit code for this run: its worst document's (0 for none). */
    public int exitCode() {
        return results.stream().mapToInt(Result::exitCode).max().orElse(0);
    }

    /** How many documents have each status. */
    public Map<Status, Long> counts() {
        Map<Status, Long> out = new java.util.EnumMap<>(Status.class);
        for (Status s : Status.values()) {
            out.put(s, results.stream().filter(r -> r.status() == s).count());
        }
        return out;
    }

    /** The run's report in a format. */
    public String render(Format format) {
        return written(out -> render(format, out));
    }

    /** Writing a report somewhere. */
    interface Rendering {
        void to(Writer out) throws IOException;
    }

    /** What a rendering writes, as a string. */
    static String written(Rendering r) {
        StringWriter out = new StringWriter();
        try {
            r.to(out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);      // a StringWriter does not throw
        }
        return out.toString();
    }

    public void render(Format format, Writer out) throws IOException {
        RunSummary run = new RunSummary(summary.toolVersion(), summary.generatedAt(), summary.libraryFiles(),
                summary.plugins(), java.util.Optional.empty());
        skipped.forEach(run::skip);
        new RunWriter(RunWriter.Format.valueOf(format.name()), false, java.util.Optional.empty())
                .write(out, run, results.stream().map(Result::report).toList());
    }
}
