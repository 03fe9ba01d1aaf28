package org.protolyte.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.protolyte.Protolyte;
import org.protolyte.report.DiffRenderer;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.RevisionDiff;
import org.protolyte.report.Status;
import org.protolyte.rules.Severity;
import org.protolyte.report.Printable;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code protolyte diff OLD NEW}: what changed between two revisions of a formulation. */
@Command(name = "diff", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Compares two revisions of a formulation: components, predicted values per condition, "
                + "findings.%nExit codes: 0 no new failing finding, 1 the new revision fails on a finding the old "
                + "one did not, 2 invalid input or usage (a batch record, or revisions of different documents without "
                + "--allow-different-id), 3 the new revision is indeterminate, 4 internal fault.")
public final class DiffCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "OLD")
    Path before;

    @Parameters(index = "1", paramLabel = "NEW")
    Path after;

    @Option(names = "--format", paramLabel = "FORMAT", description = "text (default) or json.")
    String format = "text";

    @Option(names = "--fail-on", paramLabel = "SEVERITY",
            description = "error (default), warning or note.")
    Severity failOn = Severity.ERROR;

    @Option(names = "--allow-different-id", description = "Compare documents whose ids differ.")
    boolean allowDifferentId;

    @Mixin
    Setup setup;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        PrintWriter err = spec.commandLine().getErr();
        Severity threshold = failOn;
        if (!format.equals("text") && !format.equals("json")) {
            err.println("protolyte: --format takes text or json, not '" + Printable.text(format) + "'");
            return 2;
        }
        Protolyte protolyte;
        try {
            protolyte = new Protolyte(setup.schemas, setup.library(), setup.checker(setup.ruleBook()), threshold);
        } catch (Setup.UsageException e) {
            return Setup.usage(err, e);
        }
        DocumentReport old = protolyte.check(before);
        DocumentReport now = protolyte.check(after);
        if (old.batch().isPresent() || now.batch().isPresent()) {
            DocumentReport batch = old.batch().isPresent() ? old : now;
            err.println("protolyte: " + Printable.text((batch == old ? before : after) + " is batch record "
                    + batch.id().orElse("(no id)") + ", not a revision of a formulation; diff compares formulations"));
            return 2;
        }
        if (old.status() != Status.INVALID && now.status() != Status.INVALID && !old.id().equals(now.id())
                && !allowDifferentId) {
            err.println("protolyte: " + Printable.text(before + " is " + old.id().orElse("(no id)") + " and " + after + " is "
                    + now.id().orElse("(no id)") + ": not two revisions of one document (--allow-different-id "
                    + "compares them anyway)"));
            return 2;
        }
        RevisionDiff diff = RevisionDiff.compare(old, now);
        // the new revision's own verdict comes first: one that can never pass does not exit 0
        int exit = old.status() == Status.INVALID || now.status() == Status.INVALID ? 2
                : now.status() == Status.INDETERMINATE || now.status() == Status.FAULT ? now.status().exitCode()
                : diff.newFailure(threshold) ? 1 : 0;
        PrintWriter out = spec.commandLine().getOut();
        out.print(format.equals("json") ? new DiffRenderer().json(diff, exit) : new DiffRenderer().text(diff));
        if (exit == 2) {
            err.println("protolyte: " + Printable.text((old.status() == Status.INVALID ? before : after)
                    + " is not a valid formulation document; 'protolyte check' names its problems"));
        } else if (exit == 3) {
            err.println("protolyte: " + Printable.text(after + " is indeterminate: it cannot pass ('protolyte check' gives the "
                    + "diagnostics)"));
        }
        out.flush();
        return exit;
    }
}
