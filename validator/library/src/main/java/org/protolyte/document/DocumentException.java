package org.protolyte.document;

import java.util.List;

/** An input that cannot be used, with every problem found. */
public final class DocumentException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final transient List<Problem> problems;

    public DocumentException(List<Problem> problems) {
        super(problems.isEmpty() ? "invalid document" : problems.get(0).toString());
        this.problems = List.copyOf(problems);
    }

    public DocumentException(Problem problem) {
        this(List.of(problem));
    }

    public List<Problem> problems() {
        return problems;
    }
}
