package org.protolyte.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.batch.BatchAnalysis;
import org.protolyte.chemistry.Caveat;
import org.protolyte.document.Formulation;
import org.protolyte.document.SourceDocument;
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
     * A batch record's report. A measurement the engine could not predict, or a pH reading whose specification could
     * not be brought to its temperature, is a diagnostic at the measurement's place and makes the record
     * INDETERMINATE; that outranks a fail, as for a formulation, since a record that cannot be judged in full can never
     * pass. Otherwise the findings of the batch rules decide pass or fail. The batch as made is shown (its
     * conditions), but its own indeterminate conditions do not make the record indeterminate: it is judged by its
     * measurements.
     */
    public static DocumentReport ofBatch(BatchAnalysis b, String sha256, Checker.Verdict verdict, Severity failOn) {
        SourceDocument doc = b.record().document();
        List<Diagnostic> diagnostics = new ArrayList<>();
        for (Caveat c : b.caveats()) {
            diagnostics.add(new Diagnostic(c.code(), c.severity(), c.message(), Optional.empty(), Optional.empty(),
                    Optional.empty()));
        }
        for (BatchAnalysis.Observation o : b.observations()) {
            o.unpredicted().ifPresent(why -> diagnostics.add(new Diagnostic("batch-unpredicted",
                    Caveat.Severity.INDETERMINATE, o.label() + ": no prediction, so this measurement is not judged: "
                    + why, Optional.empty(), Optional.of(o.pointer()), doc.locate(o.pointer()))));
        }
        for (BatchAnalysis.SpecifiedPh p : b.specifiedPh()) {
            p.unjudged().ifPresent(why -> diagnostics.add(new Diagnostic("batch-specification-unjudged",
                    Caveat.Severity.INDETERMINATE, p.label() + ": not judged against the specification: " + why,
                    Optional.empty(), Optional.of(p.pointer()), doc.locate(p.pointer()))));
        }
        boolean indeterminate = diagnostics.stream().anyMatch(d -> d.severity() == Caveat.Severity.INDETERMINATE);
        boolean failed = verdict.findings().stream().anyMatch(x -> x.active() && x.severity().compareTo(failOn) >= 0);
        Status s = indeterminate ? Status.INDETERMINATE : failed ? Status.FAIL : Status.PASS;
        return new DocumentReport(doc.source(), Optional.of(sha256), Optional.of(b.record().id()), s, b.asMade(),
                verdict.findings(), diagnostics, verdict.packs(), Optional.of(b));
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
        List<ConditionResult> judged = new ArrayList<>(a.conditions());   // admixtures are judged like conditions
        a.admixtures().forEach(m -> judged.add(m.result()));
        for (ConditionResult r : judged) {
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
                || judged.stream().anyMatch(r -> !r.determinate());
        boolean failed = findings.stream().anyMatch(x -> x.active() && x.severity().compareTo(failOn) >= 0);
        Status s = indeterminate ? Status.INDETERMINATE : failed ? Status.FAIL : Status.PASS;
        return new DocumentReport(f.document().source(), Optional.of(sha256), Optional.of(f.id()), s, Optional.of(a),
                findings, diagnostics, verdict.packs());
    }
}
