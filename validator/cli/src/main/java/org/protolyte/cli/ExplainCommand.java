package org.protolyte.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;

import org.protolyte.document.Suggestions;
import org.protolyte.report.Printable;
import org.protolyte.rules.Rule;
import org.protolyte.rules.RuleBook;
import org.protolyte.rules.RulePack;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;

/** {@code protolyte explain RULE_ID}: a rule's whole text, parameters and references. */
@Command(name = "explain", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Prints a rule's summary, explanation, remedy, safety note, parameters and references.")
public final class ExplainCommand implements Callable<Integer> {

    @Parameters(paramLabel = "RULE_ID")
    String ruleId;

    @Mixin
    Setup setup;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        RuleBook book;
        try {
            book = setup.ruleBook();
        } catch (Setup.UsageException e) {
            return Setup.usage(spec.commandLine().getErr(), e);
        }
        List<String> all = book.packs().values().stream().map(RulePack::name).toList();
        List<Rule> rules = book.rules(all);
        for (Rule r : rules) {
            if (r.id().equals(ruleId)) {
                // rule packs are data a site writes: printed escaped, so a pack cannot forge a line
                out.println(Printable.text(r.id() + " (" + r.severity().code() + ", check kind " + r.check() + ", pack "
                        + r.pack() + ")"));
                out.println("  " + Printable.text(r.summary()));
                out.println();
                out.println("Why: " + Printable.text(r.explanation()));
                r.remedy().ifPresent(x -> out.println("What to do: " + Printable.text(x)));
                r.safety().ifPresent(x -> out.println("Safety: " + Printable.text(x)));
                if (!r.parameters().isEmpty()) {
                    out.println("Parameters: " + Printable.text(r.parameters().toString()));
                }
                out.println("References:");
                r.references().forEach(x -> out.println("  - " + Printable.text(x)));
                out.flush();
                return 0;
            }
        }
        List<String> near = Suggestions.nearest(ruleId, rules.stream().map(Rule::id).toList(), 3);
        spec.commandLine().getErr().println("protolyte: no rule '" + Printable.text(ruleId) + "'"
                + (near.isEmpty() ? "; 'protolyte rules' lists them" : "; did you mean " + Printable.text(String.join(", ", near)) + "?"));
        return 2;
    }
}
