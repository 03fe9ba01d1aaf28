package org.protolyte.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.batch.BatchAnalysis;
import org.protolyte.chemistry.Caveat;
import org.protolyte.document.Formulation;
import org.protolyte.rules.Checker;
import org.protolyte.rules.Finding;
import org.protolyte.rules.RulePack;
import org.protolyte.rules.Severity;

/** What a run says about one input file. */
public record DocumentReport(String source, Optional<String> sha256, Optional<String> id, Status status,
                             Optional<FormulationAnalysis> analysis, List<Finding> findings,
                             List<Diagnostic> diagnostics, List<RulePack> packs, Optional<BatchAnalysis> batch) {

    public DocumentReport(String source, Optional<String> sha256, Optional<String> id, Status status,
                          Optional<FormulationAnalysis> analysis, List<Finding> findings, List<Diagnostic> diagnostics,
                          List<RulePack> packs) {
        this(source, sha256, id, status, analysis, findings, diagnostics, packs, Optional.empty());
    }

    public DocumentReport {
        findings = List.copyOf(findings);
        diagnostics = List.copyOf(diagnostics);
        packs = List.copyOf(packs);
    }

    public static DocumentReport invalid(String source, Optional<String> sha256, Optional<String> id,
                                         List<Finding> problems) {
        return new DocumentReport(source, sha256, id, Status.INVALID, Optional.empty(), problems, List.of(), List.of());
    }

    public static DocumentReport fault(String source, Optional<String> sha256, String message) {
        return new DocumentReport(source, sha256, Optional.empty(), Status.FAULT, Optional.empty(), List.of(),
                List.of(new Diagnostic("internal-fault", Caveat.Severity.INDETERMINATE, message, Optional.empty(),
                        Optional.empty(), Optional.empty())), List.of());
    }

    /**
     * A batch record's report: the findings of the batch rules decide pass or fail; the batch as made is shown (its
     * conditions), but its own indeterminate conditions do not make the record indeterminate, since the record is
     * judged by its measurements.
     */
    public static DocumentReport ofBatch(BatchAnalysis b, String sha256, Checker.Verdict verdict, Severity failOn) {
        boolean failed = verdict.findings().stream().anyMatch(x -> x.active() && x.severity().compareTo(failOn) >= 0);
        return new DocumentReport(b.record().document().source(), Optional.of(sha256), Optional.of(b.record().id()),
                failed ? Status.FAIL : Status.PASS, b.asMade(), verdict.findings(), List.of(), verdict.packs(),
                Optional.of(b));
    }

    /** Status from the analysis: indeterminate outranks fail; a finding at or above {@code failOn} fails. */
    public static DocumentReport of(FormulationAnalysis a, String sha256, Checker.Verdict verdict, Severity failOn) {
        List<Finding> findings = verdict.findings();
        Formulation f = a.recipe().formulation();
        List<Diagnostic> diagnostics = new ArrayList<>();
        for (Caveat c : a.caveats()) {
            diagnostics.add(new Diagnostic(c.code(), c.severity(), c.message(), Optional.empty(), Optional.empty(),
                    Optional.empty()));
        }
        for (ConditionResult r : a.conditions()) {
            String pointer = r.condition().pointer();
            for (Caveat c : r.caveats()) {
                diagnostics.add(new Diagnostic(c.code(), c.severity(), c.message(),
                        Optional.of(r.condition().name()), pointer.isEmpty() ? Optional.empty() : Optional.of(pointer),
                        pointer.isEmpty() ? Optional.empty() : f.document().locate(pointer)));
            }
        }
        for (Checker.Unjudged u : verdict.unjudged()) {
            diagnostics.add(new Diagnostic("rule-not-judged", Caveat.Severity.INDETERMINATE, u.reason(),
                    Optional.empty(), Optional.empty(), Optional.empty()));
        }
        boolean indeterminate = diagnostics.stream().anyMatch(d -> d.severity() == Caveat.Severity.INDETERMINATE)
                || a.conditions().stream().anyMatch(r -> !r.determinate());
        boolean failed = findings.stream().anyMatch(x -> x.active() && x.severity().compareTo(failOn) >= 0);
        Status s = indeterminate ? Status.INDETERMINATE : failed ? Status.FAIL : Status.PASS;
        return new DocumentReport(f.document().source(), Optional.of(sha256), Optional.of(f.id()), s, Optional.of(a),
                findings, diagnostics, verdict.packs());
    }
}
