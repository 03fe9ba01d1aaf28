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
