package org.protolyte.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;

import org.protolyte.Protolyte;
import org.protolyte.analysis.Robustness;
import org.protolyte.report.JsonRenderer;
import org.protolyte.report.RunReport;
import org.protolyte.report.RunSummary;
import org.protolyte.report.SarifRenderer;
import org.protolyte.report.TextRenderer;
import org.protolyte.rules.RuleBook;
import org.protolyte.rules.Severity;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code protolyte check FILE_OR_FOLDER...}: checks formulation documents and reports. */
@Command(name = "check", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Checks formulation documents. A folder means every *.json file below it, in order of "
                + "relative path; files there that are not formulation documents are skipped with a note.%n"
                + "Exit codes: 0 pass, 1 fail, 2 invalid input or usage, 3 indeterminate, 4 internal fault; "
                + "with several files, the highest.")
public final class CheckCommand implements Callable<Integer> {

    enum Format { text, json, sarif }

    @Parameters(arity = "1..*", paramLabel = "FILE", description = "Formulation documents (JSON), or folders.")
    List<Path> files = new ArrayList<>();

    @Option(names = "--format", paramLabel = "FORMAT", description = "text (default), json, or sarif (SARIF 2.1.0, for code-review platforms).")
    Format format = Format.text;

    @Option(names = "--fail-on", paramLabel = "SEVERITY",
            description = "Lowest finding severity that fails a document: error (default), warning or note.")
    Severity failOn = Severity.ERROR;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
            description = "Write the report to FILE (atomically) instead of standard output.")
    Path output;

    @Option(names = "--waivers", paramLabel = "FILE",
            description = "The waiver file QA holds: accepted findings, per document revision.")
    Path waivers;

    @Option(names = "--robustness", paramLabel = "SAMPLES",
            description = "Also run a robustness study of SAMPLES batches per document (seed fixed), so that "
                    + "batch-risk rules can judge it.")
    Integer robustnessSamples;

    @Mixin
    Setup setup;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        PrintWriter err = spec.commandLine().getErr();
        Severity threshold = failOn;
        if (output != null && !Files.isDirectory(output.toAbsolutePath().getParent())) {
            err.println("protolyte: cannot write the report to " + output + ": its folder does not exist");
            return 2;
        }
        Protolyte protolyte;
        try {
            RuleBook book = setup.ruleBook();
            protolyte = new Protolyte(setup.schemas, setup.library(), setup.checker(book), threshold,
                    setup.waivers(waivers, LocalDate.now()));
            if (robustnessSamples != null) {
                if (robustnessSamples < 10 || robustnessSamples > 1_000_000) {
                    err.println("protolyte: --robustness takes 10 to 1000000 samples");
                    return 2;
                }
                Robustness.Settings d = Robustness.Settings.defaults();
                protolyte = protolyte.withRobustness(new Robustness.Settings(robustnessSamples, d.seed(),
                        d.defaultTolerance(), d.meterStandardUncertainty()));
            }
        } catch (Setup.UsageException e) {
            return Setup.usage(err, e);
        }
        for (Path p : files) {
            if (Files.isDirectory(p) && Inputs.expand(List.of(p)).isEmpty()) {
                err.println("protolyte: " + p + ": no *.json files below this folder");
                return 2;
            }
        }
        List<Protolyte.Input> inputs = Inputs.expand(files);
        if (format == Format.sarif) {
            RunReport run = protolyte.checkInputs(inputs);
            return emit(new SarifRenderer().render(run), err) ? run.exitCode() : 2;
        }
        // text and JSON are streamed: one document at a time, so an archive fits a small heap
        Path tmp = output == null ? null : Files.createTempFile(output.toAbsolutePath().getParent(),
                "." + output.getFileName(), ".tmp");
        Writer out = tmp == null ? spec.commandLine().getOut() : Files.newBufferedWriter(tmp, StandardCharsets.UTF_8);
        try {
            RunSummary summary = protolyte.newSummary();
            if (format == Format.json) {
                JsonRenderer.Stream json = new JsonRenderer().begin(out, summary);
                protolyte.stream(inputs, summary, r -> write(() -> json.document(r)));
                json.end(summary);
            } else {
                TextRenderer text = new TextRenderer();
                out.write(text.header(summary.toolVersion()));
                protolyte.stream(inputs, summary, r -> write(() -> out.write(text.document(r))));
                out.write(text.footer(summary.skipped(), summary.documents(), summary::count));
            }
            out.flush();
            if (tmp != null) {
                out.close();
                move(tmp, output);
            }
            return summary.exitCode();
        } catch (IOException | UncheckedIOException e) {
            err.println("protolyte: cannot write the report" + (output == null ? "" : " to " + output) + ": "
                    + e.getMessage());
            return 2;
        } finally {
            if (tmp != null) {
                out.close();
                Files.deleteIfExists(tmp);
            }
        }
    }

    private interface IoAction {
        void run() throws IOException;
    }

    private static void write(IoAction a) {
        try {
            a.run();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private boolean emit(String text, PrintWriter err) {
        if (output == null) {
            PrintWriter out = spec.commandLine().getOut();
            out.print(text);
            out.flush();
            return true;
        }
        try {
            writeAtomically(output, text);
            return true;
        } catch (IOException e) {
            err.println("protolyte: cannot write the report to " + output + ": " + e.getMessage());
            return false;
        }
    }

    private static void move(Path tmp, Path target) throws IOException {
        try {
            Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            // caught: a file system without atomic rename still gets the report, by a plain replacing move
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /** Writes to a temporary file beside the target, then moves it into place: never a half-written report. */
    static void writeAtomically(Path target, String text) throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        Path tmp = Files.createTempFile(dir, "." + target.getFileName(), ".tmp");
        try {
            Files.writeString(tmp, text, StandardCharsets.UTF_8);
            move(tmp, target);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
