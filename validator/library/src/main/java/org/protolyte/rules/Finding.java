package org.protolyte.rules;

import java.util.Optional;

import org.protolyte.document.Location;

/**
 * A rule's verdict on one place of a document: what is wrong there, with the numbers that matter.
 * {@code definition} carries the rule's explanation, remedy, safety note and references; a finding
 * accepted by a waiver keeps it in {@code waivedBy} and no longer fails the gate.
 */
public record Finding(String rule, Severity severity, String message, Optional<String> pointer,
                      Optional<Location> location, Optional<Rule> definition, Optional<Waiver> waivedBy) {

    public Finding(String rule, Severity severity, String message, Optional<String> pointer,
                   Optional<Location> location, Optional<Rule> definition) {
        this(rule, severity, message, pointer, location, definition, Optional.empty());
    }

    public Finding(String rule, Severity severity, String message, Optional<String> pointer,
                   Optional<Location> location) {
        this(rule, severity, message, pointer, location, Optional.empty(), Optional.empty());
    }

    public Finding waived(Waiver w) {
        return new Finding(rule, severity, message, pointer, location, definition, Optional.of(w));
    }

    /** Counts towards the gate: not waived. */
    public boolean active() {
        return waivedBy.isEmpty();
    }
}
