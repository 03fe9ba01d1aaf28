package org.protolyte.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.protolyte.Inputs;
import org.protolyte.Protolyte;
import org.protolyte.analysis.Robustness;
import org.protolyte.report.RunSummary;
import org.protolyte.report.RunWriter;
import org.protolyte.rules.RuleBook;
import org.protolyte.rules.Severity;
import org.protolyte.report.Printable;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code protolyte check FILE_OR_FOLDER...}: checks formulation documents and reports. */
@Command(name = "check", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Checks formulation documents. A folder means every *.json file below it, in order of "
                + "relative path; a file there must be a formulation, a batch record or a known companion (substance "
                + "library, rule pack, waiver file), or be excluded by --exclude or the folder's " + Protolyte.IGNORE_FILE
                + "; '-' reads standard input.%n"
                + "Exit codes: 0 pass, 1 fail, 2 invalid input or usage, 3 indeterminate, 4 internal fault; "
                + "with several files, the highest.")
public final class CheckCommand implements Callable<Integer> {

    enum Format { text, json, sarif, html }

    @Parameters(arity = "1..*", paramLabel = "FILE", description = "Formulation documents or batch records (JSON), "
            + "folders, or '-' for standard input.")
    List<Path> files = new ArrayList<>();

    @Option(names = "--format", paramLabel = "FORMAT", description = "text (default), json, sarif (SARIF 2.1.0, for "
            + "code-review platforms), or html (one self-contained file with the weigh sheet and plots, to print or attach).")
    Format format = Format.text;

    @Option(names = "--batch-size", paramLabel = "SIZE", converter = BatchSize.class,
            description = "Also give the weigh sheet's amounts for a batch of SIZE, e.g. 250L (a final-volume basis) or "
                    + "50kg (of water, for a water-mass basis).")
    org.protolyte.units.Quantity batchSize;

    @Option(names = "--curves", description = "With --format json: also the points behind each plot of the HTML report.")
    boolean curves;

    /** A volume or mass with its unit, e.g. 250L or 2.5 kg; anything else is a usage error that says so. */
    static final class BatchSize implements CommandLine.ITypeConverter<org.protolyte.units.Quantity> {
        @Override
        public org.protolyte.units.Quantity convert(String text) {
            try {
                org.protolyte.units.Quantity q = org.protolyte.units.Quantity.parse(text).require("a batch size",
                        org.protolyte.units.Dimension.VOLUME, org.protolyte.units.Dimension.MASS);
                if (!(q.value() > 0)) {
                    throw new CommandLine.TypeConversionException("a batch size must be more than zero, not '" + text + "'");
                }
                return q;
            } catch (org.protolyte.units.UnitException e) {
                throw new CommandLine.TypeConversionException(e.getMessage());
            }
        }
    }

    @Option(names = "--species", paramLabel = "WHICH",
            description = "Forms per condition in the text report: main (default: the systems that carry 95 % of the "
                    + "buffer capacity, two forms each) or all.")
    SpeciesShown species = SpeciesShown.main;

    enum SpeciesShown { main, all }

    @Option(names = "--fail-on", paramLabel = "SEVERITY",
            description = "Lowest finding severity that fails a document: error (default), warning or note.")
    Severity failOn = Severity.ERROR;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
            description = "Write the report to FILE (atomically) instead of standard output.")
    Path output;

    @Option(names = "--waivers", paramLabel = "FILE",
            description = "The waiver file QA holds: accepted findings, per document revision.")
    Path waivers;

    @Option(names = "--as-of", paramLabel = "DATE", converter = IsoDate.class,
            description = "The run date (YYYY-MM-DD) for waiver approval and expiry, e.g. to re-check an archive "
                    + "as of its release (default: today).")
    LocalDate asOf;

    /** A calendar date as YYYY-MM-DD (ISO 8601); anything else is a usage error that says so. */
    static final class IsoDate implements CommandLine.ITypeConverter<LocalDate> {
        @Override
        public LocalDate convert(String text) {
            try {
                return LocalDate.parse(text);
            } catch (java.time.format.DateTimeParseException e) {
                throw new CommandLine.TypeConversionException("'" + text + "' is not a calendar date written as "
                        + "YYYY-MM-DD (" + e.getMessage().replaceFirst("^Text '.*' could not be parsed:? ?", "") + ")");
            }
        }
    }

    @Option(names = "--exclude", paramLabel = "GLOB",
            description = "Leave out files found in a folder whose path below it matches GLOB (repeatable; as a "
                    + "line of the folder's " + Protolyte.IGNORE_FILE + ").")
    List<String> excludes = new ArrayList<>();

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
        Protolyte protolyte;
        Inputs.Found found;
        Optional<ReportFile> target;
        try {
            RuleBook book = setup.ruleBook();
            protolyte = new Protolyte(setup.schemas, setup.library(), setup.checker(book), failOn,
                    setup.waivers(waivers, asOf == null ? LocalDate.now() : asOf));
            if (robustnessSamples != null) {
                if (robustnessSamples < 10 || robustnessSamples > 1_000_000) {
                    throw new Setup.UsageException("--robustness takes 10 to 1000000 samples");
                }
                Robustness.Settings d = Robustness.Settings.defaults();
                protolyte = protolyte.withRobustness(new Robustness.Settings(robustnessSamples, d.seed(),
                        d.defaultTolerance(), d.meterStandardUncertainty()));
            }
            if (curves || format == Format.html) {
                protolyte = protolyte.withCurves();
            }
            try {
                found = Inputs.expand(files, excludes, System.in);
            } catch (Inputs.Unusable e) {
                throw new Setup.UsageException(e.getMessage());
            }
            target = output == null ? Optional.empty() : Optional.of(ReportFile.of(output, readBy(found)));
        } catch (Setup.UsageException e) {
            return Setup.usage(err, e);
        }
        Protolyte run = protolyte;
        ReportFile.Body body = out -> report(run, found, out);
        if (target.isEmpty()) {
            PrintWriter out = spec.commandLine().getOut();
            int exit = body.write(out);
            out.flush();
            return exit;
        }
        try {
            return target.get().write(body);
        } catch (IOException | UncheckedIOException e) {
            err.println("protolyte: cannot write the report to " + Printable.text(output + ": "
                    + (e instanceof UncheckedIOException u ? u.getCause().getMessage() : e.getMessage())));
            return 2;
        }
    }

    /** Every file the run reads: the report must never replace one of them. */
    private List<Path> readBy(Inputs.Found found) {
        List<Path> all = new ArrayList<>(setup.files());
        if (waivers != null) {
            all.add(waivers);
        }
        found.inputs().forEach(i -> i.path().ifPresent(all::add));
        return all;
    }

    /** One code path for every format: each document's report is written as soon as it is made. */
    private int report(Protolyte protolyte, Inputs.Found found, Writer out) throws IOException {
        RunSummary summary = protolyte.newSummary(java.util.Optional.ofNullable(asOf));
        found.excluded().forEach(summary::skip);
        new RunWriter(RunWriter.Format.valueOf(format.name().toUpperCase(java.util.Locale.ROOT)),
                species == SpeciesShown.all, Optional.ofNullable(batchSize))
                .write(out, summary, each -> protolyte.stream(found.inputs(), summary, each));
        return summary.exitCode();
    }
}
