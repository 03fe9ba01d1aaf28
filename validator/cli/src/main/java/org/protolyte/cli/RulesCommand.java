package org.protolyte.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.protolyte.report.Printable;
import org.protolyte.rules.Checker;
import org.protolyte.rules.Rule;
import org.protolyte.rules.RuleBook;
import org.protolyte.rules.RulePack;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code protolyte rules}: the active rules, by pack, and the check kinds available. */
@Command(name = "rules", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Lists the rules that would judge a document of the given intended use (default: every "
                + "shipped pack), with their severity and the pack that set it.")
public final class RulesCommand implements Callable<Integer> {

    @Option(names = "--intended-use", paramLabel = "USE", description = "e.g. parenteral, cell-culture, ophthalmic.")
    String intendedUse;

    @Mixin
    Setup setup;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        RuleBook book;
        Checker checker;
        try {
            if (intendedUse != null && !Checker.intendedUses().contains(intendedUse)) {
                throw new Setup.UsageException("--intended-use '" + intendedUse + "' is not an intended use; known: "
                        + String.join(", ", Checker.intendedUses()));
            }
            book = setup.ruleBook();
            checker = setup.checker(book);
        } catch (Setup.UsageException e) {
            return Setup.usage(spec.commandLine().getErr(), e);
        }
        var selected = intendedUse == null && setup.rules.isEmpty()
                ? book.packs().values().stream().filter(RulePack::shipped).map(RulePack::name).toList()
                : checker.selection(Optional.ofNullable(intendedUse));
        // rule packs are data a site writes: printed escaped, so a pack cannot forge a line
        out.println("packs: " + Printable.text(String.join(", ", book.withAncestors(selected).stream()
                .map(p -> p.name() + " " + p.version()).toList())));
        for (Rule r : book.rules(selected)) {
            out.printf("  %-8s %-40s %s%s%n", r.severity().code(), Printable.text(r.id()), Printable.text(r.summary()),
                    r.enabled() ? "" : " (disabled)");
        }
        out.println("check kinds: " + String.join(", ", book.kinds().all().keySet()));
        for (var o : book.kinds().plugins()) {
            out.println("plugin " + Printable.text(o.location()) + o.sha256().map(h -> " SHA-256 " + h).orElse("")
                    + (o.checkKinds().isEmpty() ? "" : ": check kinds " + Printable.text(String.join(", ", o.checkKinds())))
                    + (o.substanceLibraries().isEmpty() ? "" : "; substance libraries "
                    + Printable.text(String.join(", ", o.substanceLibraries()))));
        }
        out.println("'protolyte explain RULE_ID' prints a rule's whole text.");
        out.flush();
        return 0;
    }
}
