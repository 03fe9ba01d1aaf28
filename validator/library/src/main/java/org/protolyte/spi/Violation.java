package org.protolyte.spi;

import java.util.Objects;

/**
 * One place where a document breaks a rule.
 *
 * @param pointer the JSON pointer of the place in the document, as {@link Component#pointer()} and
 *                {@link Condition#pointer()} give it ({@code ""} for the whole document)
 * @param message what is wrong there, with the numbers that matter
 */
public record Violation(String pointer, String message) {
    public Violation {
        Objects.requireNonNull(pointer, "pointer");
        Objects.requireNonNull(message, "message");
    }
}
