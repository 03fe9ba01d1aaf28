package org.protolyte.api;

import java.util.List;

/** A validator could not be built: every problem of its configuration at once, each naming the file or setting. */
public final class ConfigurationException extends Exception {

    private static final long serialVersionUID = 1L;

    private final List<String> problems;

    public ConfigurationException(List<String> problems) {
        super(problems.size() == 1 ? problems.get(0) : problems.size() + " problems: " + String.join("; ", problems));
        this.problems = List.copyOf(problems);
    }

    /** Each problem as a sentence that names its place. */
    public List<String> problems() {
        return problems;
    }
}
