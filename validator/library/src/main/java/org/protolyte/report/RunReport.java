package org.protolyte.report;

import java.time.Instant;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.protolyte.plugin.Plugins;

/**
 * One run over several inputs, with what it was computed from: the tool version, the substance library
 * files and their SHA-256 (each document records its own hash and its packs'), the plugins, and when.
 */
public record RunReport(String toolVersion, Instant generatedAt, Map<String, String> libraryFiles,
                        List<Plugins.Origin> plugins, List<DocumentReport> reports, List<Skipped> skipped) {

    public RunReport(String toolVersion, Instant generatedAt, Map<String, String> libraryFiles,
                     List<DocumentReport> reports, List<Skipped> skipped) {
        this(toolVersion, generatedAt, libraryFiles, List.of(), reports, skipped);
    }

    public static final String CAUTION = "Protolyte is a decision aid. Release decisions rest on measured values, "
            + "the applicable pharmacopoeia, local SOPs and qualified QA review.";

    /** What every ± covers: one wording for the JSON report's {@code tool.uncertainty}, the text report and the README. */
    public static final String UNCERTAINTY = "± is the standard uncertainty from the published constants (each pKa used, "
            + "each step's ΔH° and ΔCp° with the library's stated defaults where a source gives none, each complex's "
            + "log K, and pKw) and from the activity model (every ion's log γ moved by z² times its standard "
            + "uncertainty), by linear propagation (GUM) with derivatives from implicit differentiation, the q.s. held "
            + "to its goal; it does not cover batch-to-batch variation, and where a titrant is dosed to a pH, the "
            + "meter removes it at that condition";

    public RunReport {
        reports = List.copyOf(reports);
        skipped = List.copyOf(skipped);
        plugins = List.copyOf(plugins);
        libraryFiles = Collections.unmodifiableMap(new LinkedHashMap<>(libraryFiles));
    }

    public int exitCode() {
        return reports.stream().mapToInt(r -> r.status().exitCode()).max().orElse(0);
    }

    public long count(Status s) {
        return reports.stream().filter(r -> r.status() == s).count();
    }
}
