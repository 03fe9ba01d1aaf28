package org.protolyte.substance;

/** A substance library that cannot be used: the message names the file and the place in it. */
public final class LibraryException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public LibraryException(String message) {
        super(message);
    }
}
