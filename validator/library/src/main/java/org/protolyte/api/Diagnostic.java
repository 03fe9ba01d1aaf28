package org.protolyte.api;

import java.util.Optional;

/**
 * What the engine says about its own result: a warning, or why a condition is indeterminate.
 *
 * @param indeterminate the analysis could not be finished here, so the document cannot pass
 * @param condition     the condition it concerns, where it concerns one
 */
public record Diagnostic(String code, boolean indeterminate, String message, Optional<String> condition) {
}
