package org.protolyte.units;

/** A quantity that cannot be read: unknown unit, wrong dimension, or malformed text. */
public final class UnitException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public UnitException(String message) {
        super(message);
    }
}
