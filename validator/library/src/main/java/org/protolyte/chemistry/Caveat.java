package org.protolyte.chemistry;

/**
 * Where a result stops being trustworthy. {@code WARNING}: the number stands, with reduced accuracy;
 * {@code INDETERMINATE}: no number can be given.
 */
public record Caveat(String code, Severity severity, String message) {
    public enum Severity { WARNING, INDETERMINATE }

    public static Caveat warning(String code, String message) {
        return new Caveat(code, Severity.WARNING, message);
    }

    public static Caveat indeterminate(String code, String message) {
        return new Caveat(code, Severity.INDETERMINATE, message);
    }
}
