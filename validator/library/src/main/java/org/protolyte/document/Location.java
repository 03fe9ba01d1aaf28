package org.protolyte.document;

/** A place in a text file: 1-based line and column. */
public record Location(int line, int column) {
}
