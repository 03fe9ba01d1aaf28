package org.protolyte.substance;

import java.util.List;
import java.util.Optional;

/**
 * Handling data a rule reads: hazard classifications and light sensitivity, each with its source.
 * Empty where the library has no data: rules then say nothing rather than guess.
 */
public record Handling(List<Hazard> hazards, Optional<Sourced> lightSensitivity) {

    /** A harmonised (or supplier) hazard classification, e.g. "Skin Corr. 1B" with "H314". */
    public record Hazard(String classification, String statement, String appliesTo, String source) {
    }

    /** A short text with its source. */
    public record Sourced(String text, String source) {
    }

    public Handling {
        hazards = List.copyOf(hazards);
    }

    public static Handling none() {
        return new Handling(List.of(), Optional.empty());
    }
}
