package org.protolyte.substance;

import java.util.List;

/** A substance name that does not resolve to exactly one entry; {@link #candidates()} are the names to offer. */
public final class LookupException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final List<String> candidates;

    public LookupException(String message, List<String> candidates) {
        super(message);
        this.candidates = List.copyOf(candidates);
    }

    public List<String> candidates() {
        return candidates;
    }
}
