package org.protolyte.api;

import java.io.IOException;
import java.io.Writer;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.chemistry.Caveat;
import org.protolyte.plugin.Plugins;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.RunSummary;
import org.protolyte.report.RunWriter;

/**
 * What a validator says about one document. Immutable; {@link #render} writes the report of this document alone, with
 * the same bytes as {@code protolyte check} gives for the same input at the same time stamp.
 */
public final class Result {

    private final DocumentReport report;
    private final Instant checkedAt;
    private final String toolVersion;
    private final Map<String, String> libraryFiles;
    private final List<Plugins.Origin> plugins;
    private final List<Finding> findings;
    private final List<Diagnostic> diagnostics;
    private final List<ConditionSummary> conditions;

    Result(DocumentReport report, Instant checkedAt, String toolVersion, Map<String, String> libraryFiles,
           List<Plugins.Origin> plugins) {
        this.report = report;
        this.checkedAt = checkedAt;
        this.toolVersion = toolVersion;
        this.libraryFiles = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(libraryFiles));
        this.plugins = List.copyOf(plugins);
        List<Finding> f = new ArrayList<>();
        for (org.protolyte.rules.Finding x : report.findings()) {
            f.add(new Finding(x.rule(), Severity.valueOf(x.severity().name()), x.message(), x.pointer(),
                    x.location().map(l -> OptionalInt.of(l.line())).orElse(OptionalInt.empty()),
                    x.location().map(l -> OptionalInt.of(l.column())).orElse(OptionalInt.empty()), !x.active()));
        }
        this.findings = List.copyOf(f);
        this.diagnostics = report.diagnostics().stream().map(d -> new Diagnostic(d.code(),
                d.severity() == Caveat.Severity.INDETERMINATE, d.message(), d.condition())).toList();
        List<ConditionSummary> c = new ArrayList<>();
        report.analysis().ifPresent(a -> a.conditions().forEach(r -> c.add(summary(r))));
        this.conditions = List.copyOf(c);
    }

    private static ConditionSummary summary(ConditionResult r) {
        double celsius = r.condition().kelvin() - org.protolyte.chemistry.Thermo.KELVIN_OFFSET;
        if (!r.determinate()) {
            OptionalDouble none = OptionalDouble.empty();
            return new ConditionSummary(r.condition().name(), celsius, none, none, none, none, none);
        }
        var s = r.state().orElseThrow();
        return new ConditionSummary(r.condition().name(), celsius, OptionalDouble.of(s.pH()),
                r.uncertainty().map(u -> OptionalDouble.of(u.pH())).orElse(OptionalDouble.empty()),
                OptionalDouble.of(r.bufferCapacityPerLitre() * 1000), OptionalDouble.of(s.ionicStrength()),
                OptionalDouble.of(s.osmolality() * 1000));
    }

    /** The document's name as the source gave it. */
    public String source() {
        return report.source();
    }

    public Status status() {
        return Status.valueOf(report.status().name());
    }

    /** The command line's exit code for this document alone. */
    public int exitCode() {
        return status().exitCode();
    }

    /** The document's id, where it could be read. */
    public Optional<String> id() {
        return report.id();
    }

    /** SHA-256 of the document's bytes (lower-case hex), where they were read. */
    public Optional<String> sha256() {
        return report.sha256();
    }

    /** The rule packs that judged it, by name, each with the SHA-256 of its file. */
    public Map<String, String> rulePacks() {
        Map<String, String> out = new java.util.LinkedHashMap<>();
        report.packs().forEach(p -> out.put(p.name(), p.sha256()));
        return java.util.Collections.unmodifiableMap(out);
    }

    public List<Finding> findings() {
        return findings;
    }

    public List<Diagnostic> diagnostics() {
        return diagnostics;
    }

    /** One summary per condition of the document, in its order (none for an invalid document). */
    public List<ConditionSummary> conditions() {
        return conditions;
    }

    /** When the check ran, by the validator's clock: the report's only part that differs between two runs. */
    public Instant checkedAt() {
        return checkedAt;
    }

    /** This document's report in a format. */
    public String render(Format format) {
        return Run.written(out -> render(format, out));
    }

    /** This document's report written to {@code out}, as the command line writes a run of one document. */
    public void render(Format format, Writer out) throws IOException {
        new RunWriter(RunWriter.Format.valueOf(format.name()), false, Optional.empty())
                .write(out, new RunSummary(toolVersion, checkedAt, libraryFiles, plugins, Optional.empty()), List.of(report));
    }

    /** The internal report, for a run of several documents. */
    DocumentReport report() {
        return report;
    }
}
