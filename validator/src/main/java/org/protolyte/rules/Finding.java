package org.protolyte.rules;

import java.util.Optional;

import org.protolyte.document.Location;

/**
 * A rule's verdict on one place of a document: what is wrong there, with the numbers that matter.
 * {@code definition} carries the rule's explanation, remedy, safety note and references.
 */
public record Finding(String rule, Severity severity, String message, Optional<String> pointer,
                      Optional<Location> location, Optional<Rule> definition) {

    public Finding(String rule, Severity severity, String message, Optional<String> pointer,
                   Optional<Location> location) {
        this(rule, severity, message, pointer, location, Optional.empty());
    }
}
