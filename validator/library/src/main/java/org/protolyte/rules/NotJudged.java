package org.protolyte.rules;

/**
 * A rule that cannot judge this document (a per-dose limit without a dose, say): the document is then not judged by
 * it and so cannot pass; the message says what is missing.
 */
public final class NotJudged extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public NotJudged(String message) {
        super(message);
    }
}
