package org.protolyte.rules;

import java.time.LocalDate;
import java.util.Optional;

/**
 * An accepted finding: one rule (optionally at one place) on one revision of one document, with who
 * approved it, when, why and until when. {@code origin} names where the waiver is written; a waiver
 * written in the document itself is {@code authorGranted}.
 */
public record Waiver(String rule, Optional<String> documentId, Optional<String> revision, Optional<String> sha256,
                     Optional<String> pointer, String reason, String approver, LocalDate approved, LocalDate expires,
                     String origin, boolean authorGranted) {
}
