package org.protolyte.rules;

import java.util.Optional;

import org.protolyte.document.Location;

/** A rule's verdict on one place of a document: what is wrong there and what to do about it. */
public record Finding(String rule, Severity severity, String message, Optional<String> pointer,
                      Optional<Location> location) {
}
