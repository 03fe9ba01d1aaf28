package org.protolyte.report;

import java.util.List;

/** One run over several inputs. */
public record RunReport(String toolVersion, List<DocumentReport> reports) {

    public static final String CAUTION = "Protolyte is a decision aid. Release decisions rest on measured values, "
            + "the applicable pharmacopoeia, local SOPs and qualified QA review.";

    public RunReport {
        reports = List.copyOf(reports);
    }

    public int exitCode() {
        return reports.stream().mapToInt(r -> r.status().exitCode()).max().orElse(0);
    }

    public long count(Status s) {
        return reports.stream().filter(r -> r.status() == s).count();
    }
}
