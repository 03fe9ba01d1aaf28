package org.protolyte.report;

import java.util.Locale;

/** The verdict on one input; the exit code of a run is the highest of its inputs'. */
public enum Status {
    PASS(0), FAIL(1), INVALID(2), INDETERMINATE(3), FAULT(4);

    private final int exitCode;

    Status(int exitCode) {
        this.exitCode = exitCode;
    }

    public int exitCode() {
        return exitCode;
    }

    public String code() {
        return name().toLowerCase(Locale.ROOT);
    }
}
