package org.protolyte.report;

/** A file found in a folder that was not checked, and the rule that passed it over (a companion, an exclusion). */
public record Skipped(String source, String reason) {
}
