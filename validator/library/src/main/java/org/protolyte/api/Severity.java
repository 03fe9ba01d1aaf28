package org.protolyte.api;

/** How much a finding weighs; a validator fails a document on findings at or above the severity it was given. */
public enum Severity {
    /** Information for the reader; never fails a document unless asked. */
    NOTE,
    /** Should be looked at before release. */
    WARNING,
    /** Breaks a rule; fails a document by default. */
    ERROR
}
