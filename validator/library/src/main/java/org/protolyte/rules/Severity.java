package org.protolyte.rules;

import java.util.Locale;

/** How much a finding matters; a finding at or above the failing severity fails the document. */
public enum Severity {
    NOTE, WARNING, ERROR;

    public String code() {
        return name().toLowerCase(Locale.ROOT);
    }
}
