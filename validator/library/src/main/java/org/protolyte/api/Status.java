package org.protolyte.api;

/** The verdict on one document, with the command line's exit code for it. */
public enum Status {
    /** Every rule holds and every condition could be analysed. */
    PASS(0),
    /** A finding at or above the failing severity. */
    FAIL(1),
    /** The document cannot be used as written; the findings name each problem's place. */
    INVALID(2),
    /** The analysis could not be finished (outside the model's validity, no root): never a pass. */
    INDETERMINATE(3),
    /** The tool failed on this document; please report it. */
    FAULT(4);

    private final int exitCode;

    Status(int exitCode) {
        this.exitCode = exitCode;
    }

    /** The exit code the command line gives for a run whose worst document has this status. */
    public int exitCode() {
        return exitCode;
    }
}
