package org.protolyte.document;

import java.util.Optional;

/**
 * Something wrong with an input document, at a place: a JSON pointer (RFC 6901, "" for the whole
 * document) and, where known, the line and column in the file.
 */
public record Problem(String pointer, Optional<Location> location, String message) {

    public String where() {
        String p = pointer.isEmpty() ? "(document)" : pointer;
        return location.map(l -> p + " (line " + l.line() + ", column " + l.column() + ")").orElse(p);
    }

    @Override
    public String toString() {
        return where() + ": " + message;
    }
}
