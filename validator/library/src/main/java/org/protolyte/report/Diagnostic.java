package org.protolyte.report;

import java.util.Optional;

import org.protolyte.chemistry.Caveat;
import org.protolyte.document.Location;

/**
 * The engine's own word on where its numbers stop being trustworthy. Not a rule: always reported,
 * never waived; an indeterminate diagnostic means the document cannot pass.
 */
public record Diagnostic(String code, Caveat.Severity severity, String message, Optional<String> condition,
                         Optional<String> pointer, Optional<Location> location) {
}
