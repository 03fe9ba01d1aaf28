package org.protolyte.report;

import java.time.Instant;
import java.time.LocalDate;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.protolyte.plugin.Plugins;

/**
 * What a streamed run keeps once each document's report has been written: counts, skipped files and the
 * exit code, never the reports themselves (an archive of ten thousand documents fits a small heap).
 */
public final class RunSummary {

    private final String toolVersion;
    private final Instant generatedAt;
    private final Map<String, String> libraryFiles;
    private final List<Plugins.Origin> plugins;
    private final Optional<LocalDate> asOf;
    private final Map<Status, Long> counts = new EnumMap<>(Status.class);
    private final List<Skipped> skipped = new java.util.ArrayList<>();
    private int documents;

    public RunSummary(String toolVersion, Instant generatedAt, Map<String, String> libraryFiles) {
        this(toolVersion, generatedAt, libraryFiles, Optional.empty());
    }

    /** {@code asOf}: the run date given for the waivers (--as-of), part of the provenance. */
    public RunSummary(String toolVersion, Instant generatedAt, Map<String, String> libraryFiles,
                      Optional<LocalDate> asOf) {
        this(toolVersion, generatedAt, libraryFiles, List.of(), asOf);
    }

    /** {@code plugins}: where a site's check kinds and substance libraries came from, part of the provenance. */
    public RunSummary(String toolVersion, Instant generatedAt, Map<String, String> libraryFiles,
                      List<Plugins.Origin> plugins, Optional<LocalDate> asOf) {
        this.plugins = List.copyOf(plugins);
        this.asOf = asOf;
        this.toolVersion = toolVersion;
        this.generatedAt = generatedAt;
        this.libraryFiles = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(libraryFiles));   // in the order given
        for (Status s : Status.values()) {
            counts.put(s, 0L);
        }
    }

    public void add(DocumentReport r) {
        documents++;
        counts.merge(r.status(), 1L, Long::sum);
    }

    public void skip(Skipped file) {
        skipped.add(file);
    }

    public String toolVersion() {
        return toolVersion;
    }

    public Optional<LocalDate> asOf() {
        return asOf;
    }

    public Instant generatedAt() {
        return generatedAt;
    }

    public Map<String, String> libraryFiles() {
        return libraryFiles;
    }

    public List<Plugins.Origin> plugins() {
        return plugins;
    }

    public int documents() {
        return documents;
    }

    public long count(Status s) {
        return counts.get(s);
    }

    public List<Skipped> skipped() {
        return List.copyOf(skipped);
    }

    public int exitCode() {
        return counts.entrySet().stream().filter(e -> e.getValue() > 0).mapToInt(e -> e.getKey().exitCode()).max()
                .orElse(0);
    }
}
