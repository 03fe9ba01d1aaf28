package org.protolyte.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;

import org.protolyte.Protolyte;
import org.protolyte.document.DocumentException;
import org.protolyte.document.Problem;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.JsonRenderer;
import org.protolyte.report.RunReport;
import org.protolyte.report.TextRenderer;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.SubstanceLibrary;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code protolyte check FILE...}: checks formulation documents and reports. */
@Command(name = "check", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Checks formulation documents.%nExit codes: 0 pass, 1 fail, 2 invalid input or usage, "
                + "3 indeterminate, 4 internal fault; with several files, the highest.")
public final class CheckCommand implements Callable<Integer> {

    enum Format { text, json }

    @Parameters(arity = "1..*", paramLabel = "FILE", description = "Formulation documents (JSON).")
    List<Path> files = new ArrayList<>();

    @Option(names = "--format", paramLabel = "FORMAT", description = "text (default) or json.")
    Format format = Format.text;

    @Option(names = "--substances", paramLabel = "FILE",
            description = "A user substance library that extends the shipped one (repeatable).")
    List<Path> substances = new ArrayList<>();

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
            description = "Write the report to FILE (atomically) instead of standard output.")
    Path output;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        PrintWriter err = spec.commandLine().getErr();
        if (output != null && !Files.isDirectory(output.toAbsolutePath().getParent())) {
            err.println("protolyte: cannot write the report to " + output + ": its folder does not exist");
            return 2;
        }
        SchemaCatalog schemas = new SchemaCatalog();
        SubstanceLibrary library;
        try {
            LibraryLoader loader = new LibraryLoader(schemas).addShipped();
            for (Path p : substances) {
                if (!Files.isRegularFile(p)) {
                    err.println("protolyte: substance library " + p + ": file not found");
                    return 2;
                }
                loader.add(p.toString(), Files.readAllBytes(p), true);
            }
            library = loader.build();
        } catch (DocumentException e) {
            for (Problem p : e.problems()) {
                err.println("protolyte: substance library: " + p);
            }
            return 2;
        }
        RunReport run = new Protolyte(schemas, library).check(files);
        String text = format == Format.json ? new JsonRenderer().render(run) : new TextRenderer().render(run);
        if (output == null) {
            PrintWriter out = spec.commandLine().getOut();
            out.print(text);
            out.flush();
        } else {
            try {
                writeAtomically(output, text);
            } catch (IOException e) {
                err.println("protolyte: cannot write the report to " + output + ": " + e.getMessage());
                return 2;
            }
        }
        return run.exitCode();
    }

    /** Writes to a temporary file beside the target, then moves it into place: never a half-written report. */
    static void writeAtomically(Path target, String text) throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        Path tmp = Files.createTempFile(dir, "." + target.getFileName(), ".tmp");
        try {
            Files.writeString(tmp, text, StandardCharsets.UTF_8);
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
