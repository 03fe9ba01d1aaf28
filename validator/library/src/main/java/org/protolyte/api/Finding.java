package org.protolyte.api;

import java.util.Optional;
import java.util.OptionalInt;

/**
 * One rule's finding on a document, or one problem that makes it invalid.
 *
 * @param rule    the rule's id (for a problem, {@code invalid-document})
 * @param pointer the JSON pointer of the place in the document, where there is one
 * @param line    1-based line of that place in the file
 * @param column  1-based column of that place
 * @param waived  accepted by a waiver: shown, but it does not fail the document
 */
public record Finding(String rule, Severity severity, String message, Optional<String> pointer, OptionalInt line,
                      OptionalInt column, boolean waived) {
}
